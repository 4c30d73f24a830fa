import { describe, expect, it } from 'vitest';
import { oddsRatio } from '../../../src/core/counts/odds-ratio.ts';
import { zForLevel } from '../../../src/core/counts/z-for-level.ts';
import { problemOf } from './support.ts';

describe('oddsRatio', () => {
  // Altman DG. Practical Statistics for Medical Research. Chapman & Hall, 1991, §10.11.2:
  // a = 32, b = 118, c = 17, d = 127 → OR 2.026, SE(ln OR) 0.326, 95% CI 1.069 to 3.840 (Woolf).
  // Recomputed with SciPy:
  // python3 -c "from scipy.stats.contingency import odds_ratio as o; r = o([[32, 17], [118, 127]], kind='sample'); print(r.statistic, r.confidence_interval(0.95))"
  // → 2.0259222333000997, 1.0689080998211271 to 3.839769664077291.
  it('reproduces the Woolf interval of Altman (1991) §10.11.2', () => {
    const found = oddsRatio({ events: 32, total: 150 }, { events: 17, total: 144 });
    expect(found?.estimate).toBeCloseTo(2.026, 3);
    const standardError = (Math.log(found?.upper ?? 1) - Math.log(found?.lower ?? 1)) / (2 * zForLevel(0.95));
    expect(standardError).toBeCloseTo(0.326, 3);
    expect(found?.lower).toBeCloseTo(1.069, 3);
    expect(found?.upper).toBeCloseTo(3.84, 3);
    expect(found?.corrected).toBe(false);
  });

  it('reproduces the Berkeley admissions table of R’s documentation, a large table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details and Examples: 1198 of 2691 men and
    // 557 of 1835 women admitted (Bickel PJ, Hammel EA, O'Connell JW. Sex bias in graduate
    // admissions: data from Berkeley. Science 1975;187:398–403). The help text gives "a sample odds
    // ratio of 1.83", but 1198 × 1278 / (557 × 1493) = 1.8411 (derived), so the check takes 1.84,
    // and the Woolf limits, from SciPy:
    // python3 -c "from scipy.stats.contingency import odds_ratio as o; r = o([[1198, 557], [1493, 1278]], kind='sample'); print(r.statistic, r.confidence_interval(0.95))"
    // → 1.8410800371812925, 1.6243769097450054 to 2.0866928623354815.
    const found = oddsRatio({ events: 1198, total: 2691 }, { events: 557, total: 1835 });
    expect(found?.estimate).toBeCloseTo(1.84, 2);
    expect(found?.estimate).toBeCloseTo(1.8410800371812925, 12);
    expect(found?.lower).toBeCloseTo(1.6243769097450054, 10);
    expect(found?.upper).toBeCloseTo(2.0866928623354815, 10);
    expect(found?.corrected).toBe(false);
  });

  it('reproduces SciPy’s documented whales-and-sharks table, a small table with a cell of 1', () => {
    // SciPy documentation (1.17), scipy.stats.fisher_exact, Examples: [[8, 2], [1, 5]],
    // res.statistic 20.0 (the sample odds ratio, 8 × 5 / (2 × 1)). Woolf limits recomputed with SciPy:
    // python3 -c "from scipy.stats.contingency import odds_ratio as o; print(o([[8, 1], [2, 5]], kind='sample').confidence_interval(0.95))"
    // → 1.4161851393939529 to 282.44894602634895.
    const found = oddsRatio({ events: 8, total: 9 }, { events: 2, total: 7 });
    expect(found?.estimate).toBeCloseTo(20, 12);
    expect(found?.lower).toBeCloseTo(1.4161851393939529, 10);
    expect(found?.upper).toBeCloseTo(282.44894602634895, 8);
    expect(found?.corrected).toBe(false);
  });

  it('reproduces SciPy’s documented chemical-exposure table with the Woolf interval', () => {
    // SciPy documentation (1.17), scipy.stats.contingency.odds_ratio, Examples: cases 7 exposed and
    // 15 unexposed, noncases 58 and 472; sample odds ratio 7 × 472 / (15 × 58), Woolf limits:
    // python3 -c "from scipy.stats.contingency import odds_ratio as o; r = o([[7, 15], [58, 472]], kind='sample'); print(r.statistic, r.confidence_interval(0.95))"
    // → 3.7977011494252872, 1.4869302660564157 to 9.699536252360435.
    const found = oddsRatio({ events: 7, total: 65 }, { events: 15, total: 487 });
    expect(found?.estimate).toBeCloseTo(3.7977011494252872, 12);
    expect(found?.lower).toBeCloseTo(1.4869302660564157, 10);
    expect(found?.upper).toBeCloseTo(9.699536252360435, 10);
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
    expect(problemOf(() => oddsRatio({ events: 1, total: 0 }, { events: 1, total: 4 })).code).toBe('counts-total-zero');
    expect(problemOf(() => oddsRatio({ events: 1, total: 4 }, { events: 1, total: 4 }, 1.5)).code).toBe('level-out-of-range');
  });
});
