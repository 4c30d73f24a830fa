import { bench, describe } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import type { OptionEffect, Topic, TopicOutcome } from '../../../src/core/topic/topic.ts';

const measures = ['rr', 'or', 'hr'] as const;

function effectFor(optionId: string, index: number): OptionEffect {
  const estimate = 0.7 + 0.05 * index;
  return {
    optionId,
    effect: { measure: measures[index % 3] ?? 'rr', estimate, lower: estimate - 0.1, upper: estimate + 0.1 },
    source: 'benchmark',
    followUpYears: 5,
    certainty: 'moderate',
    importance: 'important',
  };
}

const outcomes: TopicOutcome[] = Array.from({ length: 6 }, (_, index) => ({
  id: `outcome-${index}`,
  name: `outcome ${index}`,
  kind: index < 3 ? 'benefit' : 'harm',
  isHeadline: index === 0,
  baseline: { risk: 0.05 + 0.03 * index, periodYears: 10, source: 'benchmark' },
  effects: [effectFor('a', index), effectFor('b', index + 1)],
}));

/** A topic of 3 options × 6 outcomes, effects as ratios with intervals. */
const topic: Topic = {
  title: 'Benchmark topic',
  population: 'people in a benchmark',
  periodYears: 10,
  illustrative: true,
  options: [
    { id: 'none', name: 'nothing', isComparison: true },
    { id: 'a', name: 'option A', isComparison: false },
    { id: 'b', name: 'option B', isComparison: false },
  ],
  outcomes,
  evidence: { summary: '', reviewed: '' },
  questions: [],
  clinician: '',
};

describe('computing a topic', () => {
  bench('3 options × 6 outcomes, ratios with intervals', () => {
    computeTopic(topic);
  });
});
