import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import type { Problem } from '../../../src/core/problems.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { TOPIC_LIMITS } from '../../../src/core/topic/topic.ts';
import type { OptionEffect, Topic, TopicOutcome } from '../../../src/core/topic/topic.ts';
import { trialBaseline, validateTopic } from '../../../src/core/topic/validate-topic.ts';

// The limits and rules come from the topic model (src/core/topic/topic.ts: TOPIC_LIMITS); the
// effect rules from the Cochrane Handbook 5.1 §12.5.4 formulas (a risk must stay within 0 to 1).

function demo(name: string): Topic {
  const reading = readTopicFile(readFileSync(new URL(`../../../assets/demo/${name}`, import.meta.url), 'utf8'));
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

/** A deep, writable copy of the first demo topic to damage. */
type Writable<T> = { -readonly [K in keyof T]: T[K] extends object ? Writable<T[K]> : T[K] };
const stone = (): Writable<Topic> => structuredClone(demo('01-kidney-stone.json')) as Writable<Topic>;
const fracture = (): Writable<Topic> => structuredClone(demo('03-fracture-medicine.json')) as Writable<Topic>;

function outcomeOf(topic: Writable<Topic>, index: number): Writable<TopicOutcome> {
  const found = topic.outcomes[index];
  if (found === undefined) throw new Error(`no outcome ${index}`);
  return found;
}
function effectOf(topic: Writable<Topic>, outcome: number, index: number): Writable<OptionEffect> {
  const found = outcomeOf(topic, outcome).effects[index];
  if (found === undefined) throw new Error(`no effect ${index}`);
  return found;
}

const only = (problems: readonly Problem[]): Pick<Problem, 'code' | 'field'>[] =>
  problems.map(({ code, field }) => ({ code, field }));

describe('validateTopic', () => {
  it.each(['01-kidney-stone.json', '02-bowel-screening.json', '03-fracture-medicine.json'])(
    'finds nothing wrong with the demo %s',
    (name) => {
      expect(validateTopic(demo(name))).toEqual([]);
    },
  );

  /** [what is wrong, how to damage the kidney stone demo, the one problem expected]. */
  const cases: readonly [string, (topic: Writable<Topic>) => void, Pick<Problem, 'code' | 'field'>][] = [
    [
      'an empty title',
      (t) => {
        t.title = '  ';
      },
      { code: 'topic-text-missing', field: 'title' },
    ],
    [
      'a title too long',
      (t) => {
        t.title = 'x'.repeat(TOPIC_LIMITS.titleLength + 1);
      },
      { code: 'topic-text-too-long', field: 'title' },
    ],
    [
      'an empty population',
      (t) => {
        t.population = '';
      },
      { code: 'topic-text-missing', field: 'population' },
    ],
    [
      'a population too long',
      (t) => {
        t.population = 'x'.repeat(TOPIC_LIMITS.populationLength + 1);
      },
      { code: 'topic-text-too-long', field: 'population' },
    ],
    [
      'a period of zero years',
      (t) => {
        t.periodYears = 0;
      },
      { code: 'period-not-positive', field: 'periodYears' },
    ],
    [
      'a negative period',
      (t) => {
        t.periodYears = -5;
      },
      { code: 'period-not-positive', field: 'periodYears' },
    ],
    [
      'a follow-up beyond the limit',
      (t) => {
        effectOf(t, 0, 0).followUpYears = 250;
      },
      { code: 'period-too-long', field: 'outcomes.0.effects.0.followUpYears' },
    ],
    [
      'an evidence summary too long',
      (t) => {
        t.evidence.summary = 'x'.repeat(TOPIC_LIMITS.evidenceSummaryLength + 1);
      },
      { code: 'topic-text-too-long', field: 'evidence.summary' },
    ],
    [
      'a clinician name too long',
      (t) => {
        t.clinician = 'x'.repeat(TOPIC_LIMITS.clinicianLength + 1);
      },
      { code: 'topic-text-too-long', field: 'clinician' },
    ],
    [
      'too many questions',
      (t) => {
        t.questions = Array.from({ length: TOPIC_LIMITS.maxQuestions + 1 }, (_, index) => `Question ${index}?`);
      },
      { code: 'topic-text-too-long', field: 'questions' },
    ],
    [
      'an empty question',
      (t) => {
        t.questions[1] = '';
      },
      { code: 'topic-text-missing', field: 'questions.1' },
    ],
    [
      'a question too long',
      (t) => {
        t.questions[2] = 'x'.repeat(TOPIC_LIMITS.questionLength + 1);
      },
      { code: 'topic-text-too-long', field: 'questions.2' },
    ],
    [
      'an empty option name',
      (t) => {
        const option = t.options[1];
        if (option) option.name = '';
      },
      { code: 'topic-text-missing', field: 'options.1.name' },
    ],
    [
      'an option name too long',
      (t) => {
        const option = t.options[2];
        if (option) option.name = 'x'.repeat(TOPIC_LIMITS.optionNameLength + 1);
      },
      { code: 'topic-text-too-long', field: 'options.2.name' },
    ],
    [
      'two options with the same name, whatever the case',
      (t) => {
        const option = t.options[2];
        if (option) option.name = 'Extra Water Each Day';
      },
      { code: 'topic-duplicate-name', field: 'options.2.name' },
    ],
    [
      'an empty outcome name',
      (t) => {
        outcomeOf(t, 2).name = '';
      },
      { code: 'topic-text-missing', field: 'outcomes.2.name' },
    ],
    [
      'an outcome name too long',
      (t) => {
        outcomeOf(t, 1).name = 'x'.repeat(TOPIC_LIMITS.outcomeNameLength + 1);
      },
      { code: 'topic-text-too-long', field: 'outcomes.1.name' },
    ],
    [
      'no headline outcome',
      (t) => {
        outcomeOf(t, 0).isHeadline = false;
      },
      { code: 'topic-headline-count', field: 'outcomes' },
    ],
    [
      'two headline outcomes',
      (t) => {
        outcomeOf(t, 1).isHeadline = true;
      },
      { code: 'topic-headline-count', field: 'outcomes' },
    ],
    [
      'two outcomes with the same id',
      (t) => {
        outcomeOf(t, 2).id = 'night';
      },
      { code: 'topic-duplicate-id', field: 'outcomes.2.id' },
    ],
    [
      'two outcomes with the same name',
      (t) => {
        outcomeOf(t, 2).name = 'Another kidney stone';
      },
      { code: 'topic-duplicate-name', field: 'outcomes.2.name' },
    ],
    [
      'a baseline source too long',
      (t) => {
        outcomeOf(t, 0).baseline.source = 'x'.repeat(TOPIC_LIMITS.sourceLength + 1);
      },
      { code: 'topic-text-too-long', field: 'outcomes.0.baseline.source' },
    ],
    [
      'a baseline period of zero',
      (t) => {
        outcomeOf(t, 1).baseline.periodYears = 0;
      },
      { code: 'period-not-positive', field: 'outcomes.1.baseline.periodYears' },
    ],
    [
      'no baseline risk for entered effects',
      (t) => {
        outcomeOf(t, 0).baseline.risk = null;
      },
      { code: 'baseline-missing', field: 'outcomes.0.baseline.risk' },
    ],
    [
      'a baseline risk that is not a risk',
      (t) => {
        outcomeOf(t, 0).baseline.risk = 'about a fifth';
      },
      { code: 'risk-unparsable', field: 'outcomes.0.baseline.risk' },
    ],
    [
      'an ambiguous bare baseline',
      (t) => {
        outcomeOf(t, 0).baseline.risk = 15;
      },
      { code: 'risk-ambiguous', field: 'outcomes.0.baseline.risk' },
    ],
    [
      'a baseline of 0%',
      (t) => {
        outcomeOf(t, 0).baseline.risk = '0%';
      },
      { code: 'baseline-out-of-range', field: 'outcomes.0.baseline.risk' },
    ],
    [
      'a baseline above 100%',
      (t) => {
        outcomeOf(t, 0).baseline.risk = '150%';
      },
      { code: 'risk-out-of-range', field: 'outcomes.0.baseline.risk' },
    ],
    [
      'an effect source too long',
      (t) => {
        effectOf(t, 2, 0).source = 'x'.repeat(TOPIC_LIMITS.sourceLength + 1);
      },
      { code: 'topic-text-too-long', field: 'outcomes.2.effects.0.source' },
    ],
    [
      'a follow-up of zero years',
      (t) => {
        effectOf(t, 1, 0).followUpYears = 0;
      },
      { code: 'period-not-positive', field: 'outcomes.1.effects.0.followUpYears' },
    ],
    [
      'a risk ratio of zero',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rr', estimate: 0 };
      },
      { code: 'ratio-not-positive', field: 'outcomes.0.effects.0.effect.estimate' },
    ],
    [
      'a relative reduction of 100%',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rrr', estimate: 100 };
      },
      { code: 'rrr-out-of-range', field: 'outcomes.0.effects.0.effect.estimate' },
    ],
    [
      'an absolute reduction beyond 100%',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'arr', estimate: 1.5 };
      },
      { code: 'arr-out-of-range', field: 'outcomes.0.effects.0.effect.estimate' },
    ],
    [
      'a risk ratio pushing the risk above 100%',
      (t) => {
        effectOf(t, 0, 1).effect = { measure: 'rr', estimate: 8 };
      },
      { code: 'rr-risk-above-one', field: 'outcomes.0.effects.1.effect.estimate' },
    ],
    [
      'an absolute reduction larger than the baseline',
      (t) => {
        effectOf(t, 1, 0).effect = { measure: 'arr', estimate: 0.2 };
      },
      { code: 'risk-outside', field: 'outcomes.1.effects.0.effect.estimate' },
    ],
    [
      'an interval that misses its estimate',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rr', estimate: 0.75, lower: 0.8, upper: 0.9 };
      },
      { code: 'interval-excludes-estimate', field: 'outcomes.0.effects.0.effect.interval' },
    ],
    [
      'an interval with one limit',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rr', estimate: 0.75, lower: 0.6, upper: null };
      },
      { code: 'interval-incomplete', field: 'outcomes.0.effects.0.effect.interval' },
    ],
    [
      'an interval limit pushing the risk above 100%',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rr', estimate: 2, lower: 1.5, upper: 7 };
      },
      { code: 'limit-risk-outside', field: 'outcomes.0.effects.0.effect.upper' },
    ],
    [
      'an interval level below 50%',
      (t) => {
        effectOf(t, 0, 0).effect = { measure: 'rr', estimate: 0.75, lower: 0.68, upper: 0.83, level: 0.3 };
      },
      { code: 'level-out-of-range', field: 'outcomes.0.effects.0.effect.level' },
    ],
  ];

  it.each(cases)('reports %s at its field', (_what, damage, expected) => {
    const topic = stone();
    damage(topic);
    expect(only(validateTopic(topic as Topic))).toEqual([expected]);
  });

  it('reports a period beyond the limit at its field, first', () => {
    // Over 101 years the 15% five-year chance of broken sleep grows past what a risk ratio of 1.6
    // can act on, so the risks it would give are reported too, after the period.
    const topic = stone();
    topic.periodYears = TOPIC_LIMITS.maxPeriodYears + 1;
    expect(only(validateTopic(topic as Topic))[0]).toEqual({ code: 'period-too-long', field: 'periodYears' });
  });

  it('reports an effect entered for the comparison, and the option left without one', () => {
    const topic = stone();
    effectOf(topic, 0, 1).optionId = 'as-now';
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'topic-effect-on-comparison', field: 'outcomes.0.effects.1.optionId' },
      { code: 'topic-effect-missing', field: 'outcomes.0.effects' },
    ]);
  });

  it('reports two effects for the same option on one outcome, and the option left without one', () => {
    const topic = stone();
    effectOf(topic, 2, 1).optionId = 'water';
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'topic-duplicate-id', field: 'outcomes.2.effects' },
      { code: 'topic-effect-missing', field: 'outcomes.2.effects' },
    ]);
  });

  it('reports an effect for an option the topic does not have, and the option left without one', () => {
    const topic = stone();
    effectOf(topic, 0, 1).optionId = 'lowest';
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'topic-effect-unknown-option', field: 'outcomes.0.effects.1.optionId' },
      { code: 'topic-effect-missing', field: 'outcomes.0.effects' },
    ]);
    expect(describeProblem(validateTopic(topic as Topic)[0] ?? { code: 'cli-usage', field: '', values: {} })).toContain(
      '"lowest"',
    );
  });

  it('reports no comparison, and then every outcome lacks an effect for the unmarked option', () => {
    const topic = stone();
    const option = topic.options[0];
    if (option) option.isComparison = false;
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'topic-comparison-count', field: 'options' },
      { code: 'topic-effect-missing', field: 'outcomes.0.effects' },
      { code: 'topic-effect-missing', field: 'outcomes.1.effects' },
      { code: 'topic-effect-missing', field: 'outcomes.2.effects' },
    ]);
  });

  it('reports two options with the same id', () => {
    const topic = stone();
    const option = topic.options[2];
    if (option) option.id = 'water';
    expect(only(validateTopic(topic as Topic))).toContainEqual({ code: 'topic-duplicate-id', field: 'options.2.id' });
  });

  it('reports too few and too many options', () => {
    const few = stone();
    few.options = few.options.slice(0, 1);
    expect(only(validateTopic(few as Topic))).toContainEqual({ code: 'topic-too-few-options', field: 'options' });
    const many = stone();
    many.options = [
      ...many.options,
      { id: 'a', name: 'option a', isComparison: false },
      { id: 'b', name: 'option b', isComparison: false },
    ];
    expect(only(validateTopic(many as Topic))).toContainEqual({ code: 'topic-too-many-options', field: 'options' });
  });

  it('reports two comparisons', () => {
    const topic = stone();
    const option = topic.options[1];
    if (option) option.isComparison = true;
    expect(only(validateTopic(topic as Topic))).toContainEqual({ code: 'topic-comparison-count', field: 'options' });
  });

  it('reports too few and too many outcomes', () => {
    const none = stone();
    none.outcomes = [];
    expect(only(validateTopic(none as Topic))).toEqual([{ code: 'topic-too-few-outcomes', field: 'outcomes' }]);
    const many = stone();
    const template = outcomeOf(many, 2);
    many.outcomes = [
      ...many.outcomes,
      ...Array.from({ length: TOPIC_LIMITS.maxOutcomes - 2 }, (_, index) => ({
        ...structuredClone(template),
        id: `extra-${index}`,
        name: `extra outcome ${index}`,
      })),
    ];
    expect(many.outcomes.length).toBe(TOPIC_LIMITS.maxOutcomes + 1);
    expect(only(validateTopic(many as Topic))).toEqual([{ code: 'topic-too-many-outcomes', field: 'outcomes' }]);
  });

  it('reports every problem at once, each at its own field, in the order of the topic', () => {
    const topic = stone();
    topic.title = '';
    topic.periodYears = 0;
    const option = topic.options[1];
    if (option) option.isComparison = true;
    outcomeOf(topic, 1).baseline.risk = '30';
    effectOf(topic, 2, 1).effect = { measure: 'or', estimate: -1 };
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'topic-text-missing', field: 'title' },
      { code: 'period-not-positive', field: 'periodYears' },
      { code: 'topic-comparison-count', field: 'options' },
      { code: 'topic-effect-on-comparison', field: 'outcomes.0.effects.0.optionId' },
      { code: 'risk-ambiguous', field: 'outcomes.1.baseline.risk' },
      { code: 'topic-effect-on-comparison', field: 'outcomes.1.effects.0.optionId' },
      { code: 'topic-effect-on-comparison', field: 'outcomes.2.effects.0.optionId' },
      { code: 'ratio-not-positive', field: 'outcomes.2.effects.1.effect.estimate' },
    ]);
  });

  it('gives each problem a sentence that says what to do', () => {
    const topic = stone();
    topic.title = '';
    outcomeOf(topic, 0).baseline.risk = '15';
    effectOf(topic, 1, 1).effect = { measure: 'rr', estimate: 30 };
    outcomeOf(topic, 2).baseline.periodYears = 150;
    const sentences = validateTopic(topic as Topic).map((found) => describeProblem(found));
    expect(sentences).toEqual([
      'The decision is empty. Write a short decision.',
      'A risk of "15" is ambiguous: write 15% or 0.15.',
      'A risk ratio of 30 at a baseline risk of 15% would mean a risk of 450%. Check the numbers, or enter the effect as an odds ratio.',
      'A period of "150" years is too long: write at most 100 years, for example 10.',
    ]);
  });
});

