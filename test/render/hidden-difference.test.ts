/**
 * Differences the pictures cannot show. Counts are risks times the denominator rounded half up
 * (common practice); the expected values are derived by hand beside each check.
 */
import { describe, expect, it } from 'vitest';
import { hiddenDifference } from '../../src/render/hidden-difference.ts';

describe('hiddenDifference', () => {
  it('is null for an exact difference of 0, the one case for "the same number"', () => {
    expect(hiddenDifference({ comparison: 0.003, intervention: 0.003 }, 1000, null)).toBeNull();
  });

  it('is null when the pictures show the difference as whole people', () => {
    // 0.02 and 0.015 of 1000: 20 and 15.
    expect(hiddenDifference({ comparison: 0.02, intervention: 0.015 }, 1000, null)).toBeNull();
  });

  it('counts a difference hidden at 1000 per the smallest denominator that shows it', () => {
    // 0.001 and 0.0008: 1 and 1 of 1000; 10 and 8 of 10,000.
    expect(hiddenDifference({ comparison: 0.001, intervention: 0.0008 }, 1000, null)).toEqual({
      direction: 'fewer',
      count: 2,
      denominator: 10000,
    });
    // 0.00001 and 0.000013: 0 and 0 of 10,000; 1 and 1 of 100,000; 10 and 13 of a million.
    expect(hiddenDifference({ comparison: 0.00001, intervention: 0.000013 }, 1000, null)).toEqual({
      direction: 'more',
      count: 3,
      denominator: 1000000,
    });
  });

  it('takes the words’ own counts when they show it, so chart and sentences share a denominator', () => {
    const words = { denominator: 100000 as const, comparison: 100, intervention: 80, difference: 20, interventionRange: null };
    expect(hiddenDifference({ comparison: 0.001, intervention: 0.0008 }, 1000, words)).toEqual({
      direction: 'fewer',
      count: 20,
      denominator: 100000,
    });
  });

  it('says below one in a million with no count', () => {
    // 0.0000001 apart: 0 people of a million either way.
    expect(hiddenDifference({ comparison: 0.0000002, intervention: 0.0000001 }, 1000, null)).toEqual({
      direction: 'fewer',
      count: 0,
      denominator: null,
    });
  });
});
