import { describe, expect, it } from 'vitest';
import { pearsonChiSquare } from '../../../src/core/counts/pearson-chi-square.ts';
import { problemOf } from './support.ts';

describe('pearsonChiSquare', () => {
  it('reproduces the Pearson chi-square of the Physicians’ Health Study table in Agresti', () => {
    // Agresti A. Categorical Data Analysis: myocardial infarction on placebo 189/11034 vs
    // aspirin 104/11037, X² = 25.01 (from memory); R's chisq.test(..., correct = FALSE)
    // prints X-squared = 25.014 (R output, as quoted in a public repository's test suite).
    const found = pearsonChiSquare({ events: 189, total: 11034 }, { events: 104, total: 11037 });
    expect(found?.statistic).toBeCloseTo(25.014, 3);
    expect(found?.p).toBeGreaterThan(5e-7);
    expect(found?.p).toBeLessThan(6e-7);
  });

  it('gives X² = 2 for the tea-tasting table, where every |O − E| is 1 and every E is 2', () => {
    // Fisher RA. The Design of Experiments (1935): 3 of 4 milk-first cups found; E = 2 in
    // each cell, so X² = 4 × 1²/2 = 2 (derived), p = 0.1573 (chi-square table, 1 df).
    const found = pearsonChiSquare({ events: 3, total: 4 }, { events: 1, total: 4 });
    expect(found?.statistic).toBeCloseTo(2, 12);
    expect(found?.p).toBeCloseTo(0.1573, 4);
  });

  it('follows X² = N(ad − bc)² / (n₁n₂m₁m₂) on the aspirin and stroke table', () => {
    // Table of the SciPy chi2_contingency documentation, [[176, 230], [21035, 21018]], by hand:
    // 42459 × 1138882² / (21211 × 21248 × 406 × 42053) = 7.1569 (derived).
    const found = pearsonChiSquare({ events: 176, total: 21211 }, { events: 230, total: 21248 });
    expect(found?.statistic).toBeCloseTo(7.1569, 4);
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
    expect(problemOf(() => pearsonChiSquare({ events: 0, total: 0 }, { events: 0, total: 9 })).code).toBe(
      'counts-total-zero',
    );
  });
});
