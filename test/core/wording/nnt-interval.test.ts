import { describe, expect, it } from 'vitest';
import { numberMessages } from '../../../src/core/messages/en/numbers.ts';
import { numberMessagesEs } from '../../../src/core/messages/es/numbers.ts';
import { wordingMessagesEs } from '../../../src/core/messages/es/wording.ts';
import { nntIntervalLimits, writeNntInterval } from '../../../src/core/nnt-interval.ts';
import { numberNeeded, numberNeededInterval, numberNeededLimits } from '../../../src/core/number-needed.ts';
import type { TopicResult } from '../../../src/core/topic/topic-result.ts';
import { shortHandoutSentences, topicWording } from '../../../src/core/wording/topic-wording.ts';
import { topicFixture } from './result-fixture.ts';

const difference = (estimate: number, lower: number | null = null, upper: number | null = null) => ({ estimate, lower, upper });

// Altman DG (1998), "Confidence intervals for the number needed to treat", BMJ 317:1309–1312, figures 1
// and 2: an absolute risk reduction of 10% with 95% interval −5% to 25% gives NNT 10 and the interval
// "NNTB 4 to ∞ to NNTH 20" (1/0.25 = 4 and 1/0.05 = 20), the benefit end first.
describe('the NNT interval as parts (Altman 1998)', () => {
  it('gives Altman’s example as an interval through infinity, benefit end first', () => {
    expect(numberNeededLimits(difference(0.1, -0.05, 0.25))).toEqual({ kind: 'through-infinity', benefit: 4, harm: 20 });
  });

  // 1/0.25 = 4 and 1/0.05 = 20, each rounded up for a benefit; −0.05 to −0.01 gives 20 to 100 for a harm.
  it('gives an interval on one side of no effect with its label, the smaller number first', () => {
    expect(numberNeededLimits(difference(0.1, 0.05, 0.25))).toEqual({ kind: 'one-side', label: 'NNTB', from: 4, to: 20 });
    expect(numberNeededLimits(difference(-0.02, -0.05, -0.01))).toEqual({ kind: 'one-side', label: 'NNTH', from: 20, to: 100 });
  });

  it('gives a limit exactly at no effect as an interval to infinity, and both limits there as infinity', () => {
    expect(numberNeededLimits(difference(0.1, 0, 0.25))).toEqual({ kind: 'to-infinity', label: 'NNTB', from: 4 });
    expect(numberNeededLimits(difference(-0.1, -0.25, 0))).toEqual({ kind: 'to-infinity', label: 'NNTH', from: 4 });
    expect(numberNeededLimits(difference(0, 0, 0))).toEqual({ kind: 'infinity' });
  });

  it('turns a wanted event around: more of it is the benefit', () => {
    expect(numberNeededLimits(difference(-0.2, -0.325, -0.1), { wanted: true })).toEqual({
      kind: 'one-side',
      label: 'NNTB',
      from: 4,
      to: 10,
    });
  });

  it('gives null without an interval', () => {
    expect(numberNeededLimits(difference(0.1))).toBeNull();
  });

  it('lists the numbers in the order the interval writes them', () => {
    expect(nntIntervalLimits({ kind: 'through-infinity', benefit: 4, harm: 20 })).toEqual([4, 20]);
    expect(nntIntervalLimits({ kind: 'one-side', label: 'NNTB', from: 13, to: 100 })).toEqual([13, 100]);
    expect(nntIntervalLimits({ kind: 'to-infinity', label: 'NNTH', from: 8 })).toEqual([8]);
    expect(nntIntervalLimits({ kind: 'infinity' })).toEqual([]);
  });
});

