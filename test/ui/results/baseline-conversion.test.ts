import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { baselineConversionSentence } from '../../../src/ui/results/baseline-conversion.ts';
import { effectTopic } from './effect-topic.ts';

/** The illustrative one-year topic, its baseline given over `years` instead. */
function overYears(years: number): Topic {
  const topic = effectTopic({ baseline: '25%', effect: { measure: 'rr', estimate: 0.8 } });
  return {
    ...topic,
    outcomes: topic.outcomes.map((outcome) => ({ ...outcome, baseline: { ...outcome.baseline, periodYears: years } })),
  };
}

describe('the sentence that shows a baseline’s conversion to the topic’s period', () => {
  // Constant hazard: p₁ = 1 − (1 − p₁₀)^(1/10) (Fleurence and Hollenbeak 2007, "Rates and
  // probabilities in economic modelling", PharmacoEconomics 25:3–6): 1 − 0.75^0.1 = 0.02836.
  test('25% over 10 years, in a topic over 1 year, is said to become 2.84% over 1 year', () => {
    const result = computeTopic(overYears(10));
    expect(result.outcomes[0]?.baselineRisk).toBeCloseTo(0.02836, 5);
    const sentence = baselineConversionSentence(result, 'bleed');
    expect(sentence).toContain('25%');
    expect(sentence).toContain('10 years');
    expect(sentence).toContain('converted to 2.84% over 1 year');
    expect(sentence).toContain('1 year');
    expect(sentence).toContain('constant hazard');
  });

  test('a baseline over the topic’s own period has no conversion to show', () => {
    const result = computeTopic(overYears(1));
    expect(result.outcomes[0]?.baselineConversion).toBeNull();
    expect(baselineConversionSentence(result, 'bleed')).toBeNull();
  });

  test('no result, or an outcome it does not hold, gives no sentence', () => {
    expect(baselineConversionSentence(null, 'bleed')).toBeNull();
    expect(baselineConversionSentence(computeTopic(overYears(10)), 'no-such-outcome')).toBeNull();
  });
});
