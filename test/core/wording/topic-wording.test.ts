import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { english } from '../../../src/core/messages/en/index.ts';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { OptionOutcomeResult, TopicResult } from '../../../src/core/topic/topic-result.ts';
import type { Denominator } from '../../../src/core/types.ts';
import { readability } from '../../../src/core/wording/readability.ts';
import { handoutSentences, topicWording } from '../../../src/core/wording/topic-wording.ts';
import type { WordingMessages } from '../../../src/core/wording/wording-catalogue.ts';
import type { WordingSentence } from '../../../src/core/wording/wording-sentence.ts';
import { numbersIn, oneInDenominators, sentencesOf, strokeTopic, topicFixture } from './result-fixture.ts';

/** The three invented demo topics (illustrative), computed by the core. */
function demoResults(): readonly TopicResult[] {
  return ['01-kidney-stone', '02-bowel-screening', '03-fracture-medicine'].map((name) => {
    const reading = readTopicFile(readFileSync(new URL(`../../../assets/demo/${name}.json`, import.meta.url), 'utf8'));
    if (!reading.ok) throw new Error(`demo ${name} does not read`);
    return computeTopic(reading.topic);
  });
}

/** A topic with a benefit, a harm and the edge cases: 0 people, no change, an increase, everyone. */
function edgeTopic(denominator: Denominator = 100): TopicResult {
  const scale = denominator / 100;
  return topicFixture(
    [
      {
        id: 'stroke',
        comparison: 15 * scale,
        options: [
          { id: 'tablet', name: 'the tablet', intervention: 11 * scale, range: { lower: 9 * scale, upper: 13 * scale } },
          { id: 'injection', name: 'the injection', intervention: 15 * scale, interventionRisk: 0.1502, certainty: 'low' },
        ],
      },
      {
        id: 'muscle',
        name: 'muscle pain',
        kind: 'harm',
        isHeadline: false,
        comparison: 0,
        comparisonRisk: 0.001 / scale,
        options: [
          {
            id: 'tablet',
            name: 'the tablet',
            intervention: 3 * scale,
            range: { lower: 0, upper: 6 * scale },
            certainty: 'very-low',
          },
          { id: 'injection', name: 'the injection', intervention: 0, interventionRisk: 0, importance: 'trivial' },
        ],
      },
      {
        id: 'tired',
        name: 'feeling tired',
        kind: 'harm',
        isHeadline: false,
        comparison: denominator,
        comparisonRisk: 0.999,
        options: [
          { id: 'tablet', name: 'the tablet', intervention: denominator, interventionRisk: 1, certainty: 'moderate' },
          {
            id: 'injection',
            name: 'the injection',
            intervention: denominator - 2 * scale,
            range: { lower: 90 * scale, upper: denominator },
          },
        ],
      },
    ],
    { denominator },
  );
}

const allSentences = (result: TopicResult): WordingSentence[] => {
  const wording = topicWording(result);
  return [
    ...(wording.population === null ? [] : [wording.population]),
    ...wording.outcomes.flatMap((outcome) => outcome.options.flatMap((option) => option.sentences)),
  ];
};

const halfAway = (value: number): number => Math.sign(value) * Math.floor(Number(Math.abs(value).toPrecision(12)) + 0.5);

/**
 * Check that every number in a sentence is one it declares, and that each declared number is
 * the result's own: the drawn counts, the denominator, the period, the NNT or the risk ratio.
 */
function expectNumbersFromResult(result: TopicResult): void {
  for (const outcome of result.outcomes) {
    const names = [outcome.name, ...outcome.options.map((option) => option.name)];
    for (const option of outcome.options) {
      const sentences = sentencesOf(topicWording(result), option.optionId, outcome.outcomeId);
      for (const found of sentences) expectSentenceNumbers(found, option, result, names);
    }
  }
}

