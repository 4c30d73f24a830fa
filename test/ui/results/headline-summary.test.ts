import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { headlineSummary } from '../../../src/ui/results/headline-summary.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { effectTopic } from './effect-topic.ts';

const stone = DEMO_TOPICS[0];
if (stone === undefined) throw new Error('no demonstration topic');

describe('the headline summary pinned in narrow windows', () => {
  // The kidney-stone example: 4 in 10 over 5 years; RR 0.6 gives 24 in 100 and RR 0.45 gives 18
  // (risk × RR, per 100: plain arithmetic).
  test('gives the headline outcome’s people per option, out of the tables’ denominator', () => {
    const summary = headlineSummary(computeTopic(stone.topic));
    expect(summary?.outcome).toBe('another kidney stone');
    expect(summary?.per).toBe(100);
    expect(summary?.options.map((option) => option.people)).toEqual([40, 24, 18]);
  });

  // 0.02% × RR 0.5 = 0.01%: 2 and 1 in 10,000. Per 1000 the difference (0.1 of a person) would
  // round to no one, so the words and tables count per 10,000 (the core's denominator rule).
  test('counts as the tables do when they count per more people than the pictures', () => {
    const result = computeTopic(effectTopic({ baseline: 0.0002, effect: { measure: 'rr', estimate: 0.5 } }));
    expect(result.denominator).toBe(1000);
    const summary = headlineSummary(result);
    expect(summary?.per).toBe(10000);
    expect(summary?.options.map((option) => [option.name, option.people])).toEqual([
      ['no tablet', 2],
      ['the tablet', 1],
    ]);
  });

  test('is absent when there are no results', () => {
    expect(headlineSummary(null)).toBeNull();
  });
});
