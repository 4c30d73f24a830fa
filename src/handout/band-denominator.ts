/**
 * The denominator a side effect's row is written at, so that its frequency band and
 * its number tell the same story: "rare: 5 in 10,000", never "rare: 1 in 1000" (a
 * reader who knows the bands reads 1 in 1000 as uncommon).
 */
import { peopleFor } from '../core/people-counts.ts';
import { WORDS_DENOMINATORS } from '../core/types.ts';
import type { WordsDenominator } from '../core/types.ts';
import { frequencyBand } from '../core/wording/frequency-band.ts';
import type { FrequencyBand } from '../core/wording/wording-catalogue.ts';

/** The band a reader gives a written count: "5 in 10,000" is rare; "fewer than 1 in 10,000" very rare. */
export function bandOfCount(count: number, denominator: number): FrequencyBand | null {
  if (count <= 0) return denominator >= 10000 ? 'very-rare' : null;
  return frequencyBand(Math.min(count, denominator) / denominator);
}

/** Whether a risk written as people per `denominator` reads as its own band. */
function agrees(risk: number | null, denominator: number): boolean {
  if (risk === null) return true;
  if (risk === 0) return true;
  return bandOfCount(peopleFor(risk, denominator), denominator) === frequencyBand(risk);
}

/**
 * The smallest denominator, from the topic's words denominator up to a million, at which
 * every risk of a row reads as its own band (one denominator per row, so its cells compare);
 * a million when none does (a risk within a rounding of a band's edge).
 *
 * @param risks - the row's risks, comparison first; null where unknown
 * @param from - the topic's words denominator
 * @example rowDenominator([0.0005, 0.0015], 1000) // => 10000 (5 and 15 in 10,000: rare and uncommon)
 */
export function rowDenominator(risks: readonly (number | null)[], from: WordsDenominator): WordsDenominator {
  for (const denominator of WORDS_DENOMINATORS) {
    if (denominator < from) continue;
    if (risks.every((risk) => agrees(risk, denominator))) return denominator;
  }
  return 1000000;
}
