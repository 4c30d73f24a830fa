import { describe, expect, it } from 'vitest';
import { flagForField } from '../../src/cli/flag-for-field.ts';

// The core names a problem's field after the flag it was given ("--rr") plus the part of the
// effect ("--rr.lower"); the user typed the interval as --ci and the level as --level.

describe('flagForField', () => {
  it.each([
    ['--rr', '--rr'],
    ['--baseline', '--baseline'],
    ['--rr.estimate', '--rr'],
    ['--rrr.lower', '--ci'],
    ['--hr.upper', '--ci'],
    ['--or.interval', '--ci'],
    ['--arr.level', '--level'],
    ['--counts.level', '--level'],
    ['--rr.period', '--over/--to'],
    ['--rr.baseline', '--baseline'],
  ])('names %s as the option %s', (field, flag) => {
    expect(flagForField(field)).toBe(flag);
  });

  it.each(['outcomes.0.baseline.risk', 'intervention', 'level', '(file)'])('names no option for the field %s', (field) => {
    expect(flagForField(field)).toBeNull();
  });
});
