import { describe, expect, it } from 'vitest';
import type { TopicResult } from '../../../src/core/topic/topic-result.ts';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

/** The stroke topic with the tablet's NNT and absolute reduction (with its own interval) given. */
function withInterval(nnt: { rounded: number; label: 'NNTB' | 'NNTH' }, lower: number, upper: number): TopicResult {
  const estimate = (nnt.label === 'NNTB' ? 1 : -1) / nnt.rounded;
  const result = strokeTopic({ nnt, range: null });
  const [outcome] = result.outcomes;
  if (outcome === undefined) throw new Error('fixture');
  const options = outcome.options.map((option) =>
    option.isComparison ? option : { ...option, absoluteReduction: { estimate, lower, upper } },
  );
  return { ...result, outcomes: [{ ...outcome, options }] };
}

describe('nntSentence', () => {
  it('says "NNTB 17: treating 17 people like you ... for 10 years prevents a stroke in one of them"', () => {
    const found = sentenceOf(strokeTopic({ nnt: { rounded: 17, label: 'NNTB' } }), 'nnt');
    expect(found?.text).toBe(
      'NNTB 17: treating 17 people like you with the tablet for 10 years prevents a stroke in one of them.',
    );
    expect(found?.numbers).toEqual({ nnt: 17, years: 10 });
    expect(found?.audience).toBe('clinician');
  });

  it("takes the number from the result's NNT: 1 / (0.15 − 0.11) = 25", () => {
    expect(sentenceOf(strokeTopic(), 'nnt')?.numbers.nnt).toBe(25);
  });

  it('says "causes" for a number needed to harm', () => {
    const result = topicFixture(
      [
        {
          name: 'muscle pain',
          kind: 'harm',
          comparison: 2,
          options: [{ id: 'tablet', name: 'the tablet', intervention: 3, nnt: { rounded: 100, label: 'NNTH' } }],
        },
      ],
      { periodYears: 1 },
    );
    expect(sentenceOf(result, 'nnt')?.text).toBe(
      'NNTH 100: treating 100 people like you with the tablet for 1 year causes muscle pain in one of them.',
    );
  });

  it('uses the singular reference class for an NNT of 1', () => {
    expect(sentenceOf(strokeTopic({ nnt: { rounded: 1, label: 'NNTB' } }), 'nnt')?.text).toContain('treating 1 person like you');
  });

  it('says there is no NNT, never "infinity", when the option makes no difference', () => {
    const found = sentenceOf(strokeTopic({ intervention: 15, interventionRisk: 0.15 }), 'nnt-none');
    expect(found?.text).toBe(
      'There is no number needed to treat: on these numbers, the tablet makes no difference to the chance of a stroke.',
    );
    expect(found?.text).not.toMatch(/∞|infinit/i);
    expect(found?.audience).toBe('clinician');
  });

  it('never writes "1 in" the NNT', () => {
    expect(sentenceOf(strokeTopic({ nnt: { rounded: 17, label: 'NNTB' } }), 'nnt')?.text).not.toMatch(/1 in 17/);
  });

  // Altman DG (1998), BMJ 317:1309–1312, figures 1 and 2: an absolute risk reduction of 10% with 95%
  // interval −5% to 25% gives NNT 10 and the interval "NNTB 4 to ∞ to NNTH 20" (the example as restated
  // by Newcombe RG, rapid response to the paper, BMJ, 5 January 1999).
  it('prints Altman’s worked example with its interval through infinity, and says the range includes no difference', () => {
    const found = sentenceOf(withInterval({ rounded: 10, label: 'NNTB' }, -0.05, 0.25), 'nnt');
    expect(found?.text).toBe(
      'NNTB 10 (NNTB 4 to ∞ to NNTH 20): treating 10 people like you with the tablet for 10 years prevents a stroke in one of them. Its range includes no difference at all.',
    );
    expect(found?.numbers).toEqual({ nnt: 10, years: 10, nntLimit1: 4, nntLimit2: 20 });
  });

  // Interval wholly on the benefit side: 1/0.25 = 4 and 1/0.05 = 20, each rounded up (Altman 1998).
  it('prints an interval on one side of no effect without the infinity and without the clause', () => {
    const found = sentenceOf(withInterval({ rounded: 10, label: 'NNTB' }, 0.05, 0.25), 'nnt');
    expect(found?.text).toBe(
      'NNTB 10 (NNTB 4 to 20): treating 10 people like you with the tablet for 10 years prevents a stroke in one of them.',
    );
  });

  // A harm's interval: differences −0.05 to −0.01 give NNTH 20 to 100 (rounded down for a harm).
  it('labels both ends NNTH for a harm’s interval', () => {
    const found = sentenceOf(withInterval({ rounded: 50, label: 'NNTH' }, -0.05, -0.01), 'nnt');
    expect(found?.text).toMatch(/^NNTH 50 \(NNTH 20 to 100\): treating 50 people like you/);
  });
});
