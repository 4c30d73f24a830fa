import { describe, expect, it } from 'vitest';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

// The change an option makes, shown as its own count of people ("incremental" risk), in the same
// denominator as the totals: Zikmund-Fisher et al. 2008, J Health Commun 13(2):107–124; Trevena
// et al. 2021, Med Decis Making 41(7):834–847 (incremental absolute risk differences).
describe('changeSentence', () => {
  it('says how many of the same 100 people avoid the outcome with the option', () => {
    const found = sentenceOf(strokeTopic(), 'change');
    expect(found?.text).toBe('With the tablet, about 4 of those 100 people avoid a stroke.');
    expect(found?.numbers).toEqual({ avoided: 4, denominator: 100 });
  });

  it("takes the number from the icon array's prevented group, which equals the rounded difference", () => {
    const result = strokeTopic();
    const option = result.outcomes[0]?.options[1];
    expect(sentenceOf(result, 'change')?.numbers.avoided).toBe(option?.groups.prevented);
    expect(option?.perPeople?.difference).toBe(option?.groups.prevented);
  });

  it('uses the singular for one person', () => {
    const result = topicFixture([{ comparison: 5, options: [{ id: 'tablet', name: 'the tablet', intervention: 4 }] }]);
    expect(sentenceOf(result, 'change')?.text).toBe('With the tablet, about 1 of those 100 people avoids a stroke.');
  });

  it('says how many get a harm because of the option', () => {
    const result = topicFixture([
      {
        id: 'muscle',
        name: 'muscle pain',
        kind: 'harm',
        isHeadline: false,
        comparison: 5,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 7 }],
      },
    ]);
    const found = sentenceOf(result, 'change');
    expect(found?.text).toBe('About 2 in 100 get muscle pain because of the tablet.');
    expect(found?.numbers).toEqual({ caused: 2, denominator: 100 });
  });

  it('words a negative difference on a benefit outcome as extra people with it, never as negative people', () => {
    const result = topicFixture([{ comparison: 15, options: [{ id: 'tablet', name: 'the tablet', intervention: 16 }] }]);
    expect(sentenceOf(result, 'change')?.text).toBe('About 1 in 100 gets a stroke because of the tablet.');
    expect(sentenceOf(result, 'change')?.text).not.toMatch(/-\d|−\d/);
  });

  // "No difference" is said only when the difference is exactly 0 (common practice: rounding
  // must not turn a small difference into none); otherwise the sentence says it is below one person.
  it('says the option makes little or no difference only when the difference is exactly 0', () => {
    const result = topicFixture([
      { comparison: 15, options: [{ id: 'tablet', name: 'the tablet', intervention: 15, interventionRisk: 0.15 }] },
    ]);
    const found = sentenceOf(result, 'change');
    expect(found?.text).toBe(
      'The tablet makes little or no difference to how many people have a stroke: about 15 in 100 either way.',
    );
    expect(found?.numbers).toEqual({ count: 15, denominator: 100 });
  });

  it('says a difference that rounding hides is smaller than one person, in its direction', () => {
    const result = topicFixture([
      { comparison: 15, options: [{ id: 'tablet', name: 'the tablet', intervention: 15, interventionRisk: 0.148 }] },
    ]);
    const found = sentenceOf(result, 'change');
    expect(found?.text).toBe(
      'With the tablet, slightly fewer people have a stroke, but the difference is smaller than 1 in 100 people: about 15 in 100 either way.',
    );
    expect(found?.numbers).toEqual({ count: 15, denominator: 100, lessThan: 1 });
  });

  it('says "fewer than 1 in 1000 either way" when both counts are 0 but the risks are not', () => {
    const result = topicFixture(
      [
        {
          comparison: 0,
          comparisonRisk: 0.0003,
          options: [{ id: 'tablet', name: 'the tablet', intervention: 0, interventionRisk: 0.0002 }],
        },
      ],
      { denominator: 1000 },
    );
    expect(sentenceOf(result, 'change')?.text).toBe(
      'With the tablet, slightly fewer people have a stroke, but the difference is smaller than 1 in 1000 people: fewer than 1 in 1000 either way.',
    );
  });

  it('words the change of an outcome named with a verb in -ing with "end up"', () => {
    const result = topicFixture([
      {
        name: 'needing a hip operation',
        kind: 'harm',
        comparison: 2,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 3 }],
      },
    ]);
    expect(sentenceOf(result, 'change')?.text).toBe('About 1 in 100 ends up needing a hip operation because of the tablet.');
  });
});
