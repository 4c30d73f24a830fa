import { describe, expect, it } from 'vitest';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

// A relative effect never alone: always with the baseline and the absolute numbers in the same
// sentence (Akl et al. 2011, Cochrane Database Syst Rev CD006776, Appendix 1 wording "risk
// reduced from 10% in group A to 5% in group B"; Gigerenzer & Edwards 2003, BMJ 327:741–744).
describe('relativeSentence', () => {
  it('gives a 25% relative reduction with the 15 in 100 and 11 in 100 it applies to', () => {
    const found = sentenceOf(strokeTopic({ relativeRisk: 0.75 }), 'relative');
    expect(found?.text).toBe(
      'With the tablet, the chance of a stroke goes from 15 in 100 to 11 in 100: a relative reduction of 25%.',
    );
    expect(found?.numbers).toEqual({ from: 15, to: 11, denominator: 100, percent: 25 });
    expect(found?.audience).toBe('clinician');
  });

  it('always writes the absolute numbers beside the percentage', () => {
    const found = sentenceOf(strokeTopic({ relativeRisk: 0.75 }), 'relative');
    expect(found?.text).toMatch(/from 15 in 100 to 11 in 100.*25%/);
  });

  it('gives an increase as a relative increase', () => {
    const result = topicFixture([
      {
        name: 'muscle pain',
        kind: 'harm',
        comparison: 5,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 6, relativeRisk: 1.2 }],
      },
    ]);
    expect(sentenceOf(result, 'relative')?.text).toBe(
      'With the tablet, the chance of muscle pain goes from 5 in 100 to 6 in 100: a relative increase of 20%.',
    );
  });

  it('rounds the percentage half away from zero without float error: a ratio of 0.775 is 23% (22.5 up)', () => {
    // (1 − 0.775) × 100 = 22.499999999999996 in doubles, so a naive Math.round gives 22 (IEEE 754,
    // common practice knowledge).
    expect((1 - 0.775) * 100).toBeLessThan(22.5);
    expect(sentenceOf(strokeTopic({ relativeRisk: 0.775 }), 'relative')?.numbers.percent).toBe(23);
  });

  it('writes no relative sentence when the drawn counts are equal or one of them is 0', () => {
    expect(sentenceOf(strokeTopic({ intervention: 15, relativeRisk: 0.98 }), 'relative')).toBeUndefined();
    expect(sentenceOf(strokeTopic({ intervention: 0, interventionRisk: 0.001, relativeRisk: 0.01 }), 'relative')).toBeUndefined();
  });

  it('writes no relative sentence without a risk ratio, or when ratio and counts point different ways', () => {
    expect(sentenceOf(strokeTopic({ relativeRisk: null }), 'relative')).toBeUndefined();
    expect(sentenceOf(strokeTopic({ relativeRisk: 1.1 }), 'relative')).toBeUndefined();
  });
});
