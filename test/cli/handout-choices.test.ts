import { describe, expect, it } from 'vitest';
import { handoutChoices } from '../../src/cli/handout-choices.ts';

// The command line's flags win over a topic file's stored choices, one by one (common practice
// of command lines: an explicit flag overrides a stored setting).
const none = { paper: null, showNnt: null, per: null } as const;
const stored = { showNnt: true, per: 1000, outline: true, paper: 'letter' } as const;

describe('the handout choices of the command line', () => {
  it('are the defaults when neither flags nor the file give any', () => {
    expect(handoutChoices(none, undefined)).toEqual({ paper: 'a4', showNnt: false, per: null });
  });

  it('are the file’s when no flag is given', () => {
    expect(handoutChoices(none, stored)).toEqual({ paper: 'letter', showNnt: true, per: 1000 });
  });

  it('take each flag given over the file’s choice', () => {
    expect(handoutChoices({ paper: 'a4', showNnt: null, per: null }, stored)).toEqual({ paper: 'a4', showNnt: true, per: 1000 });
    expect(handoutChoices({ paper: null, showNnt: false, per: 100 }, stored)).toEqual({
      paper: 'letter',
      showNnt: false,
      per: 100,
    });
  });
});
