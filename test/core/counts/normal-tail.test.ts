import { describe, expect, it } from 'vitest';
import { erfc, normalUpperQuantile, normalUpperTail } from '../../../src/core/counts/normal-tail.ts';

describe('erfc', () => {
  it('matches the error function table on both sides of the switch from series to continued fraction', () => {
    // Abramowitz & Stegun 1964, Table 7.1 (erf x): erf 0.5 = 0.5204998778, erf 1 = 0.8427007929,
    // erf 1.5 = 0.9661051465, erf 2 = 0.9953222650.
    expect(erfc(0.5)).toBeCloseTo(1 - 0.5204998778, 10);
    expect(erfc(1)).toBeCloseTo(1 - 0.8427007929, 10);
    expect(erfc(1.5)).toBeCloseTo(1 - 0.9661051465, 10);
    expect(erfc(2)).toBeCloseTo(1 - 0.995322265, 10);
    expect(Math.abs(erfc(2 - 1e-12) - erfc(2))).toBeLessThan(1e-13);
  });

  it('keeps the relative precision of tiny tails', () => {
    // python3 -c "from scipy.special import erfc; print(erfc(3), erfc(6), erfc(20))"
    // → 2.2090496998585445e-05 2.1519736712498913e-17 5.395865611607901e-176
    expect(erfc(3) / 2.2090496998585445e-5).toBeCloseTo(1, 12);
    expect(erfc(6) / 2.1519736712498913e-17).toBeCloseTo(1, 12);
    expect(erfc(20) / 5.395865611607901e-176).toBeCloseTo(1, 10);
  });

  it('is 1 at 0, 2 − erfc(x) for negative x, 0 and 2 at the infinities', () => {
    expect(erfc(0)).toBe(1);
    expect(erfc(-1)).toBeCloseTo(1 + 0.8427007929, 10);
    expect(erfc(Infinity)).toBe(0);
    expect(erfc(-Infinity)).toBe(2);
    expect(erfc(Number.NaN)).toBeNaN();
  });
});

describe('normalUpperTail and normalUpperQuantile', () => {
  it('give the standard normal table’s tail areas and their quantiles', () => {
    // python3 -c "from scipy.stats import norm; print(norm.sf(1.96), norm.isf(0.025), norm.isf(0.005), norm.isf(0.0005))"
    // → 0.024997895148220435 1.9599639845400545 2.575829303548901 3.2905267314918945
    expect(normalUpperTail(1.96)).toBeCloseTo(0.024997895148220435, 15);
    expect(normalUpperQuantile(0.025)).toBeCloseTo(1.9599639845400545, 13);
    expect(normalUpperQuantile(0.005)).toBeCloseTo(2.575829303548901, 13);
    expect(normalUpperQuantile(0.0005)).toBeCloseTo(3.2905267314918945, 13);
  });

  it('gives 0 for a tail of one half and the quartile 0.6745 for a quarter', () => {
    // python3 -c "from scipy.stats import norm; print(norm.isf(0.25))" → 0.6744897501960817
    expect(normalUpperQuantile(0.5)).toBeCloseTo(0, 14);
    expect(normalUpperQuantile(0.25)).toBeCloseTo(0.6744897501960817, 13);
  });

  it('refuses a tail outside (0, 0.5]', () => {
    for (const tail of [0, -0.1, 0.6, 1, Number.NaN]) expect(() => normalUpperQuantile(tail)).toThrow(RangeError);
  });
});
