import { roundHalfUp } from './float-safe.ts';
import type { Denominator, Estimate, PeopleCounts } from './types.ts';

/** A risk as a whole number of people per denominator, rounded half up (float-safe). */
export function peopleFor(risk: number, denominator: Denominator): number {
  return roundHalfUp(risk * denominator);
}

/**
 * The people counts of one option against its comparison. The option's interval, when
 * present, becomes people the same way ("between 3 and 7 in 100").
 *
 * @example peopleCounts(0.2, { estimate: 0.15, lower: null, upper: null }, 100).difference // => 5
 */
export function peopleCounts(comparisonRisk: number, interventionRisk: Estimate, denominator: Denominator): PeopleCounts {
  const comparison = peopleFor(comparisonRisk, denominator);
  const intervention = peopleFor(interventionRisk.estimate, denominator);
  const { lower, upper } = interventionRisk;
  const interventionRange =
    lower === null || upper === null
      ? null
      : { lower: peopleFor(lower, denominator), upper: peopleFor(upper, denominator) };
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
