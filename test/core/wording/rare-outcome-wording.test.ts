import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import { topicOf } from './single-outcome-topic.ts';

// Rare outcomes in words: one denominator large enough that the difference is whole people
// (common practice for natural frequencies; Trevena LJ et al. 2013, BMC Med Inform Decis Mak
// 13 Suppl 2:S7). Numbers are arithmetic on invented inputs, shown beside each check.

const sentencesOf = (topic: Parameters<typeof computeTopic>[0], per: 100 | null = null) =>
  topicWording(computeTopic(topic, { per })).outcomes.flatMap((outcome) =>
    outcome.options.flatMap((option) => option.sentences.map((found) => found.text)),
  );

describe('a rare outcome: 0.1% over a year, risk ratio 0.8 (0.7 to 0.9)', () => {
  const topic = topicOf({
    wanted: false,
    kind: 'benefit',
    measure: 'rr',
    estimate: 0.8,
    lower: 0.7,
    upper: 0.9,
    baseline: 0.001,
  });

  it('counts the words per 10,000 and the pictures per 1000', () => {
    const result = computeTopic(topic);
    expect(result.wordsDenominator).toBe(10000);
    expect(result.denominator).toBe(1000);
    expect(result.notices.map((found) => found.code)).toContain('denominator-raised');
  });

  it('says the change as whole people of 10,000', () => {
    const sentences = sentencesOf(topic);
    expect(sentences).toContain('No treatment: about 10 in 10,000 people like you will have pain relief in the next year.');
    expect(sentences).toContain('With the drops, about 2 of those 10,000 people avoid pain relief.');
  });

  it('never says "no difference" when counts per 100 are forced', () => {
    const sentences = sentencesOf(topic, 100);
    expect(sentences.join(' ')).not.toMatch(/no difference|no change/);
    expect(sentences).toContain('With the drops, the research puts the whole range of the change at fewer than 1 in 100 people.');
    expect(sentences).toContain(
      'With the drops, slightly fewer people have pain relief, but the difference is smaller than 1 in 100 people: fewer than 1 in 100 either way.',
    );
  });
});

describe('a difference below one in a million', () => {
  it('says "fewer than 1 in a million" rather than a number', () => {
    const topic = topicOf({
      wanted: false,
      kind: 'harm',
      measure: 'rr',
      estimate: 1.5,
      lower: 1.5,
      upper: 1.5,
      baseline: 0.0000005,
    });
    const result = computeTopic(topic);
    expect(result.wordsDenominator).toBe(1000000);
    const sentences = sentencesOf(topic);
    expect(sentences).toContain(
      'With the drops, slightly more people have pain relief, but the difference is smaller than 1 in a million people: about 1 in 1,000,000 either way.',
    );
    expect(sentences).toContain('About 999,999 will not.');
  });
});
