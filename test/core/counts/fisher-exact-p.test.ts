import { describe, expect, it } from 'vitest';
import { fisherExactP } from '../../../src/core/counts/fisher-exact-p.ts';
import { problemOf } from './support.ts';

describe('fisherExactP', () => {
  it('gives 34/70 = 0.4857 for Fisher’s tea-tasting experiment', () => {
    // Fisher RA. The Design of Experiments (1935), ch. II; Agresti A. Categorical Data Analysis
    // (2002), p. 91, as cited in R's fisher.test documentation: 3 of 4 right, table
    // probabilities 1, 16, 36, 16, 1 over 70; two-sided p = (1 + 16 + 16 + 1) / 70 = 0.4857.
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[3, 1], [1, 3]]).pvalue)" → 0.48571428571428565.
    expect(fisherExactP({ events: 3, total: 4 }, { events: 1, total: 4 })).toBeCloseTo(34 / 70, 12);
  });

  it('reproduces SciPy’s documented whales-and-sharks example', () => {
    // SciPy documentation, scipy.stats.fisher_exact, Examples: [[8, 2], [1, 5]],
    // pvalue 0.034965034965034975; a small table with a cell of 1. Recomputed with SciPy:
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[8, 2], [1, 5]]).pvalue)"
    expect(fisherExactP({ events: 8, total: 9 }, { events: 2, total: 7 })).toBeCloseTo(0.034965034965034975, 14);
  });

  it('reproduces R’s two-sided p for Fisher’s criminal twins', () => {
    // R documentation, fisher.test, Examples: Convictions, dizygotic 2 of 17 convicted vs
    // monozygotic 10 of 13; fisher.test(Convictions) p-value = 0.0005367 (R output, as printed in a public
    // tutorial script). Recomputed with SciPy:
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[2, 15], [10, 3]]).pvalue)" → 0.0005367241191434358.
    expect(fisherExactP({ events: 2, total: 17 }, { events: 10, total: 13 })).toBeCloseTo(0.0005367, 7);
    expect(fisherExactP({ events: 2, total: 17 }, { events: 10, total: 13 })).toBeCloseTo(0.0005367241191434358, 12);
  });

  it('does not depend on which arm is named first', () => {
    const forward = fisherExactP({ events: 2, total: 17 }, { events: 10, total: 13 });
    const reverse = fisherExactP({ events: 10, total: 13 }, { events: 2, total: 17 });
    expect(reverse).toBeCloseTo(forward ?? -1, 14);
  });

  it('counts tables tied with the observed one in probability, as R does with its 1e−7 tolerance', () => {
    // Equal arms make the distribution symmetric, so the mirror table has the same probability
    // and must be included: 1/5 vs 4/5 has tables 0..5 with probabilities
    // 1, 25, 100, 100, 25, 1 over 252 (hypergeometric, derived); p = (1 + 25 + 25 + 1) / 252.
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[1, 4], [4, 1]]).pvalue)" → 0.2063492063492064.
    expect(fisherExactP({ events: 1, total: 5 }, { events: 4, total: 5 })).toBeCloseTo(52 / 252, 12);
  });

  it('gives 1 when the observed table is the most likely one, and when the margins allow only one table', () => {
    expect(fisherExactP({ events: 2, total: 4 }, { events: 2, total: 4 })).toBeCloseTo(1, 12);
    // One table only fits these margins, so p = 1 (derived); SciPy agrees:
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[0, 10], [0, 10]]).pvalue, f([[7, 0], [3, 0]]).pvalue)" → 1.0 1.0.
    expect(fisherExactP({ events: 0, total: 10 }, { events: 0, total: 10 })).toBe(1);
    expect(fisherExactP({ events: 7, total: 7 }, { events: 3, total: 3 })).toBe(1);
  });

  it('reproduces SciPy on the large Berkeley admissions table, quickly', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details and Examples: 1198 of 2691 men and
    // 557 of 1835 women admitted (Bickel, Hammel and O'Connell, Science 1975;187:398–403). The exact
    // p, with SciPy:
    // python3 -c "from scipy.stats import fisher_exact as f; print(f([[1198, 1493], [557, 1278]]).pvalue)"
    // → 4.835903179337353e-22, checked to ten significant digits; below the Pearson (7.81e−22) and
    // Yates (1.06e−21) p-values of the same table, all three far in the tail.
    const started = performance.now();
    const found = fisherExactP({ events: 1198, total: 2691 }, { events: 557, total: 1835 });
    expect(performance.now() - started).toBeLessThan(200);
    expect((found ?? 0) / 4.835903179337353e-22).toBeCloseTo(1, 10);
  });

  it('returns a p-value in [0, 1] for extreme tables with a million people per arm', () => {
    const found = fisherExactP({ events: 0, total: 1_000_000 }, { events: 1_000_000, total: 1_000_000 });
    expect(found).toBe(0);
    const balanced = fisherExactP({ events: 50_000, total: 1_000_000 }, { events: 50_000, total: 1_000_000 });
    expect(balanced).toBeCloseTo(1, 9);
  });

  it('rejects invalid arms', () => {
    expect(problemOf(() => fisherExactP({ events: 1, total: 4 }, { events: 5, total: 4 })).code).toBe(
      'counts-events-above-total',
    );
  });
});
