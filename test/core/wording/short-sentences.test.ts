import { describe, expect, it } from 'vitest';
import type { TopicResult } from '../../../src/core/topic/topic-result.ts';
import { shortHandoutSentences } from '../../../src/core/wording/topic-wording.ts';
import type { SentenceKind } from '../../../src/core/wording/wording-sentence.ts';
import { strokeTopic, topicFixture } from './result-fixture.ts';

/** The short sentence of a kind about the tablet, printed under compact pictures. */
const shortOf = (result: TopicResult, kind: SentenceKind, showNnt = false): string | undefined =>
  shortHandoutSentences(result, { showNnt }).find((found) => found.kind === kind && found.optionId === 'tablet')?.text;

const harm = (intervention: number, range: { lower: number; upper: number } | null, wanted = false) =>
  topicFixture([
    {
      name: 'muscle pain',
      kind: 'harm',
      wanted,
      comparison: 5,
      options: [{ id: 'tablet', name: 'the tablet', intervention, range, certainty: 'low' }],
    },
  ]);

// The short form carries the same facts as the change, range and certainty sentences (IPDASi item 6 on
// levels of uncertainty; Trevena et al. 2013 on the same denominator), with the option named once and
// the outcome said as "it", as the picture's heading and captions already name them.
describe('the short change-with-range sentence', () => {
  it('gives the people who avoid the outcome and the range on the same denominator', () => {
    const result = strokeTopic();
    expect(shortOf(result, 'short-effect')).toBe(
      'The tablet: about 4 in 100 avoid it because of the option (somewhere between 2 and 6 in 100).',
    );
    expect(shortHandoutSentences(result, { showNnt: false })[0]?.numbers).toEqual({
      avoided: 4,
      denominator: 100,
      rangeLow: 2,
      rangeHigh: 6,
    });
  });

  it('gives the people who get a harm because of the option', () => {
    expect(shortOf(harm(14, { lower: 8, upper: 22 }), 'short-effect')).toBe(
      'The tablet: about 9 more in 100 have it because of the option (somewhere between 3 and 17 in 100).',
    );
  });

  it('gives the people who have a wanted event because of the option, never "avoid"', () => {
    expect(shortOf(harm(26, { lower: 20, upper: 33 }, true), 'short-effect')).toBe(
      'The tablet: about 21 more in 100 have it because of the option (somewhere between 15 and 28 in 100).',
    );
    expect(shortOf(harm(3, { lower: 2, upper: 4 }, true), 'short-effect')).toBe(
      'The tablet: about 2 fewer in 100 have it because of the option (somewhere between 1 and 3 in 100).',
    );
  });

  it('does not put "have" before a name that starts with a verb in -ing', () => {
    const result = topicFixture([
      {
        name: 'needing a hospital stay',
        kind: 'harm',
        comparison: 5,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 8, range: { lower: 6, upper: 11 } }],
      },
    ]);
    expect(shortOf(result, 'short-effect')).toBe(
      'The tablet: it happens to about 3 more in 100 because of the option (somewhere between 1 and 6 in 100).',
    );
  });

  it('says a range that crosses no difference goes from fewer to more', () => {
    expect(shortOf(harm(5, { lower: 2, upper: 9 }), 'short-effect')).toBe(
      'The tablet: little or no difference, about 5 in 100 have it either way (anywhere from 3 fewer to 4 more in 100).',
    );
  });

  it('says the direction of a range when it is not the change’s own', () => {
    expect(shortOf(harm(5, { lower: 5, upper: 7 }), 'short-effect')).toBe(
      'The tablet: little or no difference, about 5 in 100 have it either way (somewhere between 0 and 2 more in 100).',
    );
  });

  it('says when the research does not tell how precise the numbers are', () => {
    const result = strokeTopic({ range: null });
    expect(shortOf(result, 'short-effect-unknown')).toBe(
      'The tablet: about 4 in 100 avoid it because of the option (the research does not tell us how precise this is).',
    );
  });

  it('writes the rare-words denominators, 1000 and 10,000', () => {
    const per1000 = topicFixture(
      [{ comparison: 150, options: [{ id: 'tablet', name: 'the tablet', intervention: 110, range: { lower: 90, upper: 130 } }] }],
      { denominator: 1000 },
    );
    expect(shortOf(per1000, 'short-effect')).toBe(
      'The tablet: about 40 in 1000 avoid it because of the option (somewhere between 20 and 60 in 1000).',
    );
    const per10000 = { ...per1000, wordsDenominator: 10000 } as const;
    expect(shortOf(per10000, 'short-effect')).toBe(
      'The tablet: about 40 in 10,000 avoid it because of the option (somewhere between 20 and 60 in 10,000).',
    );
  });
});

// Santesso N et al. 2020, "GRADE guidelines 26", J Clin Epidemiol 119:126–135, Table 2: the same
// certainty words as the full statement ("reduces", "probably reduces", "may reduce", "the evidence
// is very uncertain"), the option said as "it".
describe('the short certainty statement', () => {
  it('keeps the GRADE words for each certainty', () => {
    expect(shortOf(strokeTopic({ certainty: 'high' }), 'short-certainty')).toBe('It reduces the chance.');
    expect(shortOf(strokeTopic({ certainty: 'moderate' }), 'short-certainty')).toBe('It probably reduces the chance.');
    expect(shortOf(strokeTopic({ certainty: 'low' }), 'short-certainty')).toBe('It may reduce the chance.');
    expect(shortOf(strokeTopic({ certainty: 'very-low' }), 'short-certainty')).toBe(
      'The evidence is very uncertain about its effect.',
    );
  });

  it('says "increase" for a harm and "little or no difference" when the counts show no change', () => {
    expect(shortOf(harm(14, { lower: 8, upper: 22 }), 'short-certainty')).toBe('It may increase the chance.');
    expect(shortOf(harm(5, { lower: 2, upper: 9 }), 'short-certainty')).toBe(
      'It may result in little or no difference to the chance.',
    );
  });

  it('is left out when the result has no certainty', () => {
    expect(shortOf(strokeTopic({ certainty: null }), 'short-certainty')).toBeUndefined();
  });
});

// Altman DG 1998, "Confidence intervals for the number needed to treat", BMJ 317:1309–1312: the label
// (NNTB or NNTH) and the interval, as in the full sentence.
describe('the short NNT sentence', () => {
  it('keeps the label, the period and the reference class, only when asked for', () => {
    const result = strokeTopic({ nnt: { rounded: 25, label: 'NNTB' } });
    expect(shortOf(result, 'short-nnt')).toBeUndefined();
    expect(shortOf(result, 'short-nnt', true)).toMatch(
      /^NNTB 25( \([^)]*\))?: treating 25 people like you for 10 years prevents it in one of them\./,
    );
  });
});
