import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { amountIn, isTimeUnit, TIME_UNITS, yearsFrom } from '../../src/core/time-unit.ts';

// A year is 365.25 days (the Julian year of the IAU, also the usual convention in survival
// analysis: common practice); a month is a twelfth of a year (common practice).

describe('yearsFrom turns an amount of a unit into years', () => {
  it.each([
    [6, 'months', 0.5],
    [18, 'months', 1.5],
    [365.25, 'days', 1],
    [3, 'days', 3 / 365.25],
    [52, 'weeks', (52 * 7) / 365.25],
    [15, 'years', 15],
  ] as const)('%d %s is %d years', (amount, unit, years) => {
    expect(yearsFrom(amount, unit)).toBeCloseTo(years, 15);
  });
});

describe('amountIn gives back the amount that was typed', () => {
  it.each([
    [3, 'days'],
    [10, 'days'],
    [6, 'weeks'],
    [6, 'months'],
    [1, 'days'],
  ] as const)('%d %s survives the trip through years exactly', (amount, unit) => {
    expect(amountIn(yearsFrom(amount, unit), unit)).toBe(amount);
  });

  it('for any whole amount of any unit up to 1000', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1000 }), fc.constantFrom(...TIME_UNITS), (amount, unit) => {
        expect(amountIn(yearsFrom(amount, unit), unit)).toBe(amount);
      }),
      { numRuns: 10_000 },
    );
  });
});

describe('isTimeUnit', () => {
  it('knows the four units and nothing else', () => {
    expect(TIME_UNITS.filter(isTimeUnit)).toEqual(['days', 'weeks', 'months', 'years']);
    expect(isTimeUnit('hours')).toBe(false);
    expect(isTimeUnit(undefined)).toBe(false);
  });
});
