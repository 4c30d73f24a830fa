import { describe, expect, it } from 'vitest';
import { pearsonChiSquare } from '../../../src/core/counts/pearson-chi-square.ts';
import { yatesChiSquare } from '../../../src/core/counts/yates-chi-square.ts';
import { problemOf } from './support.ts';

describe('yatesChiSquare', () => {
  it('reproduces SciPy’s documented example, the aspirin and ischemic stroke table', () => {
    // SciPy documentation, scipy.stats.chi2_contingency, Examples: table
    // [[176, 230], [21035, 21018]] (aspirin vs placebo), res.statistic 6.892569132546561,
    // res.pvalue 0.008655478161175739 (Yates correction on by default).
    const found = yatesChiSquare({ events: 176, total: 21211 }, { events: 230, total: 21248 });
    expect(found?.statistic).toBeCloseTo(6.892569132546561, 9);
    expect(found?.p).toBeCloseTo(0.008655478161175739, 12);
  });

  it('reproduces R’s corrected statistic for the Physicians’ Health Study table', () => {
    // R chisq.test(matrix(c(189, 104, 10845, 10933), 2)): X-squared = 24.429 (R 4.3.3
    // output, as quoted in a public repository's test suite; Agresti's myocardial infarction table).
    const found = yatesChiSquare({ events: 189, total: 11034 }, { events: 104, total: 11037 });
    expect(found?.statistic).toBeCloseTo(24.429, 3);
  });

  it('gives 0.5 with p = 0.4795 for the tea-tasting table', () => {
    // R: chisq.test(matrix(c(3, 1, 1, 3), 2)) prints X-squared = 0.5, df = 1, p-value = 0.4795
    // (R output, from memory); |O − E| = 1 reduced to 0.5 in each of four cells with E = 2.
    const found = yatesChiSquare({ events: 3, total: 4 }, { events: 1, total: 4 });
    expect(found?.statistic).toBeCloseTo(0.5, 12);
    expect(found?.p).toBeCloseTo(0.4795, 4);
  });

  it('caps the correction at |O − E|, so a table closer than 0.5 to expectation scores 0', () => {
    // R stats::chisq.test source: YATES <- min(0.5, abs(x - E)); SciPy chi2_contingency:
    // "magnitude = np.minimum(0.5, np.abs(diff))". For 5/10 vs 4/9 every |O − E| is
    // |25 − 20| / 19 = 0.263 < 0.5, so the corrected statistic is 0 and p = 1. The uncapped
    // formula would overshoot to 19 × (5 − 9.5)² / (10 × 9 × 9 × 10) = 0.0475 (derived).
    const found = yatesChiSquare({ events: 5, total: 10 }, { events: 4, total: 9 });
    expect(found?.statistic).toBe(0);
    expect(found?.p).toBe(1);
  });

  it('is smaller than the uncorrected statistic by the 0.5 shift when |O − E| exceeds 0.5', () => {
    // Yates F. Contingency tables involving small numbers and the χ² test. J R Stat Soc Suppl
    // 1934;1:217–235: X² = N(|ad − bc| − N/2)² / (margins multiplied). For 9/10 vs 3/10,
    // ad − bc = 63 − 3 = 60, N = 20, margins 10·10·12·8 = 9600: uncorrected 20 × 60² / 9600 = 7.5,
    // corrected 20 × 50² / 9600 = 5.2083 (derived).
    const option = { events: 9, total: 10 };
    const comparison = { events: 3, total: 10 };
    expect(yatesChiSquare(option, comparison)?.statistic).toBeCloseTo(5.2083, 4);
    expect(pearsonChiSquare(option, comparison)?.statistic).toBeCloseTo(7.5, 12);
  });

  it('is null with a zero margin', () => {
    expect(yatesChiSquare({ events: 0, total: 4 }, { events: 0, total: 9 })).toBeNull();
    expect(yatesChiSquare({ events: 4, total: 4 }, { events: 9, total: 9 })).toBeNull();
  });

  it('rejects invalid arms', () => {
    expect(problemOf(() => yatesChiSquare({ events: 1.5, total: 4 }, { events: 0, total: 9 })).code).toBe(
      'counts-not-whole',
    );
  });
});
