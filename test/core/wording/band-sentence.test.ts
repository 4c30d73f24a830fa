import { describe, expect, it } from 'vitest';
import type { OptionOutcomeResult } from '../../../src/core/topic/topic-result.ts';
import { sentenceOf, topicFixture } from './result-fixture.ts';

const harm = (intervention: number, interventionRisk: number | null, denominator: 100 | 1000 = 100, comparison = 1) =>
  topicFixture(
    [
      {
        id: 'muscle',
        name: 'muscle pain',
        kind: 'harm',
        comparison,
        options: [{ id: 'tablet', name: 'the tablet', intervention, interventionRisk }],
      },
    ],
    { denominator },
  );

// Frequency bands only with the number beside them (Büchter et al. 2014, BMC Med Inform Decis Mak
// 14:76: verbal descriptors alone are overestimated; Webster et al. 2017, Drug Saf 40(8):743–754),
// the number in the topic's own denominator and never as "1 in X" (Trevena et al. 2013).
// Thresholds: EU SmPC guideline / CIOMS III.
describe('bandSentence', () => {
  it('says "common: about 3 in 100 people" for a 3% side effect', () => {
    const found = sentenceOf(harm(3, 0.03), 'band');
    expect(found?.text).toBe(
      'With the tablet, muscle pain is common: about 3 in 100 people, against about 1 in 100 with no tablet (2 more in 100).',
    );
    expect(found?.numbers).toEqual({ count: 3, denominator: 100, from: 1, caused: 2 });
  });

  it('says "very common" from 1 in 10 upwards, with the count beside it', () => {
    expect(sentenceOf(harm(10, 0.1), 'band')?.text).toBe(
      'With the tablet, muscle pain is very common: about 10 in 100 people, against about 1 in 100 with no tablet (9 more in 100).',
    );
  });

  it('says "very rare: fewer than 1 in 1000 people" for a risk that rounds to no one in 1000', () => {
    expect(sentenceOf(harm(0, 0.00005, 1000, 0), 'band')?.text).toBe(
      'With the tablet, muscle pain is very rare: fewer than 1 in 1000 people, against none of 1000 with no tablet (the same number).',
    );
  });

  it('says "rare" and "uncommon" on a denominator of 1000', () => {
    expect(sentenceOf(harm(0, 0.0004, 1000, 0), 'band')?.text).toBe(
      'With the tablet, muscle pain is rare: fewer than 1 in 1000 people, against none of 1000 with no tablet (the same number).',
    );
    expect(sentenceOf(harm(5, 0.005, 1000), 'band')?.text).toBe(
      'With the tablet, muscle pain is uncommon: about 5 in 1000 people, against about 1 in 1000 with no tablet (4 more in 1000).',
    );
  });

  it('takes the band from the unrounded risk and the number from the drawn count', () => {
    // 0.0096 is below 1/100, so uncommon, though it is drawn as 1 person in 100.
    expect(sentenceOf(harm(1, 0.0096, 100, 0), 'band')?.text).toBe(
      'With the tablet, muscle pain is uncommon: about 1 in 100 people, against none of 100 with no tablet (1 more in 100).',
    );
  });

  // "Common" is 1 in 100 up to 1 in 10 (EU SmPC guideline 2009, section 4.8): 20 and 60 in 1000 are
  // both common, so the word alone would hide a difference of 40 people; the numbers stand beside it.
  it('never lets a band word hide a difference: common with 20 and with 60 in 1000', () => {
    const found = sentenceOf(harm(60, 0.06, 1000, 20), 'band');
    expect(found?.text).toBe(
      'With the tablet, muscle pain is common: about 60 in 1000 people, against about 20 in 1000 with no tablet (40 more in 1000).',
    );
    expect(found?.numbers).toEqual({ count: 60, denominator: 1000, from: 20, caused: 40 });
  });

  it('says "fewer" when the option lowers a side effect', () => {
    expect(sentenceOf(harm(2, 0.02, 100, 5), 'band')?.text).toBe(
      'With the tablet, muscle pain is common: about 2 in 100 people, against about 5 in 100 with no tablet (3 fewer in 100).',
    );
  });

  it('says "not known" when the risk cannot be estimated', () => {
    const result = harm(3, 0.03);
    const outcome = result.outcomes[0];
    const option = outcome?.options[1];
    if (outcome === undefined || option === undefined) throw new Error('fixture');
    const unknown = { ...option, interventionRisk: null } as unknown as OptionOutcomeResult;
    const changed = { ...result, outcomes: [{ ...outcome, options: [outcome.options[0] as OptionOutcomeResult, unknown] }] };
    const found = sentenceOf(changed, 'band');
    expect(found?.text).toBe('With the tablet, how often muscle pain happens is not known.');
    expect(found?.numbers).toEqual({});
  });

  it('labels harms only, and not the comparison', () => {
    expect(sentenceOf(harm(3, 0.03), 'band', 'none')).toBeUndefined();
    const benefit = topicFixture([{ comparison: 15, options: [{ id: 'tablet', name: 'the tablet', intervention: 11 }] }]);
    expect(sentenceOf(benefit, 'band')).toBeUndefined();
  });
});
