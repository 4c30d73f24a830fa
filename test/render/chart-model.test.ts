import { describe, expect, it } from 'vitest';
import { outcomeChart, pairChart } from '../../src/render/chart-model.ts';
import { topicFixture } from './topic-fixture.ts';

describe('outcomeChart', () => {
  const result = topicFixture();

  it('draws the comparison first, then the option, per the topic’s one denominator', () => {
    const model = outcomeChart(result, 'stroke');
    expect(model.arrays.map((array) => array.name)).toEqual(['No treatment', 'Option A']);
    expect(model.arrays.every((array) => array.layout.denominator === 100)).toBe(true);
    expect(model.denominator).toBe(100);
  });

  it('titles each array with the group, the option and the period', () => {
    const model = outcomeChart(result, 'stroke');
    expect(model.heading).toBe('Chance of a stroke over 10 years');
    expect(model.arrays[0]!.title).toBe('With no treatment: 100 people over 10 years');
    expect(model.arrays[1]!.title).toBe('With option A: 100 people over 10 years');
  });

  // Invented illustrative numbers (19 without, 15 with, per 100): groups from peopleGroups.
  it('labels every group drawn with its count', () => {
    const model = outcomeChart(result, 'stroke');
    expect(model.arrays[0]!.labels.map((label) => label.text)).toEqual(['19 have a stroke', '81 do not have a stroke']);
    expect(model.arrays[1]!.labels.map((label) => label.text)).toEqual([
      '15 have a stroke anyway',
      '4 avoid a stroke because of option A',
      '81 do not have a stroke',
    ]);
  });

  it('labels a harm as people who get it because of the option', () => {
    const model = outcomeChart(result, 'muscle-pain');
    expect(model.kind).toBe('harm');
    expect(model.arrays[1]!.labels.map((label) => label.text)).toEqual([
      '3 have muscle pain anyway',
      '2 get muscle pain because of option A',
      '95 do not have muscle pain',
    ]);
  });

  it('states the option’s interval as people and which ranks it makes uncertain', () => {
    const range = outcomeChart(result, 'stroke').arrays[1]!.range!;
    expect(range.text).toBe('With option A, anywhere between 12 and 18 of these 100 could have a stroke (range: 95% interval).');
    expect(range.uncertain).toEqual({ from: 12, to: 18 });
    expect(outcomeChart(result, 'stroke').arrays[0]!.range).toBeNull();
  });

  it('repeats every count in the text alternative', () => {
    const { description, sentences } = outcomeChart(result, 'stroke');
    for (const count of ['19 have', '81 do not', '15 have', '4 avoid', 'between 12 and 18']) expect(description).toContain(count);
    expect(description).toContain('Illustrative example');
    expect(sentences).toHaveLength(3);
  });

  it('says so when an option changes nothing at these numbers', () => {
    const same = topicFixture(100, { comparison: 20, intervention: 20, range: null });
    const array = outcomeChart(same, 'stroke').arrays[1]!;
    expect(array.labels.map((label) => label.group)).toEqual(['event', 'free']);
    expect(array.note).toBe('The same number have a stroke with and without option A.');
  });

  it('works per 1000 when the topic is per 1000', () => {
    const thousand = topicFixture(1000, { comparison: 125, intervention: 94 });
    const model = outcomeChart(thousand, 'stroke');
    expect(model.arrays[1]!.groups).toEqual({ denominator: 1000, event: 94, prevented: 31, caused: 0, free: 875 });
    expect(model.arrays[1]!.title).toBe('With option A: 1000 people over 10 years');
  });

  it('rejects an unknown outcome or option', () => {
    expect(() => outcomeChart(result, 'falls')).toThrow(RangeError);
    expect(() => outcomeChart(result, 'stroke', { optionIds: ['b'] })).toThrow(RangeError);
  });

  it('rejects an option counted per another denominator than the topic', () => {
    const mixed = topicFixture();
    const outcome = mixed.outcomes[0]!;
    const perThousand = {
      ...outcome.options[1]!,
      groups: { denominator: 1000 as const, event: 150, prevented: 40, caused: 0, free: 810 },
    };
    const broken = { ...mixed, outcomes: [{ ...outcome, options: [outcome.options[0]!, perThousand] }] };
    expect(() => outcomeChart(broken, 'stroke')).toThrow(RangeError);
  });

  it('rejects a comparison with people the option changed', () => {
    const mixed = topicFixture();
    const outcome = mixed.outcomes[0]!;
    const comparison = {
      ...outcome.options[0]!,
      groups: { denominator: 100 as const, event: 15, prevented: 4, caused: 0, free: 81 },
    };
    const broken = { ...mixed, outcomes: [{ ...outcome, options: [comparison, outcome.options[1]!] }] };
    expect(() => outcomeChart(broken, 'stroke')).toThrow(RangeError);
  });

  it('passes the arrangement and seed on to every array', () => {
    const model = outcomeChart(result, 'stroke', { arrangement: 'scattered', seed: 5 });
    expect(model.arrangement).toBe('scattered');
    expect(model.arrays.every((array) => array.layout.seed === 5)).toBe(true);
  });
});

describe('pairChart', () => {
  // Baseline 20%, RR 0.75 gives 0.20 × 0.75 = 15% (p1 = p0 × RR, Cochrane Handbook 5.1 §12.5.4);
  // per 100: 20 without, 15 with.
  const perPeople = { denominator: 100 as const, comparison: 20, intervention: 15, difference: 5, interventionRange: null };
  const risks = { comparison: 0.2, intervention: 0.15 };

  it('names the arms “Without the option” and “With the option”', () => {
    const model = pairChart({ perPeople, risks });
    expect(model.arrays.map((array) => array.name)).toEqual(['Without the option', 'With the option']);
    expect(model.arrays[0]!.groups).toEqual({ denominator: 100, event: 20, prevented: 0, caused: 0, free: 80 });
    expect(model.arrays[1]!.groups).toEqual({ denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 });
  });

  it('uses the period in the titles when one is given', () => {
    expect(pairChart({ perPeople, risks, periodYears: 5 }).arrays.map((array) => array.title)).toEqual([
      'Without the option: 100 people like you, over 5 years',
      'With the option: 100 people like you, over 5 years',
    ]);
    expect(pairChart({ perPeople, risks }).arrays[1]!.title).toBe('With the option: 100 people like you');
  });

  it('labels the groups with “the outcome” unless it is named', () => {
    expect(pairChart({ perPeople, risks }).arrays[1]!.labels.map((label) => label.text)).toEqual([
      '15 have the outcome anyway',
      '5 avoid the outcome because of the option',
      '80 do not have the outcome',
    ]);
    expect(pairChart({ perPeople, risks, outcomeName: 'a fracture' }).arrays[1]!.labels[1]!.text).toBe(
      '5 avoid a fracture because of the option',
    );
  });
});
