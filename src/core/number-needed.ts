import { benefitOf } from './direction.ts';
import { ceilWhole, floorWhole } from './float-safe.ts';
import { english } from './messages/en/index.ts';
import type { NumberMessages } from './messages/number-messages.ts';
import { type NntInterval, writeNntInterval } from './nnt-interval.ts';
import type { Estimate, NumberNeeded } from './types.ts';

/**
 * The NNT for one absolute difference, rounded the cautious way so that rounding never
 * overstates a benefit nor understates a harm: an NNTB is rounded up, an NNTH down (BMJ
 * Clinical Evidence glossary, as cited by McQueen D, "Numbers-needed-to-treat analysis",
 * Advances in Psychiatric Treatment 2011, correspondence; the Cochrane Handbook 5.1 §12.5.4.1
 * rule of rounding up is stated for benefit). Float-safe: a true whole number stays itself.
 * The label is that of the difference itself: positive (after `benefitOf`) is a benefit.
 */
function wholeNeeded(difference: number): number {
  const needed = 1 / Math.abs(difference);
  return difference > 0 ? ceilWhole(needed) : floorWhole(needed);
}

/** A difference so small that its reciprocal is not a finite number counts as no difference. */
function asDifference(value: number): number {
  return Number.isFinite(1 / Math.abs(value)) ? value : 0;
}

/** The case and whole limits of an interval of benefit-oriented differences (positive helps). */
function intervalOf(rawLower: number, rawUpper: number): NntInterval {
  const lower = asDifference(rawLower);
  const upper = asDifference(rawUpper);
  if (lower > 0) return { kind: 'one-side', label: 'NNTB', from: wholeNeeded(upper), to: wholeNeeded(lower) };
  if (upper < 0) return { kind: 'one-side', label: 'NNTH', from: wholeNeeded(lower), to: wholeNeeded(upper) };
  if (lower === 0 && upper === 0) return { kind: 'infinity' };
  if (lower === 0) return { kind: 'to-infinity', label: 'NNTB', from: wholeNeeded(upper) };
  if (upper === 0) return { kind: 'to-infinity', label: 'NNTH', from: wholeNeeded(lower) };
  return { kind: 'through-infinity', benefit: wholeNeeded(upper), harm: wholeNeeded(lower) };
}

/**
 * The interval of the number needed to treat as parts (Altman 1998): which case it is and its
 * whole limits, benefit end first, or null when the difference has no interval. A language's
 * words join them with `writeNntInterval`.
 *
 * @example numberNeededLimits({ estimate: 0.1, lower: -0.05, upper: 0.25 }) // => { kind: 'through-infinity', benefit: 4, harm: 20 }
 */
export function numberNeededLimits(entered: Estimate, settings: { readonly wanted?: boolean } = {}): NntInterval | null {
  const { lower, upper } = benefitOf(entered, settings.wanted === true);
  return lower === null || upper === null ? null : intervalOf(lower, upper);
}

/**
 * The interval of the number needed to treat alone, in Altman's (1998) form ("NNTB 4 to ∞ to
 * NNTH 20"), or null when the difference has no interval. The same words as {@link numberNeeded}.
 *
 * @example numberNeededInterval({ estimate: 0.1, lower: -0.05, upper: 0.25 }) // => "NNTB 4 to ∞ to NNTH 20"
 */
export function numberNeededInterval(entered: Estimate, settings: NumberNeededSettings = {}): string | null {
  const interval = numberNeededLimits(entered, settings);
  return interval === null ? null : writeNntInterval(interval, settings.words ?? english.numbers);
}

/** How to read the difference, and the words for infinity and "to". */
export interface NumberNeededSettings {
  /** The event is one people want: more of it is a benefit (NNTB), less of it a harm (NNTH). */
  readonly wanted?: boolean;
  readonly words?: NumberMessages;
}

/**
 * The number needed to treat for an absolute difference (comparison − option), labelled
 * NNTB when the option helps and NNTH when it harms, with its interval written as Altman (1998,
 * BMJ 317:1309) proposes: an interval that crosses no effect reads "NNTB 4 to ∞ to NNTH 20",
 * benefit end first. Helping follows the event's direction: fewer unwanted events, or more
 * wanted ones. A difference of exactly 0 has no NNT: a plain phrase instead.
 *
 * @example numberNeeded({ estimate: 0.1, lower: -0.05, upper: 0.25 }).text // => "NNTB 10 (NNTB 4 to ∞ to NNTH 20)"
 * @example numberNeeded({ estimate: -0.15, lower: -0.2, upper: -0.1 }, { wanted: true }).text // => "NNTB 7 (NNTB 5 to 10)"
 */
export function numberNeeded(entered: Estimate, settings: NumberNeededSettings = {}): NumberNeeded {
  const words = settings.words ?? english.numbers;
  const difference = benefitOf(entered, settings.wanted === true);
  const estimate = asDifference(difference.estimate);
  const parts = numberNeededLimits(entered, settings);
  const interval = numberNeededInterval(entered, settings);
  if (estimate === 0) {
    const text = interval === null ? words.noDifference : words.noDifferenceWithin(interval);
    return { estimate: null, rounded: null, label: null, text, interval: parts };
  }
  const label = estimate > 0 ? 'NNTB' : 'NNTH';
  const rounded = wholeNeeded(estimate);
  const head = `${label} ${rounded}`;
  return {
    estimate: 1 / Math.abs(estimate),
    rounded,
    label,
    text: interval === null ? head : `${head} (${interval})`,
    interval: parts,
  };
}
