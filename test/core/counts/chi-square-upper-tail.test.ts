import { describe, expect, it } from 'vitest';
import { chiSquareUpperTail } from '../../../src/core/counts/chi-square-upper-tail.ts';

describe('chiSquareUpperTail', () => {
  it('gives the tail areas of the chi-square table with 1 degree of freedom', () => {
    // Critical values of χ²(1) from standard statistical tables (common practice):
    // 3.841459 → 0.05, 6.634897 → 0.01, 10.827566 → 0.001; 2.705543 → 0.10.
    expect(chiSquareUpperTail(3.841458820694124)).toBeCloseTo(0.05, 12);
    expect(chiSquareUpperTail(6.634896601021214)).toBeCloseTo(0.01, 12);
    expect(chiSquareUpperTail(10.827566170662733)).toBeCloseTo(0.001, 12);
    expect(chiSquareUpperTail(2.705543454095404)).toBeCloseTo(0.1, 12);
  });

  it('keeps the precision of tiny tail areas', () => {
    // P(χ²(1) > 100) = 2·Φ(−10) = 1.5239706e−23, recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2; print(chi2.sf(100, 1))" → 1.5239706048320995e-23.
    expect(chiSquareUpperTail(100) / 1.5239706e-23).toBeCloseTo(1, 6);
  });

  it('is smooth where the error function switches from the series to the continued fraction (statistic 8)', () => {
    const below = chiSquareUpperTail(7.999999999);
    const above = chiSquareUpperTail(8.000000001);
    expect(Math.abs(below - above)).toBeLessThan(1e-11);
    // python3 -c "from scipy.stats import chi2; print(chi2.sf(8, 1))" → 0.004677734981047276.
    expect(chiSquareUpperTail(8)).toBeCloseTo(0.004677734981047276, 15);
    // P(χ²(1) > 3) = 2·Φ(−√3) = 0.0832645 (normal table, common practice), recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2; print(chi2.sf(3, 1))" → 0.08326451666355042.
    expect(chiSquareUpperTail(3)).toBeCloseTo(0.08326451666355042, 14);
  });

  it('is 1 at 0 and 0 for an infinite statistic, never outside [0, 1]', () => {
    expect(chiSquareUpperTail(0)).toBe(1);
    expect(chiSquareUpperTail(Infinity)).toBe(0);
    expect(chiSquareUpperTail(1e6)).toBe(0);
  });
});
