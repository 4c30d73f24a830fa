import { describe, expect, it } from 'vitest';
import { rangeCase } from '../../../src/core/wording/range-sentence.ts';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

// Uncertainty as a numeric range of the absolute effect next to the estimate, on the same
// denominator (IPDASi item 6; van der Bles et al. 2019, R Soc Open Sci 6:181870, direct
// uncertainty as a range). Where no interval exists, say so (IPDAS certification criterion on
// levels of uncertainty: Joseph-Williams et al. 2014, Med Decis Making 34(6):699–710).
describe('rangeCase', () => {
  it("turns the option's range of 9 to 13 people against 15 into 2 to 6 people avoiding the outcome", () => {
    expect(rangeCase(15, { lower: 9, upper: 13 })).toEqual({ variant: 'avoid', low: 2, high: 6 });
  });

  it('turns a range above the comparison into people getting the outcome', () => {
    expect(rangeCase(5, { lower: 6, upper: 9 })).toEqual({ variant: 'get', low: 1, high: 4 });
  });

  it('gives a range that crosses no change as "fewer" and "more"', () => {
    expect(rangeCase(15, { lower: 12, upper: 17 })).toEqual({ variant: 'either', fewer: 3, more: 2 });
  });

  it('includes 0 at one end without calling it a crossing', () => {
    expect(rangeCase(15, { lower: 11, upper: 15 })).toEqual({ variant: 'avoid', low: 0, high: 4 });
    expect(rangeCase(5, { lower: 5, upper: 7 })).toEqual({ variant: 'get', low: 0, high: 2 });
  });

  it('calls a range of one count narrow, and a range of exactly the comparison no change', () => {
    expect(rangeCase(15, { lower: 11, upper: 11 })).toEqual({ variant: 'narrow', direction: 'fewer', count: 4 });
    expect(rangeCase(5, { lower: 8, upper: 8 })).toEqual({ variant: 'narrow', direction: 'more', count: 3 });
    expect(rangeCase(15, { lower: 15, upper: 15 })).toEqual({ variant: 'no-change' });
  });

  it('does not depend on the order of the limits', () => {
    expect(rangeCase(15, { lower: 13, upper: 9 })).toEqual(rangeCase(15, { lower: 9, upper: 13 }));
  });
});

describe('rangeSentence', () => {
  it('says "between 2 and 6 in 100" avoid the outcome', () => {
    const found = sentenceOf(strokeTopic(), 'range');
    expect(found?.text).toBe('With the tablet, the number who avoid a stroke could be anywhere between 2 and 6 in 100.');
    expect(found?.numbers).toEqual({ low: 2, high: 6, denominator: 100 });
  });

  it('says how many could get a harm because of the option', () => {
    const result = topicFixture([
      {
        name: 'muscle pain',
        kind: 'harm',
        comparison: 5,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 7, range: { lower: 6, upper: 9 } }],
      },
    ]);
    expect(sentenceOf(result, 'range')?.text).toBe(
      'With the tablet, the number who get muscle pain because of it could be anywhere between 1 and 4 in 100.',
    );
  });

  it('says a crossing range could mean fewer or more people', () => {
    const result = strokeTopic({ intervention: 14, range: { lower: 12, upper: 17 } });
    expect(sentenceOf(result, 'range')?.text).toBe(
      'With the tablet, anything from 3 fewer to 2 more people in 100 could have a stroke.',
    );
    expect(sentenceOf(result, 'range')?.numbers).toEqual({ fewer: 3, more: 2, denominator: 100 });
  });

  it('words a narrow range and a no-change range without a range of numbers', () => {
    expect(sentenceOf(strokeTopic({ range: { lower: 11, upper: 11 } }), 'range')?.text).toBe(
      'With the tablet, the research puts the number who avoid a stroke at about 4 in 100, with little uncertainty.',
    );
    expect(sentenceOf(strokeTopic({ intervention: 15, range: { lower: 15, upper: 15 } }), 'range')?.text).toBe(
      'With the tablet, the research points to little or no change in how many people have a stroke.',
    );
  });

  it('says the precision is not known when the result has no interval', () => {
    const result = strokeTopic({ range: null });
    expect(sentenceOf(result, 'range')).toBeUndefined();
    expect(sentenceOf(result, 'range-unknown')?.text).toBe(
      'The research does not tell us how precise the numbers for the tablet are.',
    );
  });
});
