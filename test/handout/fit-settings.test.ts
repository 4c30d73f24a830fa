import { describe, expect, it } from 'vitest';
import { FIT_LADDER, type FitSettings, MIN_BODY_SIZE, MIN_LIST_SIZE, ROOMY } from '../../src/handout/fit-settings.ts';

const SIZES = [
  'body',
  'title',
  'heading',
  'list',
  'table',
  'chartText',
  'cell100',
  'cell1000',
  'closeUpCell',
  'space',
  'writingLines',
  'bodyLeading',
  'listLeading',
  'rowPadding',
] as const;

describe('the fit ladder', () => {
  it('starts with body text at 12 points', () => {
    expect(FIT_LADDER[0]).toEqual(ROOMY);
    expect(ROOMY.body).toBe(12);
  });

  // European Commission (2009), readability guideline: at least 9 points; body text kept at 11 points or more here.
  it('never sets body text below 11 points nor table and list text below 9', () => {
    for (const settings of FIT_LADDER) {
      expect(settings.body).toBeGreaterThanOrEqual(MIN_BODY_SIZE);
      expect(Math.min(settings.list, settings.table)).toBeGreaterThanOrEqual(MIN_LIST_SIZE);
    }
    expect(MIN_BODY_SIZE).toBe(11);
    expect(MIN_LIST_SIZE).toBe(9);
  });

  it('shrinks the table and lists to their smallest before the body text gives way', () => {
    for (const settings of FIT_LADDER) {
      if (settings.body < ROOMY.body) expect([settings.list, settings.table]).toEqual([MIN_LIST_SIZE, MIN_LIST_SIZE]);
    }
  });

  it('only ever makes things smaller or tighter from one step to the next', () => {
    FIT_LADDER.slice(1).forEach((settings, index) => {
      const before = FIT_LADDER[index] as FitSettings;
      for (const key of SIZES) expect(settings[key]).toBeLessThanOrEqual(before[key]);
      expect(SIZES.some((key) => settings[key] < before[key])).toBe(true);
    });
  });

  // Line spacing of at least 1.2 (common practice for plain-language leaflets).
  it('keeps line spacing at 1.2 or more', () => {
    for (const settings of FIT_LADDER) expect(Math.min(settings.bodyLeading, settings.listLeading)).toBeGreaterThanOrEqual(1.2);
  });
});
