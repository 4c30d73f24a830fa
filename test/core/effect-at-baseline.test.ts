import { describe, expect, it } from 'vitest';
import { checkEffect } from '../../src/core/check-effect.ts';
import { effectAtBaseline } from '../../src/core/effect-at-baseline.ts';
import { describeProblem } from '../../src/core/messages/describe.ts';
import { InputError } from '../../src/core/problems.ts';
import { riskWithEffect } from '../../src/core/risk-with-effect.ts';
import type { EnteredEffect } from '../../src/core/types.ts';

const apply = (baseline: number, effect: EnteredEffect) => effectAtBaseline(baseline, checkEffect(effect, 'effect'), 'effect');

function problemOf(attempt: () => unknown): InputError {
  try {
    attempt();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('riskWithEffect applies each measure at a baseline', () => {
  // Cochrane Handbook 5.1 (Schünemann et al. 2011) §12.5.4.2: RR 0.92 at an assumed risk of 0.30.
  it('gives 0.276 for a risk ratio of 0.92 at 30% (24 fewer per 1000)', () => {
    expect(riskWithEffect('rr', 0.92, 0.3)).toBeCloseTo(0.276, 12);
    expect(Math.round((0.3 - riskWithEffect('rr', 0.92, 0.3)) * 1000)).toBe(24);
  });

  // Cochrane Handbook 5.1 §12.5.4.3: OR 0.73 at an assumed risk of 0.30 gives 62 fewer per 1000.
  it('gives 0.2383 for an odds ratio of 0.73 at 30% (62 fewer per 1000)', () => {
    const risk = riskWithEffect('or', 0.73, 0.3);
    expect(risk).toBeCloseTo(0.2383, 4);
    expect(Math.round((0.3 - risk) * 1000)).toBe(62);
  });

  // Cochrane Handbook 5.1 §11.5.5 / §12.5.1: RR 0.75 at baselines 0.80, 0.20, 0.04 gives 0.60, 0.15, 0.03.
  it.each([
    [0.8, 0.6],
    [0.2, 0.15],
    [0.04, 0.03],
  ])('gives %d → %d for a risk ratio of 0.75', (baseline, expected) => {
    expect(riskWithEffect('rr', 0.75, baseline)).toBeCloseTo(expected, 12);
  });

  // Relative risk reduction of 25% is a risk ratio of 0.75 (Cochrane Handbook 5.1 §12.5.1).
  it('treats a relative reduction of 25% as a risk ratio of 0.75', () => {
    expect(riskWithEffect('rrr', 25, 0.2)).toBeCloseTo(riskWithEffect('rr', 0.75, 0.2), 15);
  });

  // Proportional hazards: risk = 1 − (1 − p)^HR (Altman & Andersen 1999, BMJ 319:1492; formula from memory,
  // values computed from it): HR 0.75 at 20% → 0.1541; HR 0.8 at 10% → 0.0808.
  it.each([
    [0.2, 0.75, 0.1541],
    [0.1, 0.8, 0.0808],
  ])('gives a risk of %d with hazard ratio %d as %d', (baseline, ratio, expected) => {
    expect(riskWithEffect('hr', ratio, baseline)).toBeCloseTo(expected, 4);
  });

  // An odds ratio of 2 at 60% gives 75% (odds 1.5 × 2 = 3, risk 3/4): arithmetic, common practice.
  it('keeps the odds-ratio path inside [0, 1] where a risk ratio would not', () => {
    expect(riskWithEffect('or', 2, 0.6)).toBeCloseTo(0.75, 12);
    expect(riskWithEffect('rr', 2, 0.6)).toBeCloseTo(1.2, 12);
  });

  it('subtracts an absolute reduction', () => {
    expect(riskWithEffect('arr', 0.12, 0.3)).toBeCloseTo(0.18, 12);
    expect(riskWithEffect('arr', -0.02, 0.3)).toBeCloseTo(0.32, 12);
  });
});

describe('effectAtBaseline pushes the interval through the same formula (Cochrane Handbook 5.1 §12.5.4.5)', () => {
  it('gives the option risk, implied risk ratio and reduction with sorted limits for an odds ratio', () => {
    const result = apply(0.3, { measure: 'or', estimate: 0.73, lower: 0.6, upper: 0.9 });
    expect(result.interventionRisk.estimate).toBeCloseTo(0.238303, 6);
    expect(result.interventionRisk.lower).toBeCloseTo((0.6 * 0.3) / (0.7 + 0.18), 12);
    expect(result.interventionRisk.upper).toBeCloseTo((0.9 * 0.3) / (0.7 + 0.27), 12);
    expect(result.absoluteReduction.lower).toBeLessThan(result.absoluteReduction.estimate);
    expect(result.absoluteReduction.upper).toBeGreaterThan(result.absoluteReduction.estimate);
    expect(result.relativeRisk.estimate).toBeCloseTo(0.238303 / 0.3, 5);
  });

  it('swaps the ends of a relative-reduction interval when it becomes a risk ratio', () => {
    const fromReduction = apply(0.2, { measure: 'rrr', estimate: 25, lower: 10, upper: 40 });
    const fromRatio = apply(0.2, { measure: 'rr', estimate: 0.75, lower: 0.6, upper: 0.9 });
    expect(fromReduction.relativeRisk.lower).toBeCloseTo(0.6, 12);
    expect(fromReduction.relativeRisk.upper).toBeCloseTo(0.9, 12);
    expect(fromReduction.interventionRisk.lower).toBeCloseTo(fromRatio.interventionRisk.lower ?? Number.NaN, 12);
  });

  it('reports the risk ratio itself when one was entered', () => {
    expect(apply(0.3, { measure: 'rr', estimate: 0.92 }).relativeRisk).toEqual({ estimate: 0.92, lower: null, upper: null });
  });

  it('refuses a risk ratio that would put the risk above 1, suggesting an odds ratio', () => {
    const error = problemOf(() => apply(0.6, { measure: 'rr', estimate: 2 }));
    expect(error.problem.code).toBe('rr-risk-above-one');
    expect(describeProblem(error.problem)).toBe(
      'A risk ratio of 2 at a baseline risk of 60% would mean a risk of 120%. Check the numbers, or enter the effect as an odds ratio.',
    );
  });

  it('refuses an interval limit that would put the risk above 1', () => {
    const error = problemOf(() => apply(0.6, { measure: 'rr', estimate: 1.5, lower: 1.2, upper: 1.8 }));
    expect(error.problem.code).toBe('limit-risk-outside');
    expect(error.problem.field).toBe('effect.upper');
  });

  it('refuses an absolute reduction larger than the baseline risk', () => {
    expect(problemOf(() => apply(0.05, { measure: 'arr', estimate: 0.1 })).problem.code).toBe('risk-outside');
  });
});

describe('checkEffect refuses impossible effects', () => {
  it.each<[EnteredEffect, string]>([
    [{ measure: 'rr', estimate: 0 }, 'ratio-not-positive'],
    [{ measure: 'or', estimate: -0.5 }, 'ratio-not-positive'],
    [{ measure: 'hr', estimate: 0.8, lower: -0.1, upper: 0.9 }, 'ratio-not-positive'],
    [{ measure: 'rrr', estimate: 100 }, 'rrr-out-of-range'],
    [{ measure: 'arr', estimate: 1.2 }, 'arr-out-of-range'],
    [{ measure: 'rr', estimate: 0.75, lower: 0.6 }, 'interval-incomplete'],
    [{ measure: 'rr', estimate: 0.5, lower: 0.6, upper: 0.9 }, 'interval-excludes-estimate'],
    [{ measure: 'rr', estimate: 0.75, lower: 0.6, upper: 0.9, level: 1.2 }, 'level-out-of-range'],
  ])('refuses %j with %s', (effect, code) => {
    expect(problemOf(() => checkEffect(effect, 'effect')).problem.code).toBe(code);
  });

  it('refuses limits given in the wrong order instead of sorting them', () => {
    expect(() => checkEffect({ measure: 'rr', estimate: 0.75, lower: 0.9, upper: 0.6 }, 'e')).toThrow(
      expect.objectContaining({ problem: expect.objectContaining({ code: 'interval-reversed', field: 'e.interval' }) }),
    );
  });
});
