import { describe, expect, it } from 'vitest';
import { decimalAtLeast } from '../../../src/core/wording/decimal-at-least.ts';

describe('decimalAtLeast', () => {
  // Exact decimal comparison at band boundaries (EU SmPC guideline, lower bounds inclusive); the
  // float values are common practice knowledge of IEEE 754 doubles.
  it('treats a value equal to the threshold as at least the threshold', () => {
    expect(decimalAtLeast(0.1, '0.1')).toBe(true);
    expect(decimalAtLeast(0.0001, '0.0001')).toBe(true);
  });

  it('treats a value just below the threshold as below it', () => {
    expect(decimalAtLeast(0.0999, '0.1')).toBe(false);
    expect(decimalAtLeast(0.0000999, '0.0001')).toBe(false);
  });

  it('compares the decimal JavaScript prints, not the binary value behind it', () => {
    // 0.1 + 0.2 - 0.2 prints as 0.10000000000000003: above 0.1 as a decimal.
    expect(decimalAtLeast(0.1 + 0.2 - 0.2, '0.1')).toBe(true);
    // 0.7 - 0.6 prints as 0.09999999999999998: below 0.1 as a decimal.
    expect(decimalAtLeast(0.7 - 0.6, '0.1')).toBe(false);
  });

  it('reads numbers JavaScript prints in exponent form', () => {
    expect(String(9.99e-7)).toBe('9.99e-7');
    expect(decimalAtLeast(9.99e-7, '0.000001')).toBe(false);
    expect(decimalAtLeast(1e-6, '0.000001')).toBe(true);
  });

  it('handles zero and negative values', () => {
    expect(decimalAtLeast(0, '0.0001')).toBe(false);
    expect(decimalAtLeast(-0.5, '0')).toBe(false);
    expect(decimalAtLeast(0, '0')).toBe(true);
  });

  it('rejects values that are not finite', () => {
    expect(() => decimalAtLeast(Number.NaN, '0.1')).toThrow(RangeError);
    expect(() => decimalAtLeast(Number.POSITIVE_INFINITY, '0.1')).toThrow(RangeError);
  });
});
