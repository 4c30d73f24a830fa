import { describe, expect, it } from 'vitest';
import { analyseCounts } from '../../../src/core/counts/analyse-counts.ts';
import { problemOf, round4 } from './support.ts';

describe('analyseCounts', () => {
  it('reports every statistic of a trial, the difference as comparison − option', () => {
    // Newcombe (1998, Stat Med 17:873) Table II (a): option 48/80, comparison 56/70.
    // Wilson intervals: Newcombe (1998, Stat Med 17:857) method 3 definition (derived values).
    const found = analyseCounts({ events: 48, total: 80 }, { events: 56, total: 70 });
    expect(found.interventionRisk.estimate).toBeCloseTo(0.6, 12);
    expect(found.comparisonRisk.estimate).toBeCloseTo(0.8, 12);
    expect(round4(found.riskDifference.estimate)).toBe(0.2);
    expect([round4(found.riskDifference.lower), round4(found.riskDifference.upper)]).toEqual([0.0524, 0.3339]);
    expect(found.relativeRisk?.estimate).toBeCloseTo(0.75, 12);
    // Odds: (48/32) / (56/14) = 1.5 / 4 = 0.375 (derived).
    expect(found.oddsRatio?.estimate).toBeCloseTo(0.375, 12);
    expect(found.chiSquare).not.toBeNull();
    expect(found.chiSquareYates?.statistic).toBeLessThan(found.chiSquare?.statistic ?? 0);
    expect(found.fisherExactP).toBeGreaterThan(0);
    expect(found.phi).toBeLessThan(0);
    expect(found.cramersV).toBeCloseTo(-(found.phi ?? 0), 14);
    expect(found.notices).toEqual([]);
  });

  it('uses the Wald difference when asked (Newcombe 1998 Table II (b), method 1)', () => {
    const found = analyseCounts({ events: 3, total: 10 }, { events: 9, total: 10 }, { method: 'wald' });
    expect([round4(found.riskDifference.lower), round4(found.riskDifference.upper)]).toEqual([0.2605, 0.9395]);
  });

  it('applies the level to every interval (Altman 1991 §10.11.1 at 90%)', () => {
    // python3 -c "from scipy.stats.contingency import relative_risk as r; print(r(2, 16, 33, 91).confidence_interval(0.9))"
    // → 0.11340230472622724 to 1.0477388550886686.
    const found = analyseCounts({ events: 2, total: 16 }, { events: 33, total: 91 }, { level: 0.9 });
    expect(found.relativeRisk?.lower).toBeCloseTo(0.11, 2);
    expect(found.relativeRisk?.upper).toBeCloseTo(1.05, 2);
    const wider = analyseCounts({ events: 2, total: 16 }, { events: 33, total: 91 }, { level: 0.99 });
    for (const key of ['interventionRisk', 'comparisonRisk', 'riskDifference'] as const) {
      expect(wider[key].lower).toBeLessThan(found[key].lower);
      expect(wider[key].upper).toBeGreaterThan(found[key].upper);
    }
    expect(wider.oddsRatio?.lower).toBeLessThan(found.oddsRatio?.lower ?? 0);
  });

  it('corrects the ratios for a zero cell and attaches the notice', () => {
    // Cochrane Handbook 5.1.0 (2011) §16.9.2: 0.5 added to each cell when a cell is 0.
    const found = analyseCounts({ events: 0, total: 10 }, { events: 5, total: 10 });
    expect(found.relativeRisk?.corrected).toBe(true);
    expect(found.oddsRatio?.corrected).toBe(true);
    expect(found.notices).toEqual([{ code: 'counts-zero-cell-corrected', values: {} }]);
    expect(found.interventionRisk.lower).toBe(0);
    // Wilson 0/10 upper bound 0.2775 (Newcombe 1998 Table II (e)/(f), from memory), recomputed with SciPy:
    // python3 -c "from scipy.stats import binomtest as b; print(b(0, 10).proportion_ci(method='wilson'))" → 0 to 0.27753279986288926.
    expect(round4(found.interventionRisk.upper)).toBe(0.2775);
  });

  it('leaves the ratios and tests undefined when neither arm has an event', () => {
    // Newcombe (1998, Stat Med 17:873) Table II (e) 0/10 − 0/20, method 10: −0.1611 to 0.2775 (from memory),
    // recomputed with SciPy by the method 10 command of risk-difference.test.ts (a, m, c, n = 0, 10, 0, 20).
    const found = analyseCounts({ events: 0, total: 20 }, { events: 0, total: 10 });
    expect(found.relativeRisk).toBeNull();
    expect(found.oddsRatio).toBeNull();
    expect(found.chiSquare).toBeNull();
    expect(found.chiSquareYates).toBeNull();
    expect(found.phi).toBeNull();
    expect(found.cramersV).toBeNull();
    expect(found.fisherExactP).toBe(1);
    expect(found.riskDifference.estimate).toBe(0);
    expect([round4(found.riskDifference.lower), round4(found.riskDifference.upper)]).toEqual([-0.1611, 0.2775]);
    expect(found.notices).toEqual([{ code: 'counts-ratios-undefined', values: {} }]);
  });

  it('leaves the ratios undefined when both arms are all events', () => {
    const found = analyseCounts({ events: 10, total: 10 }, { events: 20, total: 20 });
    expect(found.relativeRisk).toBeNull();
    expect(found.oddsRatio).toBeNull();
    expect(found.chiSquare).toBeNull();
    expect(found.interventionRisk.upper).toBe(1);
    expect(found.comparisonRisk.upper).toBe(1);
    expect(found.notices.map((notice) => notice.code)).toEqual(['counts-ratios-undefined']);
  });

  it('names the arm at fault and rejects a bad level or arm with each problem code', () => {
    const good = { events: 1, total: 10 };
    expect(problemOf(() => analyseCounts({ events: 1.5, total: 10 }, good))).toMatchObject({
      code: 'counts-not-whole',
      field: 'intervention',
    });
    expect(problemOf(() => analyseCounts(good, { events: -1, total: 10 }))).toMatchObject({
      code: 'counts-negative',
      field: 'comparison',
    });
    expect(problemOf(() => analyseCounts(good, { events: 0, total: 0 })).code).toBe('counts-total-zero');
    expect(problemOf(() => analyseCounts({ events: 12, total: 10 }, good)).values).toEqual({ input: '12/10' });
    expect(problemOf(() => analyseCounts(good, good, { level: 1 })).code).toBe('level-out-of-range');
    expect(problemOf(() => analyseCounts(good, good, { level: 0.5 })).code).toBe('level-out-of-range');
  });
});
