import { describe, expect, it } from 'vitest';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

// Number needed to treat labelled NNTB / NNTH: Altman DG (1998). Confidence intervals for the number
// needed to treat. BMJ 317:1309–1312. Always with the period and the reference class (Cochrane
// Handbook v5.1, section 12.5.4.3); for the clinician view, since patients understand NNT less well
// than event rates (Zipkin et al. 2014, Ann Intern Med 161(4):270–280).
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
});
