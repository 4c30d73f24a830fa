import { describe, expect, it } from 'vitest';
import { logFactorial } from '../../../src/core/counts/log-factorial.ts';

describe('logFactorial', () => {
  it('is the logarithm of the factorial itself for small n', () => {
    // 0! = 1! = 1, 10! = 3628800, 20! = 2432902008176640000 (the definition).
    expect(logFactorial(0)).toBe(0);
    expect(logFactorial(1)).toBe(0);
    expect(logFactorial(10)).toBeCloseTo(Math.log(3628800), 13);
    expect(logFactorial(20)).toBeCloseTo(Math.log(2432902008176640000), 12);
  });

  it('continues across the switch to Stirling’s series, ln n! − ln (n − 1)! = ln n', () => {
    expect(logFactorial(171) - logFactorial(170)).toBeCloseTo(Math.log(171), 10);
    expect(logFactorial(172) - logFactorial(171)).toBeCloseTo(Math.log(172), 10);
  });

  it('matches log-gamma for large n', () => {
    // python3 -c "from math import lgamma; print(lgamma(1001), lgamma(1000001))"
    // → 5912.128178488163 12815518.384658169
    expect(logFactorial(1000)).toBeCloseTo(5912.128178488163, 9);
    expect(logFactorial(1_000_000)).toBeCloseTo(12815518.384658169, 6);
  });

  it('refuses a negative or fractional n', () => {
    for (const n of [-1, 2.5, Number.NaN, Infinity]) expect(() => logFactorial(n)).toThrow(RangeError);
  });
});