function expectSentenceNumbers(found: WordingSentence, option: OptionOutcomeResult, result: TopicResult, names: string[]): void {
  const declared = Object.values(found.numbers);
  for (const written of numbersIn(found.text, names)) {
    expect(declared, `${written} in "${found.text}" is not a declared number`).toContain(written);
  }
  const { groups } = option;
  const withOutcome = groups.event + groups.caused;
  const comparison = groups.event + groups.prevented;
  const people = option.perPeople;
  for (const [role, value] of Object.entries(found.numbers)) {
    const where = `${role} in "${found.text}"`;
    if (role === 'denominator') expect(value, where).toBe(result.denominator);
    else if (role === 'years') expect(value, where).toBe(result.periodYears);
    else if (role === 'lessThan') expect(value, where).toBe(1);
    else if (role === 'avoided') expect(value, where).toBe(groups.prevented);
    else if (role === 'caused') expect(value, where).toBe(groups.caused);
    else if (role === 'nnt') expect(value, where).toBe(option.nnt.rounded);
    else if (role.startsWith('nntLimit')) {
      // Altman (1998): each limit of the NNT is the reciprocal of a limit of the difference, whole.
      const { lower, upper } = option.absoluteReduction;
      const limits = [lower, upper].filter((end): end is number => end !== null && end !== 0).map((end) => 1 / Math.abs(end));
      expect(
        limits.some((limit) => Math.abs(limit - value) < 1 + 1e-9),
        where,
      ).toBe(true);
    } else if (role === 'from') expect(value, where).toBe(comparison);
    else if (role === 'to') expect(value, where).toBe(withOutcome);
    else if (role === 'percent')
      expect(value, where).toBe(Math.abs(halfAway((1 - (option.relativeRisk?.estimate ?? NaN)) * 100)));
    else if (role === 'count' && found.kind === 'free-frame') expect(value, where).toBe(result.denominator - withOutcome);
    else if (role === 'count' && found.kind === 'range') {
      const range = people?.interventionRange;
      expect([comparison - (range?.lower ?? NaN), (range?.lower ?? NaN) - comparison], where).toContain(value);
    } else if (role === 'count') expect(value, where).toBe(withOutcome);
    else if (['low', 'high', 'fewer', 'more'].includes(role)) {
      const range = people?.interventionRange;
      const ends = range === null || range === undefined ? [] : [range.lower, range.upper];
      const distances = ends.map((end) => Math.abs((people?.comparison ?? NaN) - end));
      expect(distances, where).toContain(value);
    } else throw new Error(`unchecked role ${where}`);
  }
}

describe('topicWording', () => {
  it('words every outcome and every option, the comparison with its two frames only', () => {
    const wording = topicWording(strokeTopic());
    expect(wording.outcomes.map((outcome) => outcome.outcomeId)).toEqual(['stroke']);
    expect(sentencesOf(wording, 'none').map((found) => found.kind)).toEqual(['event-frame', 'free-frame']);
    expect(sentencesOf(wording, 'tablet').map((found) => found.kind)).toEqual([
      'event-frame',
      'free-frame',
      'change',
      'range',
      'certainty',
      'nnt',
      'relative',
    ]);
  });

  it('gives a harm the same sentences as a benefit, plus its frequency band (IPDAS "equal detail")', () => {
    // Joseph-Williams et al. 2014, Med Decis Making 34(6):699–710, certification criterion: positive
    // and negative features with equal detail.
    const wording = topicWording(
      topicFixture([
        {
          id: 'stroke',
          comparison: 15,
          options: [{ id: 'tablet', name: 'the tablet', intervention: 11, range: { lower: 9, upper: 13 } }],
        },
        {
          id: 'muscle',
          name: 'muscle pain',
          kind: 'harm',
          isHeadline: false,
          comparison: 5,
          options: [{ id: 'tablet', name: 'the tablet', intervention: 7, range: { lower: 6, upper: 9 } }],
        },
      ]),
    );
    const kinds = (optionId: string, outcomeId: string) => sentencesOf(wording, optionId, outcomeId).map((found) => found.kind);
    expect(kinds('tablet', 'muscle').filter((kind) => kind !== 'band')).toEqual(kinds('tablet', 'stroke'));
    expect(kinds('tablet', 'muscle')).toContain('band');
  });

  it("states who the numbers are for, from the topic's population", () => {
    expect(topicWording(strokeTopic()).population?.text).toBe(
      'In these numbers, "people like you" means adults aged 60 to 69 with high blood pressure.',
    );
    expect(topicWording(topicFixture([], { population: '  ' })).population).toBeNull();
  });

  it("writes every number from the result's own counts, on demo topics and on edge cases", () => {
    for (const result of [...demoResults(), edgeTopic(100), edgeTopic(1000), strokeTopic()]) expectNumbersFromResult(result);
  });

  it('uses one denominator and one period in every sentence of a topic (IPDASi item 5)', () => {
    for (const result of [...demoResults(), edgeTopic(1000)]) {
      for (const found of allSentences(result)) {
        if (found.numbers.denominator !== undefined) expect(found.numbers.denominator).toBe(result.denominator);
        if (found.numbers.years !== undefined) expect(found.numbers.years).toBe(result.periodYears);
      }
    }
  });

  it('never writes "1 in X": any "1 in" is followed by the topic\'s denominator (Trevena et al. 2013)', () => {
    expect(oneInDenominators('about 1 in 5 and fewer than 1 in 1000')).toEqual([5, 1000]);
    for (const result of [...demoResults(), edgeTopic(100), edgeTopic(1000)]) {
      for (const found of allSentences(result)) {
        for (const denominator of oneInDenominators(found.text)) expect(denominator, found.text).toBe(result.denominator);
      }
    }
  });

  it('keeps every number and every "1 in" rule on random consistent results', () => {
    const option = (denominator: number) =>
      fc
        .record({
          intervention: fc.integer({ min: 0, max: denominator }),
          spread: fc.option(fc.tuple(fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 30 })), { nil: null }),
          certainty: fc.constantFrom('high', 'moderate', 'low', 'very-low' as const),
          importance: fc.constantFrom('important', 'trivial' as const),
        })
        .map(({ intervention, spread, certainty, importance }) => ({
          id: 'tablet',
          name: 'the tablet',
          intervention,
          range:
            spread === null
              ? null
              : { lower: Math.max(0, intervention - spread[0]), upper: Math.min(denominator, intervention + spread[1]) },
          certainty: certainty as 'high' | 'moderate' | 'low' | 'very-low',
          importance: importance as 'important' | 'trivial',
        }));
    const arbitrary = fc.constantFrom<Denominator>(100, 1000).chain((denominator) =>
      fc.integer({ min: 0, max: denominator }).chain((comparison) =>
        fc.record({
          denominator: fc.constant(denominator),
          comparison: fc.constant(comparison),
          kind: fc.constantFrom('benefit', 'harm' as const),
          years: fc.constantFrom(1, 5, 10, 2.5),
          option: option(denominator),
        }),
      ),
    );
    fc.assert(
      fc.property(arbitrary, ({ denominator, comparison, kind, years, option: spec }) => {
        const result = topicFixture(
          [
            {
              comparison,
              kind: kind as 'benefit' | 'harm',
              comparisonRisk: comparison === 0 ? 0.0001 : comparison / denominator,
              options: [spec],
            },
          ],
          { denominator, periodYears: years },
        );
        expectNumbersFromResult(result);
        for (const found of allSentences(result)) {
          for (const written of oneInDenominators(found.text)) expect(written).toBe(denominator);
          expect(found.text).not.toMatch(/NaN|Infinity|undefined|null|-\d/);
        }
      }),
      { numRuns: 150, seed: 20240601 },
    );
  });

  it('changes every word with another catalogue and keeps every number (a second language)', () => {
    const bracketed = Object.fromEntries(
      Object.entries(english.wording).map(([key, render]) => [
        key,
        key === 'group' ? render : (values: never) => `[${(render as (values: never) => string)(values)}]`,
      ]),
    ) as unknown as WordingMessages;
    const standard = allSentences(edgeTopic());
    const other = (() => {
      const wording = topicWording(edgeTopic(), { catalogue: bracketed });
      return [wording.population, ...wording.outcomes.flatMap((outcome) => outcome.options.flatMap((found) => found.sentences))];
    })();
    expect(other).toHaveLength(standard.length);
    other.forEach((found, index) => {
      expect(found?.text).toBe(`[${standard[index]?.text ?? ''}]`);
      expect(found?.numbers).toEqual(standard[index]?.numbers);
    });
  });
});

