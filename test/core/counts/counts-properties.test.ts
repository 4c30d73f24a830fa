import fc from 'fast-check';
import { describe, it } from 'vitest';
import { analyseCounts } from '../../../src/core/counts/analyse-counts.ts';
import type { CountsAnalysis } from '../../../src/core/counts/counts-types.ts';
import type { Estimate } from '../../../src/core/types.ts';

// Property checks (common practice): an interval contains its estimate, a proportion's interval
// stays within [0, 1], a probability within [0, 1], and no number is NaN or infinite.

/** A valid arm of up to `maximumTotal` people, with events spread evenly over 0…total. */
const arm = (maximumTotal: number) =>
  fc.tuple(fc.integer({ min: 1, max: maximumTotal }), fc.nat()).map(([total, draw]) => ({ events: draw % (total + 1), total }));

const level = fc.double({ min: 0.5, max: 0.999, noNaN: true }).filter((value) => value > 0.5);
const method = fc.constantFrom('newcombe' as const, 'wald' as const);

const numbersIn = (value: unknown): number[] => {
  if (typeof value === 'number') return [value];
  if (value === null || typeof value !== 'object') return [];
  return Object.values(value).flatMap(numbersIn);
};

const ordered = (estimate: Estimate | null): boolean =>
  estimate === null ||
  (estimate.lower !== null &&
    estimate.upper !== null &&
    estimate.lower <= estimate.estimate &&
    estimate.estimate <= estimate.upper);

const probability = (value: number | null | undefined): boolean =>
  value === null || value === undefined || (value >= 0 && value <= 1);

const holds = (found: CountsAnalysis): boolean =>
  numbersIn(found).every(Number.isFinite) &&
  [found.interventionRisk, found.comparisonRisk, found.relativeRisk, found.oddsRatio, found.riskDifference].every(ordered) &&
  [found.interventionRisk, found.comparisonRisk].every((risk) => risk.lower >= 0 && risk.upper <= 1) &&
  found.riskDifference.lower >= -1 &&
  found.riskDifference.upper <= 1 &&
  [found.chiSquare?.p, found.chiSquareYates?.p, found.fisherExactP].every(probability) &&
  (found.relativeRisk === null || found.relativeRisk.lower > 0) &&
  (found.cramersV === null || (found.cramersV >= 0 && found.cramersV <= 1));

const close = (first: number, second: number, tolerance: number): boolean => Math.abs(first - second) <= tolerance;

describe('analyseCounts on random valid arms', () => {
  it('keeps every estimate inside its interval, proportions and p-values in [0, 1], and no NaN', () => {
    fc.assert(
      fc.property(arm(300), arm(300), level, method, (intervention, comparison, chosenLevel, chosenMethod) =>
        holds(analyseCounts(intervention, comparison, { level: chosenLevel, method: chosenMethod })),
      ),
      { numRuns: 10_000 },
    );
  });

  it('holds the same for small arms, where zero cells and all-event arms are common', () => {
    fc.assert(
      fc.property(arm(6), arm(6), level, method, (intervention, comparison, chosenLevel, chosenMethod) => {
        const found = analyseCounts(intervention, comparison, { level: chosenLevel, method: chosenMethod });
        const hasZeroCell = [
          intervention.events,
          intervention.total - intervention.events,
          comparison.events,
          comparison.total - comparison.events,
        ].includes(0);
        return holds(found) && (found.relativeRisk === null || found.relativeRisk.corrected === hasZeroCell);
      }),
      { numRuns: 10_000 },
    );
  });

  it('holds for large trials with up to 100 000 people per arm', () => {
    fc.assert(
      fc.property(arm(100_000), arm(100_000), level, (intervention, comparison, chosenLevel) =>
        holds(analyseCounts(intervention, comparison, { level: chosenLevel })),
      ),
      { numRuns: 10_000 },
    );
  });

  it('nests the intervals: a higher level never gives a narrower interval', () => {
    fc.assert(
      fc.property(arm(500), arm(500), (intervention, comparison) => {
        const narrow = analyseCounts(intervention, comparison, { level: 0.9 });
        const wide = analyseCounts(intervention, comparison, { level: 0.99 });
        return (['interventionRisk', 'comparisonRisk', 'riskDifference'] as const).every(
          (key) => wide[key].lower <= narrow[key].lower + 1e-12 && wide[key].upper >= narrow[key].upper - 1e-12,
        );
      }),
      { numRuns: 10_000 },
    );
  });

  it('negates the risk difference, inverts the ratios and keeps Fisher’s p when the arms are swapped', () => {
    fc.assert(
      fc.property(arm(200), arm(200), (intervention, comparison) => {
        const forward = analyseCounts(intervention, comparison);
        const reverse = analyseCounts(comparison, intervention);
        const ratiosInverted =
          forward.relativeRisk === null ||
          reverse.relativeRisk === null ||
          close(reverse.relativeRisk.estimate * forward.relativeRisk.estimate, 1, 1e-9);
        return (
          close(reverse.riskDifference.estimate, -forward.riskDifference.estimate, 1e-12) &&
          close(reverse.riskDifference.lower, -forward.riskDifference.upper, 1e-12) &&
          ratiosInverted &&
          close(reverse.fisherExactP ?? -1, forward.fisherExactP ?? -1, 1e-9)
        );
      }),
      { numRuns: 10_000 },
    );
  });
});
