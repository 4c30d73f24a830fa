import { describe, expect, it } from 'vitest';
import { FILL_ORDER, fillSequence } from '../../src/render/fill-sequence.ts';

describe('fillSequence', () => {
  it('puts the groups in the order event, prevented, caused, free', () => {
    expect(FILL_ORDER).toEqual(['event', 'prevented', 'caused', 'free']);
    const sequence = fillSequence({ denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 });
    expect(sequence.slice(0, 15).every((group) => group === 'event')).toBe(true);
    expect(sequence.slice(15, 20).every((group) => group === 'prevented')).toBe(true);
    expect(sequence.slice(20).every((group) => group === 'free')).toBe(true);
  });

  // Count conservation: events + increment + no event = denominator exactly
  // (common practice for icon arrays: every person belongs to exactly one group).
  it('rejects counts that do not sum to the denominator', () => {
    expect(() => fillSequence({ denominator: 100, event: 15, prevented: 5, caused: 0, free: 79 })).toThrow(RangeError);
  });

  it('rejects negative or fractional counts', () => {
    expect(() => fillSequence({ denominator: 100, event: -1, prevented: 0, caused: 0, free: 101 })).toThrow(RangeError);
    expect(() => fillSequence({ denominator: 100, event: 0.5, prevented: 0, caused: 0, free: 99.5 })).toThrow(RangeError);
  });
});
