import { describe, expect, it } from 'vitest';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import { sentenceOf, sentencesOf, strokeTopic, topicFixture } from './result-fixture.ts';

const textOf = (found: { text: string } | undefined): string | undefined => found?.text;

describe('frequencySentences', () => {
  // Natural frequencies with the reference class, the denominator and the period (IPDASi items
  // 2, 3 and 4; Trevena et al. 2013), in both frames (IPDASi item 8), as listed in Flynn et al.
  // 2013, BMC Health Serv Res 13:225, Table 5.
  it('gives the comparison as "about 15 in 100 people like you will have a stroke in the next 10 years"', () => {
    const result = strokeTopic();
    expect(textOf(sentenceOf(result, 'event-frame', 'none'))).toBe(
      'No tablet: about 15 in 100 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame', 'none'))).toBe('About 85 will not.');
  });

  it('gives every option the same sentence on the same denominator and period', () => {
    const result = strokeTopic();
    expect(textOf(sentenceOf(result, 'event-frame'))).toBe(
      'The tablet: about 11 in 100 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame'))).toBe('About 89 will not.');
  });

  it('writes the two frames from the icon array, so they add up to the denominator', () => {
    const result = strokeTopic();
    const event = sentenceOf(result, 'event-frame');
    const free = sentenceOf(result, 'free-frame');
    const groups = result.outcomes[0]?.options[1]?.groups;
    expect(event?.numbers.count).toBe((groups?.event ?? NaN) + (groups?.caused ?? NaN));
    expect((event?.numbers.count ?? NaN) + (free?.numbers.count ?? NaN)).toBe(100);
  });

  it('uses the denominator of 1000 when the topic does', () => {
    const result = topicFixture([{ comparison: 125, options: [{ id: 'tablet', name: 'the tablet', intervention: 94 }] }], {
      denominator: 1000,
    });
    expect(textOf(sentenceOf(result, 'event-frame', 'none'))).toBe(
      'No tablet: about 125 in 1000 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame'))).toBe('About 906 will not.');
  });

  it('says "fewer than 1 in 1000" when a risk above zero rounds to 0 people, never "1 in X"', () => {
    // Trevena et al. 2013: avoid "1 in X"; keep the one denominator.
    const result = topicFixture(
      [{ comparison: 2, options: [{ id: 'tablet', name: 'the tablet', intervention: 0, interventionRisk: 0.0004 }] }],
      { denominator: 1000 },
    );
    expect(textOf(sentenceOf(result, 'event-frame'))).toBe(
      'The tablet: fewer than 1 in 1000 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame'))).toBe('Nearly all 1000 will not.');
    expect(sentenceOf(result, 'event-frame')?.numbers).toEqual({ count: 0, lessThan: 1, denominator: 1000, years: 10 });
  });

  it('says "none" only when the risk is exactly zero', () => {
    const result = topicFixture([
      { comparison: 3, options: [{ id: 'tablet', name: 'the tablet', intervention: 0, interventionRisk: 0 }] },
    ]);
    expect(textOf(sentenceOf(result, 'event-frame'))).toBe(
      'The tablet: none of 100 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame'))).toBe('All 100 will stay free of it.');
  });

  it('says "nearly all" when everyone is drawn with the outcome but the risk is below one', () => {
    const result = topicFixture([
      { comparison: 100, comparisonRisk: 0.997, options: [{ id: 'tablet', name: 'the tablet', intervention: 99 }] },
    ]);
    expect(textOf(sentenceOf(result, 'event-frame', 'none'))).toBe(
      'No tablet: nearly all 100 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame', 'none'))).toBe('Fewer than 1 in 100 will not.');
  });

  it('says "all" and "none of them" when the risk is exactly one', () => {
    const result = topicFixture([
      { comparison: 100, comparisonRisk: 1, options: [{ id: 'tablet', name: 'the tablet', intervention: 90 }] },
    ]);
    expect(textOf(sentenceOf(result, 'event-frame', 'none'))).toBe(
      'No tablet: all 100 people like you will have a stroke in the next 10 years.',
    );
    expect(textOf(sentenceOf(result, 'free-frame', 'none'))).toBe('None of them will stay free of it.');
  });

  it('says "in the next year" for a period of 1 year and keeps decimals of a period', () => {
    const oneYear = topicFixture([{ comparison: 5, options: [{ id: 'tablet', name: 'the tablet', intervention: 4 }] }], {
      periodYears: 1,
    });
    expect(textOf(sentenceOf(oneYear, 'event-frame'))).toBe(
      'The tablet: about 4 in 100 people like you will have a stroke in the next year.',
    );
    const halfYears = topicFixture([{ comparison: 5, options: [{ id: 'tablet', name: 'the tablet', intervention: 4 }] }], {
      periodYears: 2.5,
    });
    expect(textOf(sentenceOf(halfYears, 'event-frame'))).toContain('in the next 2.5 years.');
  });

  it('reads "will end up" before an outcome named with a verb in -ing', () => {
    const result = topicFixture(
      [{ name: 'dying of bowel cancer', comparison: 30, options: [{ id: 'tablet', name: 'screening', intervention: 24 }] }],
      { denominator: 1000 },
    );
    expect(textOf(sentenceOf(result, 'event-frame', 'none'))).toBe(
      'No tablet: about 30 in 1000 people like you will end up dying of bowel cancer in the next 10 years.',
    );
  });

  it('uses a reference-class phrase given in place of "people like you"', () => {
    const wording = topicWording(strokeTopic(), { groupPhrase: { one: 'woman like you', other: 'women like you' } });
    expect(sentencesOf(wording, 'none')[0]?.text).toBe(
      'No tablet: about 15 in 100 women like you will have a stroke in the next 10 years.',
    );
  });

  it('starts the sentence with a capital even when the option name does not have one', () => {
    expect(textOf(sentenceOf(strokeTopic(), 'event-frame', 'none'))?.startsWith('No tablet:')).toBe(true);
  });
});
