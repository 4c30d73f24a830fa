import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundedDecimal } from '../../src/render/rounded-decimal.ts';

/**
 * The reference: ECMAScript's own Number-to-String of the rounded value (ECMA-262,
 * §6.1.6.1.20 Number::toString, shortest round-trip digits), with negative zero as "0".
 */
function reference(value: number, digits: number): string {
  const scale = 10 ** digits;
  const rounded = Math.round(value * scale) / scale;
  return String(rounded === 0 ? 0 : rounded);
}

describe('roundedDecimal', () => {
  it('writes rounded coordinates as their shortest decimal text', () => {
    expect(roundedDecimal(107.024, 2)).toBe('107.02');
    expect(roundedDecimal(107.1, 2)).toBe('107.1');
    expect(roundedDecimal(3.005, 3)).toBe('3.005');
    expect(roundedDecimal(0.07, 2)).toBe('0.07');
    expect(roundedDecimal(-3.86, 2)).toBe('-3.86');
    expect(roundedDecimal(12, 2)).toBe('12');
    expect(roundedDecimal(2.5, 0)).toBe('3');
  });

  it('never writes negative zero', () => {
    expect(roundedDecimal(-0.004, 2)).toBe('0');
    expect(roundedDecimal(-0, 2)).toBe('0');
  });

  it('gives exactly the text of the rounded number for any finite value and 0 to 4 decimals', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 0, max: 4 }), (value, digits) => {
        expect(roundedDecimal(value, digits)).toBe(reference(value, digits));
      }),
      { numRuns: 20_000 },
    );
  });

  it('matches the rounded number for huge and non-finite values too', () => {
    for (const value of [
      1e20,
      -1e21,
      2 ** 60,
      Number.MAX_VALUE,
      Number.POSITIVE_INFINITY,
      Number.NEGATIVE_INFINITY,
      Number.NaN,
    ]) {
      expect(roundedDecimal(value, 2)).toBe(reference(value, 2));
    }
  });
});
