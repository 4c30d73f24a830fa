import { describe, expect, it } from 'vitest';
import { pearsonChiSquare } from '../../../src/core/counts/pearson-chi-square.ts';
import { problemOf } from './support.ts';

describe('pearsonChiSquare', () => {
  it('reproduces SciPy on the Berkeley admissions table of R’s documentation, a large table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details and Examples, apply(UCBAdmissions,
    // c(1, 2), sum): 1198 of 2691 men and 557 of 1835 women admitted, from Bickel PJ, Hammel EA,
    // O'Connell JW. Sex bias in graduate admissions: data from Berkeley. Science 1975;187:398–403.
    // By hand, X² = N(ad − bc)² / (n₁n₂m₁m₂) = 4526 × 699443² / (2691 × 1835 × 1755 × 2771) = 92.205
    // (derived); recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[1198, 557], [1493, 1278]], correction=False); print(r.statistic, r.pvalue)"
    // → 92.20528041152764, p 7.813600388994667e-22, checked to ten significant digits.
    const found = pearsonChiSquare({ events: 1198, total: 2691 }, { events: 557, total: 1835 });
    expect(found?.statistic).toBeCloseTo(92.205, 3);
    expect(found?.statistic).toBeCloseTo(92.20528041152764, 10);
    expect((found?.p ?? 0) / 7.813600388994667e-22).toBeCloseTo(1, 10);
  });

  it('reproduces SciPy’s documented uncorrected p for a small table with a cell of 3', () => {
    // SciPy documentation (1.17), scipy.stats.chi2_contingency, Examples: obs [[12, 3], [17, 16]]
    // with correction=False, res.pvalue 0.0614122539870913. The statistic, recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[12, 3], [17, 16]], correction=False); print(r.statistic, r.pvalue)"
    // → 3.498828576142551, p 0.061412253987091166.
    const found = pearsonChiSquare({ events: 12, total: 15 }, { events: 17, total: 33 });
    expect(found?.statistic).toBeCloseTo(3.498828576142551, 12);
    expect(found?.p).toBeCloseTo(0.0614122539870913, 12);
  });

  it('gives X² = 2 for the tea-tasting table, where every |O − E| is 1 and every E is 2', () => {
    // Fisher RA. The Design of Experiments (1935), ch. II; Agresti A. Categorical Data Analysis
    // (2002), p. 91, as cited in R’s fisher.test documentation: 3 of 4 milk-first cups found; E = 2
    // in each cell, so X² = 4 × 1²/2 = 2 (derived); recomputed with SciPy:
    // python3 -c "from scipy.stats import chi2_contingency as c; r = c([[3, 1], [1, 3]], correction=False); print(r.statistic, r.pvalue)"
    // → 2.0, p 0.15729920705028105.
    const found = pearsonChiSquare({ events: 3, total: 4 }, { events: 1, total: 4 });
    expect(found?.statistic).toBeCloseTo(2, 12);
    expect(found?.p).toBeCloseTo(0.15729920705028105, 12);
  });

  it('is 0 with p = 1 when both arms have the same risk', () => {
    const found = pearsonChiSquare({ events: 5, total: 20 }, { events: 10, total: 40 });
    expect(found?.statistic).toBeCloseTo(0, 12);
    expect(found?.p).toBeCloseTo(1, 12);
  });

  it('is null when no one, or everyone, has the event (a zero margin)', () => {
    expect(pearsonChiSquare({ events: 0, total: 4 }, { events: 0, total: 9 })).toBeNull();
    expect(pearsonChiSquare({ events: 4, total: 4 }, { events: 9, total: 9 })).toBeNull();
  });

  it('rejects invalid arms', () => {
    expect(problemOf(() => pearsonChiSquare({ events: 0, total: 0 }, { events: 0, total: 9 })).code).toBe('counts-total-zero');
  });
});
