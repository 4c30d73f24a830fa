import { describe, expect, it } from 'vitest';
import { oddsRatio } from '../../../src/core/counts/odds-ratio.ts';
import { zForLevel } from '../../../src/core/counts/z-for-level.ts';
import { problemOf } from './support.ts';

describe('oddsRatio', () => {
  // Altman DG. Practical Statistics for Medical Research. Chapman & Hall, 1991, §10.11.2:
  // a = 32, b = 118, c = 17, d = 127 → OR 2.026, SE(ln OR) 0.326, 95% CI 1.069 to 3.840 (Woolf).
  it('reproduces the Woolf interval of Altman (1991) §10.11.2', () => {
    const found = oddsRatio({ events: 32, total: 150 }, { events: 17, total: 144 });
    expect(found?.estimate).toBeCloseTo(2.026, 3);
    const standardError = (Math.log(found?.upper ?? 1) - Math.log(found?.lower ?? 1)) / (2 * zForLevel(0.95));
    expect(standardError).toBeCloseTo(0.326, 3);
    expect(found?.lower).toBeCloseTo(1.069, 3);
    expect(found?.upper).toBeCloseTo(3.84, 3);
    expect(found?.corrected).toBe(false);
  });

  it('reproduces the sample odds ratio of the Physicians’ Health Study table in Agresti', () => {
    // Agresti A. Categorical Data Analysis (and An Introduction to Categorical Data Analysis),
    // myocardial infarction on placebo 189/11034 vs aspirin 104/11037: OR 1.832, 95% CI
    // 1.440 to 2.331 (from memory).
    const found = oddsRatio({ events: 189, total: 11034 }, { events: 104, total: 11037 });
    expect(found?.estimate).toBeCloseTo(1.832, 3);
    expect(found?.lower).toBeCloseTo(1.44, 3);
    expect(found?.upper).toBeCloseTo(2.331, 3);
  });

  it('gives the reciprocal when the arms are swapped', () => {
    const forward = oddsRatio({ events: 32, total: 150 }, { events: 17, total: 144 });
    const reverse = oddsRatio({ events: 17, total: 144 }, { events: 32, total: 150 });
    expect(reverse?.estimate).toBeCloseTo(1 / (forward?.estimate ?? 1), 12);
    expect(reverse?.lower).toBeCloseTo(1 / (forward?.upper ?? 1), 12);
  });

  it('adds 0.5 to every cell when a cell is 0 and says so', () => {
    // Cochrane Handbook 5.1.0 (2011) §16.9.2: 0.5 added to each cell (derived value):
    // 0/10 vs 5/10 → (0.5 × 5.5) / (10.5 × 5.5), SE = √(1/0.5 + 1/10.5 + 1/5.5 + 1/5.5).
    const found = oddsRatio({ events: 0, total: 10 }, { events: 5, total: 10 });
    expect(found?.corrected).toBe(true);
    expect(found?.estimate).toBeCloseTo(0.5 / 10.5, 12);
    const standardError = Math.sqrt(1 / 0.5 + 1 / 10.5 + 2 / 5.5);
    expect(found?.lower).toBeCloseTo((0.5 / 10.5) * Math.exp(-zForLevel(0.95) * standardError), 10);
    // An arm where everyone has the event is a zero cell too.
    expect(oddsRatio({ events: 10, total: 10 }, { events: 5, total: 10 })?.corrected).toBe(true);
  });

  it('is null when neither arm has an event or both arms are all events', () => {
    expect(oddsRatio({ events: 0, total: 3 }, { events: 0, total: 7 })).toBeNull();
    expect(oddsRatio({ events: 3, total: 3 }, { events: 7, total: 7 })).toBeNull();
  });

  it('rejects invalid arms and levels', () => {
    expect(problemOf(() => oddsRatio({ events: 1, total: 0 }, { events: 1, total: 4 })).code).toBe(
      'counts-total-zero',
    );
    expect(problemOf(() => oddsRatio({ events: 1, total: 4 }, { events: 1, total: 4 }, 1.5)).code).toBe(
      'level-out-of-range',
    );
  });
});
