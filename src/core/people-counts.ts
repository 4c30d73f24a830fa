import { roundHalfUp } from './float-safe.ts';
import { WORDS_DENOMINATORS } from './types.ts';
import type { Denominator, Estimate, PeopleCounts, WordsDenominator } from './types.ts';

/** A risk as a whole number of people per denominator, rounded half up (float-safe). */
export function peopleFor(risk: number, denominator: number): number {
  return roundHalfUp(risk * denominator);
}

/**
 * The people counts of one option against its comparison. The option's interval, when
 * present, becomes people the same way ("between 3 and 7 in 100").
 *
 * @example peopleCounts(0.2, { estimate: 0.15, lower: null, upper: null }, 100).difference // => 5
 */
export function peopleCounts<D extends number = Denominator>(
  comparisonRisk: number,
  interventionRisk: Estimate,
  denominator: D,
): PeopleCounts<D> {
  const comparison = peopleFor(comparisonRisk, denominator);
  const intervention = peopleFor(interventionRisk.estimate, denominator);
  const { lower, upper } = interventionRisk;
  const interventionRange =
    lower === null || upper === null ? null : { lower: peopleFor(lower, denominator), upper: peopleFor(upper, denominator) };
  return { denominator, comparison, intervention, difference: comparison - intervention, interventionRange };
}

/** One pair of risks to be shown on the same chart: the comparison and an option. */
export interface RiskPair {
  readonly comparison: number;
  readonly intervention: number;
}

const HALF_PERSON = 0.5 - 1e-9;

function misleadsAtHundred(pair: RiskPair): boolean {
  const shownComparison = peopleFor(pair.comparison, 100);
  const shownIntervention = peopleFor(pair.intervention, 100);
  if (pair.comparison > 0 && shownComparison === 0) return true;
  if (pair.intervention > 0 && shownIntervention === 0) return true;
  const exactDifference = (pair.comparison - pair.intervention) * 100;
  const shownDifference = shownComparison - shownIntervention;
  if (Math.abs(exactDifference) > 1e-9 && shownDifference === 0) return true;
  return Math.abs(shownDifference - exactDifference) >= HALF_PERSON;
}

/**
 * The one denominator for a whole topic: 100, unless at 100 a non-zero risk or a non-zero
 * difference would show as 0 people, or rounding would move a difference by half a person
 * or more; then 1000 (common practice for icon arrays; see Trevena et al. 2013 on one
 * denominator for every comparison).
 *
 * @example chooseDenominator([{ comparison: 0.125, intervention: 0.09375 }]) // => 1000
 */
export function chooseDenominator(pairs: readonly RiskPair[]): Denominator {
  return pairs.some(misleadsAtHundred) ? 1000 : 100;
}

/** True when, at `denominator`, a non-zero risk or a non-zero difference shows as 0 people. */
function hidesAt(pair: RiskPair, denominator: number): boolean {
  if (pair.comparison > 0 && peopleFor(pair.comparison, denominator) === 0) return true;
  if (pair.intervention > 0 && peopleFor(pair.intervention, denominator) === 0) return true;
  return Math.abs(pair.comparison - pair.intervention) > 1e-15 && showsSameCount(pair, denominator);
}

/** True when the two risks of a pair show as the same number of people at `denominator`. */
export function showsSameCount(pair: RiskPair, denominator: number): boolean {
  return peopleFor(pair.comparison, denominator) === peopleFor(pair.intervention, denominator);
}

/**
 * The one denominator of a topic's words and tables: the picture's (100 or 1000), or the
 * smallest of 10,000, 100,000 and 1,000,000 at which no non-zero risk and no non-zero
 * difference shows as 0 people; 1,000,000 at most (below one in a million the words say
 * "fewer than 1 in a million"). Common practice: natural frequencies keep one denominator
 * for every comparison (Trevena et al. 2013, BMC Med Inform Decis Mak 13 Suppl 2:S7).
 *
 * @example chooseWordsDenominator([{ comparison: 0.001, intervention: 0.0008 }], 1000) // => 10000
 */
export function chooseWordsDenominator(pairs: readonly RiskPair[], picture: Denominator): WordsDenominator {
  for (const denominator of WORDS_DENOMINATORS) {
    if (denominator < picture) continue;
    if (!pairs.some((pair) => hidesAt(pair, denominator))) return denominator;
  }
  return 1000000;
}

/** The picture's denominator for a words denominator: the same up to 1000, else 1000. */
export function pictureDenominatorFor(words: WordsDenominator): Denominator {
  return words === 100 ? 100 : 1000;
}

/**
 * How far the shown people move a difference from its exact value, in people: a warning is
 * due at half a person or more, at any denominator, chosen or forced.
 *
 * @example roundingShift({ comparison: 0.0125, intervention: 0.0075 }, 100) // => 0.5 (about: 1 − 1 = 0 shown for an exact 0.5)
 */
export function roundingShift(pair: RiskPair, denominator: number): number {
  const exact = (pair.comparison - pair.intervention) * denominator;
  const shown = peopleFor(pair.comparison, denominator) - peopleFor(pair.intervention, denominator);
  return Math.abs(shown - exact);
}
