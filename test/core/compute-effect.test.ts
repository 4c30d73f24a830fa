import { describe, expect, it } from 'vitest';
import { computeEffect } from '../../src/core/compute-effect.ts';
import { describeNotice } from '../../src/core/messages/describe.ts';
import { InputError } from '../../src/core/problems.ts';

const codes = (notices: readonly { code: string }[]) => notices.map((notice) => notice.code);

describe('computeEffect gives every number for one option', () => {
  // Cochrane Handbook 5.1 §12.5.4.3: OR 0.73 at an assumed comparison risk of 30% → 62 fewer per 1000, NNT 17.
  it('computes the odds-ratio example with its interval and the baseline caveat', () => {
    const result = computeEffect({ baseline: 0.3, effect: { measure: 'or', estimate: 0.73, lower: 0.6, upper: 0.9 }, per: 1000 });
    expect(result.comparisonRisk).toEqual({ estimate: 0.3, lower: null, upper: null });
    expect(result.perPeople?.difference).toBe(62);
    expect(result.nnt.rounded).toBe(17);
    expect(codes(result.notices)).toContain('interval-ignores-baseline-uncertainty');
    expect(describeNotice(result.notices[0] ?? { code: '', values: {} })).toMatch(/not in the baseline risk/);
  });

  // Cochrane Handbook 5.1 §12.5.4.2: RR 0.92 at 30% → 24 fewer per 1000, NNT 42.
  it('computes the risk-ratio example', () => {
    const result = computeEffect({ baseline: 0.3, effect: { measure: 'rr', estimate: 0.92 }, per: 1000 });
    expect(result.perPeople).toMatchObject({ denominator: 1000, comparison: 300, intervention: 276, difference: 24 });
    expect(result.nnt.text).toBe('NNTB 42');
  });

  it('gives only the difference and NNT for an absolute reduction without a baseline', () => {
    const result = computeEffect({ baseline: null, effect: { measure: 'arr', estimate: 0.1, lower: -0.05, upper: 0.25 } });
    expect(result.comparisonRisk).toBeNull();
    expect(result.interventionRisk).toBeNull();
    expect(result.relativeRisk).toBeNull();
    expect(result.perPeople).toBeNull();
    expect(result.nnt.text).toBe('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
  });

  it('needs a baseline for a ratio', () => {
    expect(() => computeEffect({ baseline: null, effect: { measure: 'rr', estimate: 0.8 } })).toThrow(InputError);
  });

  // Cabot Institute 2016 (University of Bristol blog): 4% over 5 years is 15.07% over 20 years.
  it('converts the baseline period first, then applies the effect, and says so', () => {
    const result = computeEffect({
      baseline: 0.04,
      effect: { measure: 'rr', estimate: 0.5 },
      periods: { baselineYears: 5, targetYears: 20 },
    });
    expect(result.baselineUsed).toBeCloseTo(0.1507, 4);
    expect(result.interventionRisk?.estimate).toBeCloseTo(0.1507 / 2, 4);
    expect(codes(result.notices)).toContain('baseline-period-converted');
  });

  it('warns when the period is longer than the follow-up of the effect', () => {
    const result = computeEffect({
      baseline: 0.1,
      effect: { measure: 'hr', estimate: 0.8 },
      periods: { baselineYears: 10, targetYears: 10 },
      followUpYears: 5,
    });
    expect(codes(result.notices)).toEqual(expect.arrayContaining(['period-beyond-followup', 'hr-proportional-hazards']));
  });

  it('raises the denominator to 1000 when 100 would mislead, and says why', () => {
    const result = computeEffect({ baseline: 0.125, effect: { measure: 'rr', estimate: 0.75 } });
    expect(result.perPeople?.denominator).toBe(1000);
    expect(codes(result.notices)).toContain('denominator-raised');
  });

  // Newcombe 1998 (Stat Med 17:873) Table II, case (a): 56/70 − 48/80, method 10: 0.0524 to 0.3339.
  it('takes the arms of trial counts as they are when no baseline is given', () => {
    const result = computeEffect({
      baseline: null,
      effect: { measure: 'counts', intervention: { events: 48, total: 80 }, comparison: { events: 56, total: 70 } },
    });
    expect(result.absoluteReduction.estimate).toBeCloseTo(0.2, 12);
    expect(result.absoluteReduction.lower).toBeCloseTo(0.0524, 4);
    expect(result.absoluteReduction.upper).toBeCloseTo(0.3339, 4);
    expect(result.comparisonRisk?.lower).not.toBeNull();
  });

  it('applies the trial risk ratio to a given baseline', () => {
    const result = computeEffect({
      baseline: 0.2,
      effect: { measure: 'counts', intervention: { events: 10, total: 100 }, comparison: { events: 20, total: 100 } },
    });
    expect(result.relativeRisk?.estimate).toBeCloseTo(0.5, 12);
    expect(result.interventionRisk?.estimate).toBeCloseTo(0.1, 12);
    expect(result.comparisonRisk).toEqual({ estimate: 0.2, lower: null, upper: null });
  });
});
