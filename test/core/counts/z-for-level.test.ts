import { describe, expect, it } from 'vitest';
import { zForLevel } from '../../../src/core/counts/z-for-level.ts';
import { problemOf } from './support.ts';

describe('zForLevel', () => {
  it('gives the two-sided standard normal quantiles of the usual levels', () => {
    // Standard normal table values (common practice): z(0.95) = 1.6449, z(0.975) = 1.9600,
    // z(0.995) = 2.5758, z(0.9995) = 3.2905; z(0.975) = 1.959963985 to 9 decimals.
    expect(zForLevel(0.9)).toBeCloseTo(1.644854, 6);
    expect(zForLevel(0.95)).toBeCloseTo(1.959963985, 8);
    expect(zForLevel(0.99)).toBeCloseTo(2.575829, 6);
    expect(zForLevel(0.999)).toBeCloseTo(3.290527, 6);
  });

  it('accepts a level just above 0.5, whose z is near the normal quartile 0.6745 (common practice)', () => {
    expect(zForLevel(0.5000001)).toBeCloseTo(0.67449, 5);
  });

  it('rejects levels of 0.5 or below, above 0.999, and non-numbers', () => {
    for (const level of [0.5, 0.3, 0, -0.95, 0.9991, 1, 95, Number.NaN, Infinity]) {
      const found = problemOf(() => zForLevel(level));
      expect(found.code).toBe('level-out-of-range');
      expect(found.field).toBe('level');
    }
    expect(problemOf(() => zForLevel(95)).values).toEqual({ input: 95 });
    expect(problemOf(() => zForLevel(Number.NaN)).values).toEqual({ input: 'NaN' });
  });
});
