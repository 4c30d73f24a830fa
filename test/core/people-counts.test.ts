import { describe, expect, it } from 'vitest';
import { roundHalfUp } from '../../src/core/float-safe.ts';
import { peopleGroups } from '../../src/core/people-groups.ts';
import { chooseDenominator, peopleCounts, peopleFor } from '../../src/core/people-counts.ts';

describe('people counts are rounded half up on the decimal value (common practice)', () => {
  it('rounds 0.145 of 100 people to 15, where Math.round(0.145 * 100) gives 14', () => {
    expect(Math.round(0.145 * 100)).toBe(14);
    expect(peopleFor(0.145, 100)).toBe(15);
  });
  it.each([
    [12.5, 13],
    [12.4999, 12],
    [0.5, 1],
    [0, 0],
    [100, 100],
  ])('rounds %d to %d', (value, expected) => {
    expect(roundHalfUp(value)).toBe(expected);
  });

  it('turns an interval into people the same way', () => {
    const counts = peopleCounts(0.2, { estimate: 0.15, lower: 0.12, upper: 0.18 }, 100);
    expect(counts).toEqual({
      denominator: 100,
      comparison: 20,
      intervention: 15,
      difference: 5,
      interventionRange: { lower: 12, upper: 18 },
    });
  });
});

describe('chooseDenominator keeps 100 unless it hides or distorts a number', () => {
  it('keeps 100 for 20% against 15%', () => {
    expect(chooseDenominator([{ comparison: 0.2, intervention: 0.15 }])).toBe(100);
  });
  // 12.5% with RR 0.75 is 9.375%: per 100 that is 13 against 9, a difference of 4 where the truth is
  // 3.125; per 1000 it is 125 against 94 (difference 31, truth 31.25). Check values computed (derived).
  it('switches to 1000 when rounding moves the difference by half a person or more', () => {
    expect(chooseDenominator([{ comparison: 0.125, intervention: 0.09375 }])).toBe(1000);
    expect(peopleCounts(0.125, { estimate: 0.09375, lower: null, upper: null }, 1000).difference).toBe(31);
  });
  it('switches to 1000 when a non-zero risk would show as 0 people', () => {
    expect(chooseDenominator([{ comparison: 0.004, intervention: 0.004 }])).toBe(1000);
  });
  it('switches to 1000 when a non-zero difference would show as 0', () => {
    expect(chooseDenominator([{ comparison: 0.2, intervention: 0.198 }])).toBe(1000);
  });
  it('uses one denominator for every pair of a topic', () => {
    expect(
      chooseDenominator([
        { comparison: 0.2, intervention: 0.15 },
        { comparison: 0.125, intervention: 0.09375 },
      ]),
    ).toBe(1000);
  });
  it('keeps 100 for a difference of exactly 0', () => {
    expect(chooseDenominator([{ comparison: 0.2, intervention: 0.2 }])).toBe(100);
  });
});

describe('peopleGroups derives the chart groups from the rounded counts', () => {
  it('splits a benefit into event, prevented and free', () => {
    expect(peopleGroups(20, 15, 100)).toEqual({ denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 });
  });
  it('splits a harm into event, caused and free', () => {
    expect(peopleGroups(2, 3, 100)).toEqual({ denominator: 100, event: 2, prevented: 0, caused: 1, free: 97 });
  });
  it('gives the comparison arm only event and free', () => {
    expect(peopleGroups(30, 30, 1000)).toEqual({ denominator: 1000, event: 30, prevented: 0, caused: 0, free: 970 });
  });
});