describe('writing the NNT interval in each language', () => {
  const through = { kind: 'through-infinity', benefit: 4, harm: 20 } as const;

  it('joins the limits with "to" in English and "a" in Spanish', () => {
    expect(writeNntInterval(through, numberMessages)).toBe('NNTB 4 to ∞ to NNTH 20');
    expect(writeNntInterval(through, numberMessagesEs)).toBe('NNTB 4 a ∞ a NNTH 20');
    expect(writeNntInterval({ kind: 'one-side', label: 'NNTB', from: 13, to: 100 }, numberMessagesEs)).toBe('NNTB 13 a 100');
    expect(writeNntInterval({ kind: 'to-infinity', label: 'NNTH', from: 8 }, numberMessagesEs)).toBe('NNTH 8 a ∞');
    expect(writeNntInterval({ kind: 'infinity' }, numberMessagesEs)).toBe('∞');
  });

  it('keeps the English summary text exactly as before, and writes it in Spanish when asked', () => {
    expect(numberNeeded(difference(0.1, -0.05, 0.25)).text).toBe('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
    expect(numberNeededInterval(difference(0.1, -0.05, 0.25))).toBe('NNTB 4 to ∞ to NNTH 20');
    expect(numberNeeded(difference(0.1, -0.05, 0.25), { words: numberMessagesEs }).text).toBe('NNTB 10 (NNTB 4 a ∞ a NNTH 20)');
  });

  it('says "no hay diferencia" for a difference of exactly 0 in Spanish', () => {
    expect(numberNeeded(difference(0), { words: numberMessagesEs }).text).toBe(
      'No hay diferencia entre las opciones, así que no hay número necesario a tratar',
    );
    expect(numberNeeded(difference(0, -0.05, 0.25), { words: numberMessagesEs }).text).toBe(
      'No hay diferencia entre las opciones, así que no hay número necesario a tratar (NNTB 4 a ∞ a NNTH 20)',
    );
  });
});

/** A one-option topic, named in Spanish, whose option has NNTB 10 and an absolute reduction of 0.1 with the given interval. */
function altmanTopic(lower: number, upper: number): TopicResult {
  const result = topicFixture([
    {
      name: 'un infarto',
      comparison: 15,
      options: [{ id: 'pastilla', name: 'la pastilla', intervention: 5, nnt: { rounded: 10, label: 'NNTB' } }],
    },
  ]);
  const [outcome] = result.outcomes;
  if (outcome === undefined) throw new Error('fixture');
  const options = outcome.options.map((option) =>
    option.isComparison ? option : { ...option, absoluteReduction: { estimate: 0.1, lower, upper } },
  );
  return { ...result, outcomes: [{ ...outcome, options }] };
}

describe('the NNT sentences take the interval from its parts', () => {
  const sentenceOf = (result: TopicResult, kind: string) =>
    topicWording(result, { catalogue: wordingMessagesEs })
      .outcomes.flatMap((outcome) => outcome.options.flatMap((option) => option.sentences))
      .find((found) => found.kind === kind);

  it('writes Altman’s example in Spanish: "NNTB 10 (NNTB 4 a ∞ a NNTH 20)"', () => {
    const found = sentenceOf(altmanTopic(-0.05, 0.25), 'nnt');
    expect(found?.text).toBe(
      'NNTB 10 (NNTB 4 a ∞ a NNTH 20): tratar a 10 personas como usted con la pastilla durante 10 años evita que una de ellas tenga un infarto. Su rango incluye que no haya ninguna diferencia.',
    );
    expect(found?.numbers).toEqual({ nnt: 10, years: 10, nntLimit1: 4, nntLimit2: 20 });
  });

  it('counts one limit for an interval to infinity, and the two of a one-sided interval', () => {
    expect(sentenceOf(altmanTopic(0, 0.25), 'nnt')?.numbers).toEqual({ nnt: 10, years: 10, nntLimit1: 4 });
    expect(sentenceOf(altmanTopic(0.05, 0.25), 'nnt')?.numbers).toEqual({ nnt: 10, years: 10, nntLimit1: 4, nntLimit2: 20 });
  });

  it('gives the short sentence the same interval', () => {
    const [found] = shortHandoutSentences(altmanTopic(-0.05, 0.25), { catalogue: wordingMessagesEs, showNnt: true }).filter(
      (sentence) => sentence.kind === 'short-nnt',
    );
    expect(found?.text).toBe(
      'NNTB 10 (NNTB 4 a ∞ a NNTH 20): tratar a 10 personas como usted durante 10 años evita que le pase a una de ellas. Su rango incluye que no haya ninguna diferencia.',
    );
    expect(found?.numbers).toEqual({ nnt: 10, years: 10, nntLimit1: 4, nntLimit2: 20 });
  });
});
