import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeEffect } from '../../src/core/compute-effect.ts';
import type { EffectComputation } from '../../src/core/compute-effect.ts';
import { peopleGroups } from '../../src/core/people-groups.ts';
import { InputError } from '../../src/core/problems.ts';
import { riskWithEffect } from '../../src/core/risk-with-effect.ts';
import type { EnteredEffect, Estimate } from '../../src/core/types.ts';

const RUNS = { numRuns: 10_000 };
const baseline = fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true });
const ratio = fc.double({ min: 0.01, max: 20, noNaN: true });

/** A random entered effect, with an interval around its estimate about half of the time. */
const enteredEffect: fc.Arbitrary<EnteredEffect> = fc
  .tuple(
    fc.constantFrom('rr', 'or', 'hr', 'rrr', 'arr'),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.double({ min: 0, max: 1, noNaN: true }),
    fc.boolean(),
  )
  .map(([measure, a, b, c, withInterval]) => {
    const [low, mid, high] = [a, b, c].sort((x, y) => x - y) as [number, number, number];
    const scale = (value: number): number => {
      if (measure === 'rrr') return -200 + value * 299; // −200% to 99%
      if (measure === 'arr') return -0.99 + value * 1.98;
      return 0.01 + value * 10;
    };
    const estimate = scale(mid);
    return withInterval ? { measure, estimate, lower: scale(low), upper: scale(high) } : { measure, estimate };
  });

/** Compute, treating a refusal of impossible input as an acceptable outcome. */
function computeOrRefuse(risk: number, effect: EnteredEffect): EffectComputation | null {
  try {
    return computeEffect({ baseline: risk, effect });
  } catch (error) {
    if (error instanceof InputError) return null;
    throw error;
  }
}

const ordered = (value: Estimate | null): boolean =>
  value === null ||
  value.lower === null ||
  value.upper === null ||
  (value.lower <= value.estimate && value.estimate <= value.upper);
const inUnit = (value: Estimate | null): boolean =>
  value === null || [value.estimate, value.lower ?? 0, value.upper ?? 0].every((number) => number >= 0 && number <= 1);
const finiteDeep = (value: unknown): boolean => {
  if (typeof value === 'number') return Number.isFinite(value);
  if (value === null || typeof value !== 'object') return true;
  return Object.values(value).every(finiteDeep);
};

// Invariants of the arithmetic (common practice); each property runs 10,000 random cases.
describe('properties of the risk engine', () => {
  it('keeps every risk in [0, 1], with no NaN or Infinity anywhere in a result', () => {
    fc.assert(
      fc.property(baseline, enteredEffect, (risk, effect) => {
        const result = computeOrRefuse(risk, effect);
        return result === null || (inUnit(result.interventionRisk) && inUnit(result.comparisonRisk) && finiteDeep(result));
      }),
      RUNS,
    );
  });

  it('orders every interval: lower ≤ estimate ≤ upper', () => {
    fc.assert(
      fc.property(baseline, enteredEffect, (risk, effect) => {
        const result = computeOrRefuse(risk, effect);
        if (result === null) return true;
        return [result.interventionRisk, result.relativeRisk, result.absoluteReduction].every(ordered);
      }),
      RUNS,
    );
  });

  it('makes the NNT the exact reciprocal of the difference: |NNT × |difference| − 1| < 1e-12', () => {
    fc.assert(
      fc.property(baseline, enteredEffect, (risk, effect) => {
        const result = computeOrRefuse(risk, effect);
        if (result === null || result.nnt.estimate === null) return true;
        return Math.abs(result.nnt.estimate * Math.abs(result.absoluteReduction.estimate) - 1) < 1e-12;
      }),
      RUNS,
    );
  });

  it('makes the chart groups sum to the denominator', () => {
    fc.assert(
      fc.property(baseline, enteredEffect, fc.constantFrom(100, 1000, null), (risk, effect, per) => {
        let result: EffectComputation;
        try {
          result = computeEffect({ baseline: risk, effect, per: per as 100 | 1000 | null });
        } catch (error) {
          if (error instanceof InputError) return true;
          throw error;
        }
        const people = result.perPeople;
        if (people === null) return true;
        const groups = peopleGroups(people.comparison, people.intervention, people.denominator);
        const values = [groups.event, groups.prevented, groups.caused, groups.free];
        return (
          values.every((value) => Number.isInteger(value) && value >= 0) && values.reduce((a, b) => a + b) === people.denominator
        );
      }),
      RUNS,
    );
  });

  it('never gives a smaller risk for a larger ratio', () => {
    fc.assert(
      fc.property(baseline, ratio, ratio, fc.constantFrom('rr', 'or', 'hr' as const), (risk, first, second, measure) => {
        const [small, large] = first <= second ? [first, second] : [second, first];
        return riskWithEffect(measure, small, risk) <= riskWithEffect(measure, large, risk);
      }),
      RUNS,
    );
  });

  it('never leaves [0, 1] on the odds-ratio path, whatever the odds ratio', () => {
    fc.assert(
      fc.property(baseline, fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (risk, odds) => {
        const value = riskWithEffect('or', odds, risk);
        return value >= 0 && value <= 1;
      }),
      RUNS,
    );
  });
});

// A counterexample found by fast-check in CI (seed 398048290): with the textbook form
// OR·p / (1 − p + OR·p), two odds ratios one ulp apart gave risks in the wrong order.
describe('the odds-ratio path is monotone to the last bit', () => {
  it('orders the risks of two nearly equal odds ratios', () => {
    const risk = 0.29487524959859573;
    expect(riskWithEffect('or', 19.999999999999947, risk)).toBeLessThanOrEqual(riskWithEffect('or', 19.99999999999996, risk));
  });
});
