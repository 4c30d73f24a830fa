import { describe, expect, it } from 'vitest';
import { chartMessagesEn as messages } from '../../../src/render/messages/en.ts';

describe('chartMessagesEn', () => {
  // IPDAS (Elwyn et al. 2006; IPDASi items on probabilities): each graphic names the option,
  // the outcome, the group and the period ("With tablet A: 100 people over 10 years").
  it('titles an option’s array with the group, the option and the period', () => {
    expect(messages.optionTitle({ denominator: 100, option: 'Option A', periodYears: 10 })).toBe(
      'With option A: 100 people over 10 years',
    );
  });

  it('titles the comparison with its own name', () => {
    expect(messages.comparisonTitle({ denominator: 100, option: 'No treatment', periodYears: 10 })).toBe(
      'With no treatment: 100 people over 10 years',
    );
  });

  it('keeps acronyms as written and writes short periods in months', () => {
    expect(messages.optionTitle({ denominator: 1000, option: 'ACE inhibitor', periodYears: 0.5 })).toBe(
      'With ACE inhibitor: 1000 people over 6 months',
    );
    expect(messages.optionTitle({ denominator: 100, option: 'Option A', periodYears: 1 })).toBe(
      'With option A: 100 people over 1 year',
    );
    expect(messages.optionTitle({ denominator: 100, option: 'Option A', periodYears: null })).toBe('With option A: 100 people');
  });

  // Fagerlin, Zikmund-Fisher & Ubel (2011), J Natl Cancer Inst 103:1436: legends carry the numbers.
  it('labels each group with its count, in the singular for one person', () => {
    const values = { outcome: 'a stroke', option: 'option A', role: 'option' as const };
    expect(messages.labels.event({ ...values, count: 15 })).toBe('15 have a stroke anyway');
    expect(messages.labels.event({ ...values, count: 1 })).toBe('1 has a stroke anyway');
    expect(messages.labels.prevented({ ...values, count: 4 })).toBe('4 avoid a stroke because of option A');
    expect(messages.labels.prevented({ ...values, count: 1 })).toBe('1 avoids a stroke because of option A');
    expect(messages.labels.free({ ...values, count: 81 })).toBe('81 do not have a stroke');
    expect(messages.labels.free({ ...values, count: 1 })).toBe('1 does not have a stroke');
    expect(messages.labels.caused({ ...values, outcome: 'muscle pain', count: 2 })).toBe('2 get muscle pain because of option A');
  });

  it('drops “anyway” for the comparison, where nothing is compared', () => {
    expect(messages.labels.event({ count: 19, outcome: 'a stroke', option: 'no treatment', role: 'comparison' })).toBe(
      '19 have a stroke',
    );
  });

  it('states the range as people out of the denominator, with its level when known', () => {
    const values = { lower: 3, upper: 7, denominator: 100, outcome: 'a stroke', option: 'option A' };
    expect(messages.range({ ...values, level: null })).toBe(
      'With option A, anywhere between 3 and 7 of these 100 could have a stroke.',
    );
    expect(messages.range({ ...values, level: 0.9 })).toBe(
      'With option A, anywhere between 3 and 7 of these 100 could have a stroke (range: 90% interval).',
    );
  });

  it('says a range whose ends show as one count is less than one person, per more people when that shows it', () => {
    const values = { lower: 1, upper: 1, denominator: 1000, outcome: 'a serious bleed', option: 'the tablet', level: 0.95 };
    expect(messages.narrowRange({ ...values, words: { lower: 7, upper: 9, denominator: 10000 } })).toBe(
      'With the tablet, the range (95% interval) is less than one person of these 1000: anywhere between 7 and 9 in 10,000 could have a serious bleed.',
    );
    expect(messages.narrowRange({ ...values, words: null })).toBe(
      'With the tablet, the range (95% interval) is less than one person wide: at either end, about 1 of these 1000 could have a serious bleed.',
    );
  });

  it('says a difference too small for a whole person in words, never as the same number', () => {
    const values = { outcome: 'a serious bleed', option: 'the tablet', denominator: 1000, direction: 'fewer' as const };
    expect(messages.belowOnePerson({ ...values, count: 2, wordsDenominator: 10000 })).toBe(
      'Fewer than 1 in 1000: about 2 in 10,000 fewer have a serious bleed with the tablet, too few to show as a whole person here.',
    );
    expect(messages.belowOnePerson({ ...values, direction: 'more', count: 0, wordsDenominator: null })).toBe(
      'Fewer than 1 in 1000, and fewer than 1 in a million: slightly more people have a serious bleed with the tablet, too few to show as a whole person here.',
    );
  });

  it('joins the labels of an array into one sentence', () => {
    expect(messages.summary('Title', ['a', 'b', 'c'])).toBe('Title: a, b and c.');
    expect(messages.summary('Title', ['a'])).toBe('Title: a.');
  });

  // A wanted event ("pain gone by day 3") is gained or missed, never avoided or caused.
  it('labels the groups of a wanted event without avoiding or causing it', () => {
    const values = { outcome: 'a response', option: 'option A', role: 'option' as const };
    expect(messages.wantedLabels.event({ ...values, count: 25 })).toBe('25 have a response anyway');
    expect(messages.wantedLabels.caused({ ...values, count: 20 })).toBe('20 have a response because of option A');
    expect(messages.wantedLabels.caused({ ...values, count: 1 })).toBe('1 has a response because of option A');
    expect(messages.wantedLabels.prevented({ ...values, count: 3 })).toBe('3 miss out on a response because of option A');
    expect(messages.wantedLabels.prevented({ ...values, count: 1 })).toBe('1 misses out on a response because of option A');
    expect(messages.wantedLabels.prevented({ ...values, outcome: 'being alive at 10 years', count: 2 })).toBe(
      '2 do not end up being alive at 10 years because of option A',
    );
    expect(messages.wantedLabels.free({ ...values, count: 55 })).toBe('55 do not have a response');
  });

  // A year is 365.25 days and a month a twelfth of a year (common practice); the period reads in the unit given.
  it('words the period in the unit it was given in', () => {
    expect(messages.heading('pain gone by day 3', 3 / 365.25, 'days')).toBe('Chance of pain gone by day 3 over 3 days');
    expect(messages.optionTitle({ denominator: 100, option: 'Tablet B', periodYears: 6 / 12, periodUnit: 'months' })).toBe(
      'With tablet B: 100 people over 6 months',
    );
    expect(messages.pairTitle({ denominator: 100, option: '', periodYears: 14 / 365.25, periodUnit: 'weeks' }, 'option')).toBe(
      'With the option: 100 people like you, over 2 weeks',
    );
  });
});