describe('handoutSentences', () => {
  it('leaves the NNT out unless asked, and puts it in when asked', () => {
    const result = strokeTopic();
    expect(handoutSentences(result, { showNnt: false }).some((found) => found.kind === 'nnt')).toBe(false);
    expect(handoutSentences(result, { showNnt: true }).filter((found) => found.kind === 'nnt')).toHaveLength(1);
  });

  it('leaves bands and relative changes out unless asked', () => {
    const result = edgeTopic();
    const plain = handoutSentences(result, { showNnt: false });
    expect(plain.some((found) => found.kind === 'band' || found.kind === 'relative')).toBe(false);
    const full = handoutSentences(result, { showNnt: false, showBands: true, showRelative: true });
    expect(full.some((found) => found.kind === 'band')).toBe(true);
    expect(full.some((found) => found.kind === 'relative')).toBe(true);
  });

  it("orders the population first, the headline outcome next, and each outcome's frames before its changes", () => {
    const base = edgeTopic();
    const reordered = { ...base, outcomes: [...base.outcomes].reverse() };
    const sentences = handoutSentences(reordered, { showNnt: false });
    expect(sentences[0]?.kind).toBe('population');
    expect(sentences[1]?.outcomeId).toBe('stroke');
    expect(sentences[1]?.optionId).toBe('none');
    const stroke = sentences.filter((found) => found.outcomeId === 'stroke').map((found) => found.kind);
    expect(stroke.slice(0, 6)).toEqual(['event-frame', 'free-frame', 'event-frame', 'free-frame', 'event-frame', 'free-frame']);
    expect(stroke.slice(6)).toEqual(['change', 'range', 'certainty', 'change', 'range-unknown', 'certainty']);
  });

  it('reads the stroke handout with the tablet at grade 8 or below (the top of the usual grade 6 to 8, common practice)', () => {
    const text = handoutSentences(strokeTopic(), { showNnt: false })
      .filter((found) => found.kind !== 'population')
      .map((found) => found.text)
      .join(' ');
    const { grade } = readability(text);
    expect(grade).not.toBeNull();
    expect(grade ?? Infinity).toBeLessThanOrEqual(8);
  });
});
