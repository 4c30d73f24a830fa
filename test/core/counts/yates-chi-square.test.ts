import { describe, expect, it } from 'vitest';
import { pearsonChiSquare } from '../../../src/core/counts/pearson-chi-square.ts';
import { yatesChiSquare } from '../../../src/core/counts/yates-chi-square.ts';
import { problemOf } from './support.ts';

describe('yatesChiSquare', () => {
  it('reproduces SciPy on the Berkeley admissions table of R’s documentation, a large table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details and Examples: 1198 of 2691 men and
    // 557 of 1835 women admitted (Bickel, Hammel and O'Connell, Science 1975;187:398–403). By hand,
    // X² = 4526 × (699443 − 2263)² / (2691 × 1835 × 1755 × 2771) = 91.610 (derived); with SciPy
    // (Yates correction on by default):
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[1198, 557], [1493, 1278]]); print(r.statistic, r.pvalue)"
    // → 91.60959785812125, p 1.0557968087828395e-21, checked to ten significant digits.
    const found = yatesChiSquare({ events: 1198, total: 2691 }, { events: 557, total: 1835 });
    expect(found?.statistic).toBeCloseTo(91.61, 3);
    expect(found?.statistic).toBeCloseTo(91.60959785812125, 10);
    expect((found?.p ?? 0) / 1.0557968087828395e-21).toBeCloseTo(1, 10);
  });

  it('reproduces SciPy on the small table of its documentation with a cell of 3', () => {
    // SciPy documentation (1.17), scipy.stats.chi2_contingency, Examples: obs [[12, 3], [17, 16]].
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[12, 3], [17, 16]]); print(r.statistic, r.pvalue)"
    // → 2.4091074080184787, p 0.12063113097759684.
    const found = yatesChiSquare({ events: 12, total: 15 }, { events: 17, total: 33 });
    expect(found?.statistic).toBeCloseTo(2.4091074080184787, 12);
    expect(found?.p).toBeCloseTo(0.12063113097759684, 12);
  });

  it('gives 0.5 with p = 0.4795 for the tea-tasting table', () => {
    // Fisher RA. The Design of Experiments (1935): |O − E| = 1 reduced to 0.5 in each of four
    // cells with E = 2, so X² = 4 × 0.5²/2 = 0.5 (derived). Recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[3, 1], [1, 3]]); print(r.statistic, r.pvalue)"
    // → 0.5, p 0.47950012218695337.
    const found = yatesChiSquare({ events: 3, total: 4 }, { events: 1, total: 4 });
    expect(found?.statistic).toBeCloseTo(0.5, 12);
    expect(found?.p).toBeCloseTo(0.47950012218695337, 12);
  });

  it('caps the correction at |O − E|, so a table closer than 0.5 to expectation scores 0', () => {
    // R stats::chisq.test source: YATES <- min(0.5, abs(x - E)); SciPy chi2_contingency:
    // "magnitude = np.minimum(0.5, np.abs(diff))". For 5/10 vs 4/9 every |O − E| is
    // |25 − 20| / 19 = 0.263 < 0.5, so the corrected statistic is 0 and p = 1. The uncapped
    // formula would overshoot to 19 × (5 − 9.5)² / (10 × 9 × 9 × 10) = 0.0475 (derived). SciPy agrees:
    // python3 -c "from scipy.stats import chi2_contingency as c; print(c([[5, 5], [4, 5]]).statistic)" → 0.0.
    const found = yatesChiSquare({ events: 5, total: 10 }, { events: 4, total: 9 });
    expect(found?.statistic).toBe(0);
    expect(found?.p).toBe(1);
  });

  it('is smaller than the uncorrected statistic by the 0.5 shift when |O − E| exceeds 0.5', () => {
    // Yates F. Contingency tables involving small numbers and the χ² test. J R Stat Soc Suppl
    // 1934;1:217–235: X² = N(|ad − bc| − N/2)² / (margins multiplied). For 9/10 vs 3/10,
    // ad − bc = 63 − 3 = 60, N = 20, margins 10·10·12·8 = 9600: uncorrected 20 × 60² / 9600 = 7.5,
    // corrected 20 × 50² / 9600 = 5.2083 (derived). SciPy agrees:
    // python3 -c "from scipy.stats import chi2_contingency as c; print(c([[9, 1], [3, 7]]).statistic, c([[9, 1], [3, 7]], correction=False).statistic)"
    // → 5.208333333333334 7.5.
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
    expect(problemOf(() => yatesChiSquare({ events: 1.5, total: 4 }, { events: 0, total: 9 })).code).toBe('counts-not-whole');
  });
});
