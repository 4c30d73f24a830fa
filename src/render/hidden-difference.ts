/**
 * A difference the pictures cannot show: not zero, but less than one whole person
 * out of the pictures' 100 or 1000, counted instead per as many people as it
 * takes to show it (10,000 up to a million).
 */
import { peopleFor } from '../core/people-counts.ts';
import { WORDS_DENOMINATORS } from '../core/types.ts';
import type { PeopleCounts, WordsDenominator } from '../core/types.ts';

/** A hidden difference as words can say it. */
export interface HiddenDifference {
  /** Fewer or more people have the outcome with the option. */
  readonly direction: 'fewer' | 'more';
  /** The difference in people per `denominator`; 0 when it is below one in a million. */
  readonly count: number;
  /** The denominator it is counted per; null when it is below one in a million. */
  readonly denominator: WordsDenominator | null;
}

/** The two risks behind a picture: the comparison's and the option's, as proportions. */
export interface ExactRisks {
  readonly comparison: number;
  readonly intervention: number;
}

/**
 * The difference between two risks that the pictures, at `picture` people, show as no
 * whole person, or null when the pictures do show it or it is exactly 0 (the only case
 * for "the same number"). The words' own counts (`words`) are used when they show it, so
 * that the chart and the sentences name one denominator; otherwise the smallest
 * denominator above the pictures' at which the rounded counts differ.
 *
 * @example hiddenDifference({ comparison: 0.001, intervention: 0.0008 }, 1000, null)
 * // => { direction: 'fewer', count: 2, denominator: 10000 }
 */
export function hiddenDifference(
  risks: ExactRisks,
  picture: number,
  words: PeopleCounts<WordsDenominator> | null,
): HiddenDifference | null {
  const exact = risks.comparison - risks.intervention;
  if (exact === 0) return null;
  if (peopleFor(risks.comparison, picture) !== peopleFor(risks.intervention, picture)) return null;
  const direction = exact > 0 ? 'fewer' : 'more';
  if (words !== null && words.denominator > picture && words.difference !== 0) {
    return { direction, count: Math.abs(words.difference), denominator: words.denominator };
  }
  for (const denominator of WORDS_DENOMINATORS) {
    if (denominator <= picture) continue;
    const shown = peopleFor(risks.comparison, denominator) - peopleFor(risks.intervention, denominator);
    if (shown !== 0) return { direction, count: Math.abs(shown), denominator };
  }
  return { direction, count: 0, denominator: null };
}
