import { describe, expect, test } from 'vitest';
import { yearsFrom } from '../../../src/core/time-unit.ts';
import { periodWords } from '../../../src/ui/results/period-words.ts';

describe('periodWords', () => {
  test('says a period in the unit it was given in, one in the singular', () => {
    expect(periodWords(yearsFrom(3, 'days'), 'days')).toBe('3 days');
    expect(periodWords(yearsFrom(1, 'weeks'), 'weeks')).toBe('1 week');
    expect(periodWords(0.5, 'months')).toBe('6 months');
    expect(periodWords(10, 'years')).toBe('10 years');
    expect(periodWords(1, 'years')).toBe('1 year');
  });

  test('keeps at most two decimals of an amount that is not whole', () => {
    expect(periodWords(2.5, 'years')).toBe('2.5 years');
    expect(periodWords(1 / 3, 'years')).toBe('0.33 years');
  });
});
