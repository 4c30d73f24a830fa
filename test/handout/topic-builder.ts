/**
 * Invented topics for the handout tests, built to a shape: how many options and
 * outcomes, and how long the texts are. Not real data.
 */
import { TOPIC_LIMITS } from '../../src/core/topic/topic.ts';
import type { Topic, TopicOption, TopicOutcome } from '../../src/core/topic/topic.ts';

export interface TopicShape {
  readonly options: number;
  readonly outcomes: number;
  /** The harms among the outcomes (after the headline benefit). */
  readonly harms?: number;
  readonly optionName?: (index: number) => string;
  readonly outcomeName?: (index: number) => string;
  readonly title?: string;
  readonly population?: string;
  readonly questions?: readonly string[];
  readonly summary?: string;
  readonly clinician?: string;
  readonly illustrative?: boolean;
}

/** Text of exactly `length` characters made of the seed word repeated, ending with `tag` to tell texts apart. */
export function wordsOfLength(length: number, seed = 'option', tag = ''): string {
  let text = '';
  while (text.length < length) text += `${text === '' ? '' : ' '}${seed}`;
  const ending = tag === '' ? '' : ` ${tag}`;
  return `${text.slice(0, length - ending.length).trimEnd()}${ending}`.padEnd(length, 'x');
}

/** A valid topic of the given shape: option 0 is the comparison, outcome 0 the headline benefit. */
export function shapedTopic(shape: TopicShape): Topic {
  const options: TopicOption[] = Array.from({ length: shape.options }, (_, index) => ({
    id: `option-${index}`,
    name: index === 0 ? 'no treatment' : (shape.optionName?.(index) ?? `option ${String.fromCharCode(64 + index)}`),
    isComparison: index === 0,
  }));
  const harms = shape.harms ?? Math.floor((shape.outcomes - 1) / 2);
  const outcomes: TopicOutcome[] = Array.from({ length: shape.outcomes }, (_, index) => ({
    id: `outcome-${index}`,
    name: shape.outcomeName?.(index) ?? `outcome number ${index + 1}`,
    kind: index > 0 && index <= harms ? 'harm' : 'benefit',
    isHeadline: index === 0,
    baseline: { risk: 0.04 + 0.03 * index, periodYears: 5, source: 'Invented for tests' },
    effects: options
      .filter((option) => !option.isComparison)
      .map((option, position) => {
        const estimate = index > 0 && index <= harms ? 1.2 + 0.1 * position : 0.8 - 0.05 * position;
        return {
          optionId: option.id,
          effect: { measure: 'rr' as const, estimate, lower: estimate - 0.1, upper: estimate + 0.1 },
          source: 'Invented for tests',
          followUpYears: 5,
          certainty: (['high', 'moderate', 'low', 'very-low'] as const)[(index + position) % 4] ?? 'moderate',
          importance: 'important' as const,
        };
      }),
  }));
  return {
    title: shape.title ?? 'Taking a tablet to lower the chance of a stroke (illustrative)',
    population: shape.population ?? 'people aged 60 to 70 with high blood pressure',
    periodYears: 5,
    options,
    outcomes,
    illustrative: shape.illustrative ?? true,
    evidence: { summary: shape.summary ?? 'Invented numbers for tests.', reviewed: '2026-11-01' },
    questions: shape.questions ?? ['What matters most to me?'],
    clinician: shape.clinician ?? '',
  };
}

/** The most a topic may hold, every name and question at its longest: too much for one page. */
export const OVERLONG_SHAPE: TopicShape = {
  options: TOPIC_LIMITS.maxOptions,
  outcomes: TOPIC_LIMITS.maxOutcomes,
  optionName: (index) => wordsOfLength(TOPIC_LIMITS.optionNameLength, 'treatment', String(index)),
  outcomeName: (index) => wordsOfLength(TOPIC_LIMITS.outcomeNameLength, 'complication', String(index)),
  questions: Array.from({ length: TOPIC_LIMITS.maxQuestions }, (_, index) =>
    wordsOfLength(TOPIC_LIMITS.questionLength, 'question', String(index)),
  ),
};

/** A topic as a topic file's text (format version 2, no patient). */
export function topicFileOf(topic: Topic): string {
  return JSON.stringify({ format: 'chancewise-topic', version: 2, topic: { ...topic, patient: null } });
}
