import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { changeOf } from '../../../src/core/direction.ts';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import type { EffectMeasure } from '../../../src/core/types.ts';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import { topicOf } from './single-outcome-topic.ts';

// Plain wording for events people want. The rule the sentences follow (fewer unwanted or more
// wanted events help; a wanted event is a chance, never a "risk", and is never "avoided",
// "prevented" or "caused") is common practice in risk communication; the numbers are arithmetic
// on invented, illustrative inputs.

function sentencesOf(topic: Topic): string[] {
  const wording = topicWording(computeTopic(topic));
  return wording.outcomes.flatMap((outcome) => outcome.options.flatMap((option) => option.sentences.map((found) => found.text)));
}

describe('a wanted event made more likely (25% by day 3, risk ratio 1.8, 1.4 to 2.3)', () => {
  const sentences = sentencesOf(
    topicOf({
      wanted: true,
      kind: 'benefit',
      measure: 'rr',
      estimate: 1.8,
      lower: 1.4,
      upper: 2.3,
      baseline: 0.25,
      period: { amount: 3, unit: 'days' },
    }),
  );

  it('gives both frames in the unit of the period', () => {
    expect(sentences).toContain('No treatment: about 25 in 100 people like you will have pain relief by day 3.');
    expect(sentences).toContain('The drops: about 45 in 100 people like you will have pain relief by day 3.');
  });

  it('says the change as more people having it, with its range as extra people', () => {
    expect(sentences).toContain('With the drops, about 20 more of those 100 people have pain relief.');
    // 25 × 1.4 = 35 and 25 × 2.3 = 57.5 → 58 (half up): 10 to 33 extra people.
    expect(sentences).toContain(
      'With the drops, the number of extra people who have pain relief could be anywhere between 10 and 33 in 100.',
    );
  });

  // 0.45 − 0.25 = 0.2 (0.1 to 0.325) more with pain relief: NNTB 5, interval 1/0.325 = 3.1 and 1/0.1 = 10,
  // each rounded up for a benefit (Altman 1998, BMJ 317:1309; Cochrane Handbook 5.1 §12.5.4.1).
  it('writes the NNT as a benefit, without "causes"', () => {
    expect(sentences).toContain(
      'NNTB 5 (NNTB 4 to 10): treating 5 people like you with the drops for 3 days means one more of them has pain relief.',
    );
  });

  it('writes the relative change as more people, not as a higher risk', () => {
    expect(sentences).toContain(
      'With the drops, the number who have pain relief goes from 25 in 100 to 45 in 100: 80% more people.',
    );
  });

  it('never calls the good event a risk, nor avoided, prevented or caused', () => {
    for (const sentence of sentences) expect(sentence).not.toMatch(/\brisk|avoid|prevent|caus|reduction/i);
  });
});

describe('a wanted event made less likely', () => {
  const sentences = sentencesOf(
    topicOf({
      wanted: true,
      kind: 'harm',
      measure: 'rr',
      estimate: 0.8,
      lower: 0.7,
      upper: 0.9,
      baseline: 0.5,
      period: { amount: 6, unit: 'months' },
    }),
  );

  // Difference 0.5 − 0.4 = 0.1 (0.05 to 0.15) fewer with pain relief, a harm: NNTH 1/0.1 = 10, its
  // interval 1/0.15 = 6.7 and 1/0.05 = 20, each rounded down for a harm (Altman 1998, BMJ 317:1309).
  it('says fewer people have it and labels the NNT a harm', () => {
    expect(sentences).toContain('With the drops, about 10 fewer of those 100 people have pain relief.');
    expect(sentences).toContain(
      'NNTH 10 (NNTH 6 to 20): treating 10 people like you with the drops for 6 months means one fewer of them has pain relief.',
    );
    expect(sentences).toContain('No treatment: about 50 in 100 people like you will have pain relief in the next 6 months.');
  });
});

describe('an unwanted event keeps its words', () => {
  it('still avoids and prevents', () => {
    const sentences = sentencesOf(
      topicOf({ wanted: false, kind: 'benefit', measure: 'rr', estimate: 0.8, lower: 0.7, upper: 0.9, baseline: 0.5 }),
    );
    expect(sentences).toContain('With the drops, about 10 of those 100 people avoid pain relief.');
    expect(sentences).toContain(
      'NNTB 10 (NNTB 7 to 20): treating 10 people like you with the drops for 1 year prevents pain relief in one of them.',
    );
  });
});

describe('the verbs of every sentence agree with help and harm', () => {
  it('for any measure, event direction, section and sign of the effect', () => {
    const effect = fc.oneof(
      fc.record({
        measure: fc.constantFrom<EffectMeasure>('rr', 'hr', 'or'),
        estimate: fc.double({ min: 0.3, max: 3, noNaN: true }),
      }),
      fc.record({ measure: fc.constant<EffectMeasure>('rrr'), estimate: fc.double({ min: -60, max: 60, noNaN: true }) }),
    );
    fc.assert(
      fc.property(
        effect,
        fc.boolean(),
        fc.constantFrom('benefit', 'harm') as fc.Arbitrary<'benefit' | 'harm'>,
        fc.integer({ min: 5, max: 30 }),
        (entered, wanted, kind, percent) => {
          const topic = topicOf({
            wanted,
            kind,
            ...entered,
            lower: entered.estimate,
            upper: entered.estimate,
            baseline: percent / 100,
          });
          const result = computeTopic(topic);
          const option = result.outcomes[0]?.options[1];
          if (option === undefined) throw new Error('no option');
          const change = changeOf(option.absoluteReduction.estimate, wanted);
          if (change !== 'none') expect(option.nnt.label).toBe(change === 'helps' ? 'NNTB' : 'NNTH');
          const text = sentencesOf(topic).join(' ');
          if (wanted) expect(text).not.toMatch(/\brisk|avoid|prevent|caus|reduction/i);
          if (!wanted && option.groups.prevented > 0) expect(text).toMatch(/avoid/);
          if (!wanted && option.groups.caused > 0) expect(text).toMatch(/because of/);
          if (wanted && option.groups.caused > 0) expect(text).toMatch(/more of those/);
          if (wanted && option.groups.prevented > 0) expect(text).toMatch(/fewer of those/);
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('an outcome whose name already says the period', () => {
  it('does not say the period twice', () => {
    const topic = topicOf({
      wanted: true,
      kind: 'benefit',
      measure: 'rr',
      estimate: 1.8,
      lower: 1.4,
      upper: 2.3,
      baseline: 0.25,
      period: { amount: 3, unit: 'days' },
    });
    const named = { ...topic, outcomes: topic.outcomes.map((outcome) => ({ ...outcome, name: 'pain gone by day 3' })) };
    const sentences = sentencesOf(named);
    expect(sentences).toContain('No treatment: about 25 in 100 people like you will have pain gone by day 3.');
    expect(sentences.join(' ')).not.toContain('by day 3 by day 3');
  });
});
