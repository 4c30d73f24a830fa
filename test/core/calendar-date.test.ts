import { describe, expect, it } from 'vitest';
import { readCalendarDate } from '../../src/core/calendar-date.ts';

// ISO 8601-1:2019, 5.2.2.1: a calendar date in the extended format is YYYY-MM-DD; the Gregorian
// calendar's months have 28 to 31 days, February 29 in a leap year (divisible by 4, but not by 100
// unless also by 400).

describe('readCalendarDate', () => {
  it('reads a date written YYYY-MM-DD, with spaces around it', () => {
    expect(readCalendarDate('2028-06-30')).toEqual({ kind: 'date', year: 2028, month: 6, day: 30 });
    expect(readCalendarDate('  2026-01-01 ')).toEqual({ kind: 'date', year: 2026, month: 1, day: 1 });
  });

  it('knows the leap years: 2028 and 2000 have 29 February, 2027 and 2100 do not', () => {
    expect(readCalendarDate('2028-02-29').kind).toBe('date');
    expect(readCalendarDate('2000-02-29').kind).toBe('date');
    expect(readCalendarDate('2027-02-29').kind).toBe('not-real');
    expect(readCalendarDate('2100-02-29').kind).toBe('not-real');
  });

  it('refuses days and months that do not exist', () => {
    expect(readCalendarDate('2028-04-31').kind).toBe('not-real');
    expect(readCalendarDate('2028-13-01').kind).toBe('not-real');
    expect(readCalendarDate('2028-00-10').kind).toBe('not-real');
    expect(readCalendarDate('2028-06-00').kind).toBe('not-real');
  });

  it('reads a year below 100 as that year, not as one of the 1900s', () => {
    expect(readCalendarDate('0099-12-31')).toEqual({ kind: 'date', year: 99, month: 12, day: 31 });
  });

  it('says when a text is not written YYYY-MM-DD at all', () => {
    for (const text of ['30/06/2028', '2028-6-30', 'June 2028', '20280630', '']) {
      expect(readCalendarDate(text).kind).toBe('not-written');
    }
  });
});
