/**
 * Property: for any topic within the editor's limits, the handout is exactly one
 * page or the named refusal, never two pages (fast-check over random topics).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { type Certainty, TOPIC_LIMITS, type Topic, type TopicOutcome } from '../../src/core/topic/topic.ts';
import type { Denominator } from '../../src/core/types.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { MIN_BODY_SIZE, MIN_LIST_SIZE } from '../../src/handout/fit-settings.ts';
import { pdfInfo, testFonts, writePdf } from './support.ts';

const WORDS = [
  'a',
  'the',
  'stroke',
  'tablet',
  'heart',
  'café',
  'naïve',
  'Zoë’s',
  'risk',
  '≥ 65',
  '≤ 5%',
  'daily',
  'long-term',
  'bleeding',
  'pain',
  'test',
  'cancer',
  'of',
  'with',
  'doctor',
];

/** Text of up to `limit` characters from everyday and clinical words, at least one word long. */
const text = (limit: number, minimum = 1) =>
  fc
    .array(fc.constantFrom(...WORDS), { minLength: minimum, maxLength: Math.ceil(limit / 3) })
    .map((words) => words.join(' ').slice(0, limit).trim())
    .filter((found) => found.length >= minimum);

/** A name unique within its list: its number first, cut to the limit. */
const named = (index: number, words: string, limit: number) => `${index + 1} ${words}`.slice(0, limit).trim();

const certainty = fc.constantFrom<Certainty>('high', 'moderate', 'low', 'very-low');

const topicArbitrary = fc
  .record({
    optionCount: fc.integer({ min: TOPIC_LIMITS.minOptions, max: TOPIC_LIMITS.maxOptions }),
    outcomeCount: fc.integer({ min: TOPIC_LIMITS.minOutcomes, max: TOPIC_LIMITS.maxOutcomes }),
    title: text(TOPIC_LIMITS.titleLength),
    population: text(TOPIC_LIMITS.populationLength),
    summary: text(TOPIC_LIMITS.evidenceSummaryLength, 0),
    clinician: text(TOPIC_LIMITS.clinicianLength, 0),
    questions: fc.array(text(TOPIC_LIMITS.questionLength), { maxLength: TOPIC_LIMITS.maxQuestions }),
    optionNames: fc.array(text(TOPIC_LIMITS.optionNameLength), {
      minLength: TOPIC_LIMITS.maxOptions,
      maxLength: TOPIC_LIMITS.maxOptions,
    }),
    outcomeNames: fc.array(text(TOPIC_LIMITS.outcomeNameLength), {
      minLength: TOPIC_LIMITS.maxOutcomes,
      maxLength: TOPIC_LIMITS.maxOutcomes,
    }),
    harms: fc.array(fc.boolean(), { minLength: TOPIC_LIMITS.maxOutcomes, maxLength: TOPIC_LIMITS.maxOutcomes }),
    baselines: fc.array(fc.double({ min: 0.002, max: 0.6, noNaN: true }), {
      minLength: TOPIC_LIMITS.maxOutcomes,
      maxLength: TOPIC_LIMITS.maxOutcomes,
    }),
    ratios: fc.array(fc.double({ min: 0.4, max: 2.2, noNaN: true }), { minLength: 32, maxLength: 32 }),
    certainties: fc.array(certainty, { minLength: 32, maxLength: 32 }),
    periodYears: fc.integer({ min: 1, max: 30 }),
    illustrative: fc.boolean(),
    per: fc.constantFrom<Denominator | null>(100, 1000, null),
    paper: fc.constantFrom('a4' as const, 'letter' as const),
  })
  .map((drawn) => {
    const options = Array.from({ length: drawn.optionCount }, (_, index) => ({
      id: `option-${index}`,
      name: named(index, drawn.optionNames[index] ?? 'option', TOPIC_LIMITS.optionNameLength),
      isComparison: index === 0,
    }));
    const outcomes: TopicOutcome[] = Array.from({ length: drawn.outcomeCount }, (_, index) => ({
      id: `outcome-${index}`,
      name: named(index, drawn.outcomeNames[index] ?? 'outcome', TOPIC_LIMITS.outcomeNameLength),
      kind: index > 0 && drawn.harms[index] === true ? 'harm' : 'benefit',
      isHeadline: index === 0,
      baseline: { risk: drawn.baselines[index] ?? 0.1, periodYears: drawn.periodYears, source: 'Invented for a property test' },
      effects: options
        .filter((option) => !option.isComparison)
        .map((option, position) => {
          // The upper limit of the ratio must keep the risk with the option below 1.
          const baseline = drawn.baselines[index] ?? 0.1;
          const estimate = Math.min(drawn.ratios[index * 4 + position] ?? 1, 0.9 / (baseline * 1.25));
          return {
            optionId: option.id,
            effect: { measure: 'rr' as const, estimate, lower: estimate * 0.8, upper: estimate * 1.25 },
            source: 'Invented for a property test',
            followUpYears: drawn.periodYears,
            certainty: drawn.certainties[index * 4 + position] ?? 'moderate',
            importance: 'important' as const,
          };
        }),
    }));
    const topic: Topic = {
      title: drawn.title,
      population: drawn.population,
      periodYears: drawn.periodYears,
      options,
      outcomes,
      illustrative: drawn.illustrative,
      evidence: { summary: drawn.summary, reviewed: '2026-11-01' },
      questions: drawn.questions,
      clinician: drawn.clinician,
    };
    return { topic, per: drawn.per, paper: drawn.paper };
  });

describe('fitting any topic within the editor’s limits', () => {
  it('gives exactly one page or the named refusal, never two pages', () => {
    const fonts = testFonts();
    let built = 0;
    let refused = 0;
    let pictured = 0;
    fc.assert(
      fc.property(topicArbitrary, ({ topic, per, paper }) => {
        const result = computeTopic(topic, { per });
        const handout = buildHandout(result, topic, { date: '2026-12-01', appVersion: '0.1.0', paper }, fonts);
        if (!handout.ok) {
          refused += 1;
          expect(handout.reason).toBe('does-not-fit');
          expect(handout.message).toMatch(/^The handout does not fit on one page \(about \d+ mm too long\): shorten /);
          expect(handout.message).not.toContain('\n');
          return;
        }
        built += 1;
        if (handout.pictures) pictured += 1;
        expect(handout.pages).toBe(1);
        expect(handout.settings.body).toBeGreaterThanOrEqual(MIN_BODY_SIZE);
        expect(Math.min(handout.settings.list, handout.settings.table)).toBeGreaterThanOrEqual(MIN_LIST_SIZE);
        // Every outcome's sentences at one size, never below the EU leaflet minimum of 9 pt (EC 2009 readability guideline).
        expect(handout.sentenceSize).toBeGreaterThanOrEqual(MIN_LIST_SIZE);
        // Every tenth handout is also counted by poppler, from the file itself.
        if (built % 10 === 1) expect(pdfInfo(writePdf(handout.pdf)).Pages).toBe('1');
      }),
      // A fixed seed: the share that fits is a count over one sample, and should not move from run to run.
      { numRuns: 200, seed: 7 },
    );
    expect(built + refused).toBe(200);
    // Most random topics fit (104 of these 200 with every outcome told in equal detail and the
    // disclosures printed); a refusal is for long texts on many options and outcomes.
    expect(built).toBeGreaterThan(refused);
    // More than half of those that fit print every outcome's pictures: 58 of the 104, full size or
    // compact (38 without the compact pictures, when the page went straight to the sentences alone).
    expect(pictured * 2).toBeGreaterThan(built);
  }, 180_000);
});
