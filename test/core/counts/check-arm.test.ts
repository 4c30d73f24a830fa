import { describe, expect, it } from 'vitest';
import { checkArm } from '../../../src/core/counts/check-arm.ts';
import { problemOf } from './support.ts';

// Common practice: a trial arm is a whole number of events out of a whole number of people,
// 0 ≤ events ≤ total and total ≥ 1.
describe('checkArm', () => {
  it('accepts whole counts with events from 0 up to the total', () => {
    expect(() => checkArm({ events: 0, total: 1 }, 'intervention')).not.toThrow();
    expect(() => checkArm({ events: 12, total: 100 }, 'intervention')).not.toThrow();
    expect(() => checkArm({ events: 100, total: 100 }, 'comparison')).not.toThrow();
  });

  it('rejects fractional, infinite or unsafe counts as not whole, naming the arm as events/total', () => {
    expect(problemOf(() => checkArm({ events: 2.5, total: 10 }, 'intervention'))).toEqual({
      code: 'counts-not-whole',
      field: 'intervention',
      values: { input: '2.5/10' },
    });
    expect(problemOf(() => checkArm({ events: 2, total: 10.1 }, 'comparison')).code).toBe('counts-not-whole');
    expect(problemOf(() => checkArm({ events: Number.NaN, total: 10 }, 'comparison')).code).toBe('counts-not-whole');
    expect(problemOf(() => checkArm({ events: 1, total: Infinity }, 'comparison')).code).toBe('counts-not-whole');
  });

  it('refuses more than a billion people in an arm as too large, quoting the arm as typed', () => {
    expect(problemOf(() => checkArm({ events: 1, total: 2 ** 60 }, 'comparison')).code).toBe('counts-too-large');
    expect(problemOf(() => checkArm({ events: 1, total: 1e10 }, 'comparison', '1/1e10'))).toEqual({
      code: 'counts-too-large',
      field: 'comparison',
      values: { input: '1/1e10', limit: '1,000,000,000' },
    });
    expect(() => checkArm({ events: 1, total: 1_000_000_000 }, 'comparison')).not.toThrow();
  });

  it('rejects negative events or totals', () => {
    expect(problemOf(() => checkArm({ events: -1, total: 10 }, 'intervention'))).toEqual({
      code: 'counts-negative',
      field: 'intervention',
      values: { input: '-1/10' },
    });
    expect(problemOf(() => checkArm({ events: 0, total: -5 }, 'comparison')).code).toBe('counts-negative');
  });

  it('rejects an arm with no people', () => {
    expect(problemOf(() => checkArm({ events: 0, total: 0 }, 'comparison'))).toEqual({
      code: 'counts-total-zero',
      field: 'comparison',
      values: { input: '0/0' },
    });
  });

  it('rejects more events than people', () => {
    expect(problemOf(() => checkArm({ events: 11, total: 10 }, 'intervention'))).toEqual({
      code: 'counts-events-above-total',
      field: 'intervention',
      values: { input: '11/10' },
    });
  });
});
