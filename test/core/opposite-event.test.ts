import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeEffect } from '../../src/core/compute-effect.ts';
import { riskWithEffect, riskWithOppositeEffect } from '../../src/core/risk-with-effect.ts';

// When a trial reports the effect on the opposite event ("still in pain" for the outcome "pain
// gone"), the odds ratio simply inverts, while a risk ratio for an event is not the inverse of
// the risk ratio for its complement (Deeks JJ 2002, "Issues in the selection of a summary
// statistic for meta-analysis of clinical trials with binary outcomes", Stat Med 21:1575–1600,
// section on the choice of event).

describe('riskWithOppositeEffect', () => {
  it('applies a risk ratio to the complement: 40% pain gone is 60% still in pain, × 0.75 = 45%, so 55% pain gone', () => {
    expect(riskWithOppositeEffect('rr', 0.75, 0.4)).toBeCloseTo(0.55, 12);
  });

  it('is not the same as applying the inverse risk ratio to the event (0.4 / 0.75 = 53.3%, not 55%)', () => {
    expect(riskWithEffect('rr', 1 / 0.75, 0.4)).toBeCloseTo(0.5333333, 6);
    expect(riskWithOppositeEffect('rr', 0.75, 0.4)).not.toBeCloseTo(riskWithEffect('rr', 1 / 0.75, 0.4), 3);
  });

  it('applies a hazard ratio for death to "alive": 90% alive, HR 0.8 → 1 − 0.9^0.8 dead = 8.08%, so 91.92% alive', () => {
    // 0.9^0.8 = exp(0.8 · ln 0.9) = 0.919166 (arithmetic; Altman & Andersen 1999, BMJ 319:1492, for the formula).
    expect(riskWithOppositeEffect('hr', 0.8, 0.9)).toBeCloseTo(Math.pow(0.9, 0.8), 12);
    expect(riskWithOppositeEffect('hr', 0.8, 0.9)).toBeCloseTo(0.919166, 6);
  });

  it('inverts an odds ratio exactly: the same as applying the odds ratio to the complement', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0.05, max: 20, noNaN: true }),
        (baseline, ratio) => {
          const inverted = riskWithOppositeEffect('or', ratio, baseline);
          const viaComplement = 1 - riskWithEffect('or', ratio, 1 - baseline);
          expect(inverted).toBeCloseTo(viaComplement, 10);
        },
      ),
      { numRuns: 10_000 },
    );
  });

  it('negates an absolute reduction of the opposite event: 3 points fewer still in pain is 3 points more pain gone', () => {
    expect(riskWithOppositeEffect('arr', 0.03, 0.4)).toBeCloseTo(0.43, 12);
  });
});

describe('computeEffect with an effect for the opposite event', () => {
  it('keeps the ratio as entered, works out the risk through the complement and says so', () => {
    const result = computeEffect({
      baseline: 0.4,
      effect: { measure: 'rr', estimate: 0.75, lower: 0.6, upper: 0.9, opposite: true },
      wanted: true,
    });
    expect(result.interventionRisk?.estimate).toBeCloseTo(0.55, 12);
    // 1 − 0.6·0.6 = 64% and 1 − 0.6·0.9 = 46%, sorted.
    expect(result.interventionRisk?.lower).toBeCloseTo(0.46, 12);
    expect(result.interventionRisk?.upper).toBeCloseTo(0.64, 12);
    expect(result.relativeRisk?.estimate).toBeCloseTo(0.55 / 0.4, 12);
    expect(result.nnt.text).toBe('NNTB 7 (NNTB 5 to 17)');
    expect(result.notices.map((found) => found.code)).toContain('opposite-ratio-applied');
  });

  it('inverts an odds ratio and says that this is exact', () => {
    const result = computeEffect({ baseline: 0.3, effect: { measure: 'or', estimate: 0.5, opposite: true } });
    expect(result.interventionRisk?.estimate).toBeCloseTo(riskWithEffect('or', 2, 0.3), 12);
    expect(result.notices.map((found) => found.code)).toContain('opposite-odds-ratio-inverted');
  });

  it('turns trial counts of the opposite event into counts of the outcome (events = total − events)', () => {
    const opposite = computeEffect({
      baseline: null,
      effect: {
        measure: 'counts',
        intervention: { events: 30, total: 100 },
        comparison: { events: 50, total: 100 },
        opposite: true,
      },
      wanted: true,
    });
    const direct = computeEffect({
      baseline: null,
      effect: { measure: 'counts', intervention: { events: 70, total: 100 }, comparison: { events: 50, total: 100 } },
      wanted: true,
    });
    expect(opposite.interventionRisk).toEqual(direct.interventionRisk);
    expect(opposite.absoluteReduction).toEqual(direct.absoluteReduction);
    expect(opposite.nnt.text).toBe(direct.nnt.text);
    expect(opposite.nnt.label).toBe('NNTB');
  });
});