describe('validateTopic with trial counts', () => {
  it('accepts no baseline when every effect of the outcome is trial counts', () => {
    expect(validateTopic(fracture() as Topic)).toEqual([]);
  });

  it('reports an arm with more events than people at the arm itself', () => {
    const topic = fracture();
    effectOf(topic, 0, 0).effect = {
      measure: 'counts',
      intervention: { events: 52, total: 1000 },
      comparison: { events: 1200, total: 1000 },
    };
    expect(only(validateTopic(topic as Topic))).toEqual([
      { code: 'counts-events-above-total', field: 'outcomes.0.effects.0.effect.comparison' },
    ]);
  });

  it.each([
    ['a negative count', { events: -1, total: 100 }, 'counts-negative'],
    ['an arm of no people', { events: 0, total: 0 }, 'counts-total-zero'],
    ['a count that is not whole', { events: 2.5, total: 100 }, 'counts-not-whole'],
  ] as const)('reports %s in the option arm at its field', (_what, arm, code) => {
    const topic = fracture();
    effectOf(topic, 1, 0).effect = { measure: 'counts', intervention: arm, comparison: { events: 100, total: 1000 } };
    expect(only(validateTopic(topic as Topic))).toEqual([{ code, field: 'outcomes.1.effects.0.effect.intervention' }]);
  });

  it('reports an unusable trial baseline when the trial’s comparison arm has no events to use', () => {
    const topic = fracture();
    effectOf(topic, 0, 0).effect = {
      measure: 'counts',
      intervention: { events: 5, total: 1000 },
      comparison: { events: 0, total: 1000 },
    };
    expect(only(validateTopic(topic as Topic))).toEqual([{ code: 'trial-baseline-unusable', field: 'outcomes.0.baseline.risk' }]);
    expect(describeProblem(validateTopic(topic as Topic)[0]!)).toContain('0/1000');
  });

  it('reads the trial baseline from the comparison arm', () => {
    // 91/1000 (the invented trial of the fracture demo).
    expect(trialBaseline({ comparison: { events: 91, total: 1000 } })).toBe(0.091);
    expect(trialBaseline({ comparison: { events: 5, total: 0 } })).toBeNull();
    expect(trialBaseline({ comparison: { events: 11, total: 10 } })).toBeNull();
  });

  it('reads the trial baseline of counts of the opposite event as the others in the comparison arm', () => {
    // 60 of 100 still in pain without the option: 40 of 100 are pain-free (plain arithmetic).
    expect(trialBaseline({ comparison: { events: 60, total: 100 }, opposite: true })).toBe(0.4);
    expect(trialBaseline({ comparison: { events: 60, total: 100 }, opposite: false })).toBe(0.6);
  });
});
