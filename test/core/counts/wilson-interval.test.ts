import { describe, expect, it } from 'vitest';
import { wilsonInterval } from '../../../src/core/counts/wilson-interval.ts';
import { zForLevel } from '../../../src/core/counts/z-for-level.ts';
import { problemOf, round4 } from './support.ts';

const rounded = (events: number, total: number, level?: number) => {
  const found = wilsonInterval(events, total, level);
  return [round4(found.lower), round4(found.upper)];
};

describe('wilsonInterval', () => {
  // Newcombe RG. Two-sided confidence intervals for the single proportion: comparison of seven
  // methods. Stat Med 1998;17:857–872, Table I, method 3 (Wilson score, 95%).
  it('reproduces Newcombe (1998) Table I, method 3, to 4 decimals', () => {
    expect(rounded(81, 263)).toEqual([0.2553, 0.3662]);
    expect(rounded(15, 148)).toEqual([0.0624, 0.1605]);
    expect(rounded(0, 20)).toEqual([0, 0.1611]);
    expect(rounded(29, 29)).toEqual([0.883, 1]);
  });

  it('reports the observed proportion as the estimate', () => {
    expect(wilsonInterval(81, 263).estimate).toBeCloseTo(81 / 263, 12);
  });

  it('puts the lower bound exactly at 0 with no events and the upper exactly at 1 with all events', () => {
    // Wilson EB. Probable inference, the law of succession, and statistical inference.
    // JASA 1927;22:209–212: at x = 0 the interval is [0, z²/(n + z²)] (closed form, derived).
    expect(wilsonInterval(0, 20).lower).toBe(0);
    expect(wilsonInterval(29, 29).upper).toBe(1);
    expect(wilsonInterval(0, 1).lower).toBe(0);
    expect(wilsonInterval(1, 1).upper).toBe(1);
    const z = zForLevel(0.95);
    expect(wilsonInterval(0, 20).upper).toBeCloseTo((z * z) / (20 + z * z), 12);
  });

  it('widens with the level, following the closed form at 0 events (Wilson 1927, derived)', () => {
    const z99 = zForLevel(0.99);
    const z90 = zForLevel(0.9);
    expect(wilsonInterval(0, 20, 0.99).upper).toBeCloseTo((z99 * z99) / (20 + z99 * z99), 12);
    expect(wilsonInterval(0, 20, 0.9).upper).toBeCloseTo((z90 * z90) / (20 + z90 * z90), 12);
    // 0.99: 6.6349 / 26.6349 = 0.2491 (derived).
    expect(round4(wilsonInterval(0, 20, 0.99).upper)).toBe(0.2491);
    const narrow = wilsonInterval(81, 263, 0.9);
    const wide = wilsonInterval(81, 263, 0.99);
    expect(wide.lower).toBeLessThan(narrow.lower);
    expect(wide.upper).toBeGreaterThan(narrow.upper);
  });

  it('is symmetric: x of n mirrors n − x of n (common practice)', () => {
    const low = wilsonInterval(15, 148);
    const high = wilsonInterval(133, 148);
    expect(high.lower).toBeCloseTo(1 - low.upper, 12);
    expect(high.upper).toBeCloseTo(1 - low.lower, 12);
  });

  it('rejects invalid counts and levels', () => {
    expect(problemOf(() => wilsonInterval(3, 0)).code).toBe('counts-total-zero');
    expect(problemOf(() => wilsonInterval(5, 4)).code).toBe('counts-events-above-total');
    expect(problemOf(() => wilsonInterval(1, 4, 1)).code).toBe('level-out-of-range');
  });
});
