import { describe, expect, it } from 'vitest';
import { riskRatio } from '../../../src/core/counts/risk-ratio.ts';
import { zForLevel } from '../../../src/core/counts/z-for-level.ts';
import { problemOf } from './support.ts';

describe('riskRatio', () => {
  // Altman DG. Practical Statistics for Medical Research. Chapman & Hall, 1991, §10.11.1:
  // 2/16 vs 33/91, RR 0.345, SE(ln RR) 0.676, 90% CI 0.11 to 1.05 (Katz log method).
  it('reproduces the Katz interval of Altman (1991) §10.11.1 at the 90% level', () => {
    const found = riskRatio({ events: 2, total: 16 }, { events: 33, total: 91 }, 0.9);
    expect(found).not.toBeNull();
    if (found === null) return;
    expect(found.estimate).toBeCloseTo(0.345, 3);
    const standardError = (Math.log(found.upper) - Math.log(found.lower)) / (2 * zForLevel(0.9));
    expect(standardError).toBeCloseTo(0.676, 3);
    expect(found.lower).toBeCloseTo(0.11, 2);
    expect(found.upper).toBeCloseTo(1.05, 2);
    expect(found.corrected).toBe(false);
  });

  it('reproduces SciPy’s documented heart disease example of relative_risk', () => {
    // SciPy documentation (1.17), scipy.stats.contingency.relative_risk, Examples, from Example 3.1
    // of Sahai H, Khurshid A. Statistics in Epidemiology, CRC Press, 1996: coronary heart disease in
    // 27 of 122 with high and 44 of 487 with low catecholamine; result.relative_risk
    // 2.4495156482861398, confidence_interval(0.95) 1.5836990926700116 to 3.7886786315466354
    // (the same Katz log interval). Recomputed with SciPy:
    // python3 -c "from scipy.stats.contingency import relative_risk as r; x = r(27, 122, 44, 487); print(x.relative_risk, x.confidence_interval(0.95))"
    const found = riskRatio({ events: 27, total: 122 }, { events: 44, total: 487 });
    expect(found?.estimate).toBeCloseTo(2.4495156482861398, 12);
    expect(found?.lower).toBeCloseTo(1.5836990926700116, 10);
    expect(found?.upper).toBeCloseTo(3.7886786315466354, 10);
    expect(found?.corrected).toBe(false);
  });

  it('reproduces SciPy on the Berkeley admissions table of R’s documentation, a large table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details: "2691 male applicants, of whom 1198
    // (44.5%) were admitted, compared with 1835 female applicants of whom 557 (30.4%)" (Bickel PJ,
    // Hammel EA, O'Connell JW. Sex bias in graduate admissions: data from Berkeley. Science
    // 1975;187:398–403). Percentages rounded to 0.1 put the ratio between 44.45 / 30.45 and
    // 44.55 / 30.35 (derived from the text). With SciPy:
    // python3 -c "from scipy.stats.contingency import relative_risk as r; x = r(1198, 2691, 557, 1835); print(x.relative_risk, x.confidence_interval(0.95))"
    // → 1.4666415813867224, 1.3523499753756096 to 1.5905923521425023.
    const found = riskRatio({ events: 1198, total: 2691 }, { events: 557, total: 1835 });
    expect(found?.estimate).toBeGreaterThan(44.45 / 30.45);
    expect(found?.estimate).toBeLessThan(44.55 / 30.35);
    expect(found?.estimate).toBeCloseTo(1.4666415813867224, 12);
    expect(found?.lower).toBeCloseTo(1.3523499753756096, 10);
    expect(found?.upper).toBeCloseTo(1.5905923521425023, 10);
    expect(found?.corrected).toBe(false);
  });

  it('divides the option risk by the comparison risk, so swapping the arms inverts the ratio', () => {
    // Altman (1991) §10.11.1 again: the reciprocal orientation gives 1/0.345 with inverted limits.
    const forward = riskRatio({ events: 2, total: 16 }, { events: 33, total: 91 }, 0.9);
    const reverse = riskRatio({ events: 33, total: 91 }, { events: 2, total: 16 }, 0.9);
    expect(reverse?.estimate).toBeCloseTo(1 / (forward?.estimate ?? 0), 10);
    expect(reverse?.lower).toBeCloseTo(1 / (forward?.upper ?? 0), 10);
    expect(reverse?.upper).toBeCloseTo(1 / (forward?.lower ?? 0), 10);
  });

  it('widens from the 90% to the 95% to the 99% level around the same estimate', () => {
    const arms = [
      { events: 2, total: 16 },
      { events: 33, total: 91 },
    ] as const;
    const at90 = riskRatio(...arms, 0.9);
    const at95 = riskRatio(...arms);
    const at99 = riskRatio(...arms, 0.99);
    expect(at95?.estimate).toBe(at90?.estimate);
    expect(at99?.lower).toBeLessThan(at95?.lower ?? 0);
    expect(at95?.lower).toBeLessThan(at90?.lower ?? 0);
    expect(at99?.upper).toBeGreaterThan(at95?.upper ?? 0);
    // Same SE(ln RR) scaled by z: ln(upper/estimate) = z × 0.676 (Altman 1991 §10.11.1, derived).
    expect(Math.log((at99?.upper ?? 0) / (at99?.estimate ?? 1)) / zForLevel(0.99)).toBeCloseTo(0.676, 3);
  });

  it('adds 0.5 to every cell when a cell is 0 and says so', () => {
    // Haldane–Anscombe correction as in the Cochrane Handbook for Systematic Reviews of
    // Interventions 5.1.0 (2011), §16.9.2: 0/10 vs 5/10 → (0.5/11) / (5.5/11) (derived).
    const found = riskRatio({ events: 0, total: 10 }, { events: 5, total: 10 });
    expect(found?.corrected).toBe(true);
    expect(found?.estimate).toBeCloseTo(0.5 / 5.5, 12);
    const standardError = Math.sqrt(1 / 0.5 - 1 / 11 + 1 / 5.5 - 1 / 11);
    expect(found?.upper).toBeCloseTo((0.5 / 5.5) * Math.exp(zForLevel(0.95) * standardError), 10);
  });

  it('is null when neither arm has an event or both arms are all events', () => {
    expect(riskRatio({ events: 0, total: 10 }, { events: 0, total: 20 })).toBeNull();
    expect(riskRatio({ events: 10, total: 10 }, { events: 20, total: 20 })).toBeNull();
  });

  it('rejects invalid arms with the arm named, and an invalid level', () => {
    expect(problemOf(() => riskRatio({ events: 5, total: 4 }, { events: 1, total: 4 })).field).toBe('intervention');
    expect(problemOf(() => riskRatio({ events: 1, total: 4 }, { events: -1, total: 4 })).field).toBe('comparison');
    expect(problemOf(() => riskRatio({ events: 0, total: 4 }, { events: 0, total: 4 }, 0.2)).code).toBe('level-out-of-range');
  });
});
