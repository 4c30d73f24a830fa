/**
 * A checklist of the sheet against the IPDAS instrument (IPDASi; Elwyn G et al. 2009, "Assessing the
 * quality of decision support technologies using the International Patient Decision Aid Standards
 * instrument (IPDASi)", PLoS ONE 4(3):e4705) for what a topic's author can disclose, and against the
 * screening items of the risk communication primer (Trevena LJ et al. 2013, "Presenting quantitative
 * information about decision outcomes", BMC Med Inform Decis Mak 13 Suppl 2:S7). Each check is named
 * with its item; the wording of the items is paraphrased from memory. The text is read back from the
 * PDF by poppler's pdftotext, independently of the code that wrote it.
 */
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import type { TopicResult } from '../../src/core/topic/topic-result.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import type { Paper } from '../../src/handout/paper-size.ts';
import { demos, pdfText, testFonts, writePdf } from './support.ts';

function sheetText(result: TopicResult, topic: Topic, paper: Paper = 'a4'): string {
  const handout = buildHandout(result, topic, { date: '2026-12-01', appVersion: '0.1.0', paper }, testFonts());
  if (!handout.ok) throw new Error(handout.message);
  return pdfText(writePdf(handout.pdf));
}

/** A source as the sheet writes it: trimmed, without a full stop of its own. */
const sourceWords = (source: string) => source.trim().replace(/[.!?]+$/, '');

const disclosed = {
  preparedBy: 'Hillside practice nurses (invented)',
  funding: 'Hillside practice, no outside funding',
  interests: 'None declared',
  reviewBy: '2028-06-30',
};

describe.each(demos())('the sheet of $name against IPDASi', ({ topic, result }) => {
  const asGiven = sheetText(result, topic);
  const withDisclosures = sheetText(result, { ...topic, about: disclosed });
  const about = topic.about;

  it('has an "About this sheet" line in every case', () => {
    expect(asGiven).toContain('About this sheet.');
    expect(withDisclosures).toContain('About this sheet.');
  });

  it('IPDASi: gives the credentials of the developers (who wrote it), "not stated" when not given', () => {
    const expected = about === undefined || about.preparedBy.trim() === '' ? 'not stated' : sourceWords(about.preparedBy);
    expect(asGiven).toContain(`Written by: ${expected}.`);
    expect(withDisclosures).toContain('Written by: Hillside practice nurses (invented).');
  });

  it('IPDASi: gives information about the funding used for its development, "not stated" when empty', () => {
    const expected = about === undefined || about.funding.trim() === '' ? 'not stated' : sourceWords(about.funding);
    expect(asGiven).toContain(`Funding: ${expected}.`);
    expect(withDisclosures).toContain('Funding: Hillside practice, no outside funding.');
    const empty = sheetText(result, { ...topic, about: { ...disclosed, funding: '   ' } });
    expect(empty).toContain('Funding: not stated.');
    expect(empty).not.toMatch(/Funding: *\./);
  });

  it('IPDASi: includes a statement about conflicts of interest, "not stated" when not given', () => {
    const expected = about === undefined || about.interests.trim() === '' ? 'not stated' : sourceWords(about.interests);
    expect(asGiven).toContain(`Interests: ${expected}.`);
    expect(withDisclosures).toContain('Interests: None declared.');
  });

  it('IPDASi: reports when it is to be updated (the review-by date, in words)', () => {
    // 2028-06-30 is 30 June 2028 (ISO 8601 calendar date, extended format).
    expect(withDisclosures).toContain('Review by: 30 June 2028.');
    if (about === undefined || about.reviewBy === '') expect(asGiven).toContain('Review by: not stated.');
  });

  it('IPDASi: provides references to the scientific evidence used (a source for each effect)', () => {
    const effects = topic.outcomes.flatMap((outcome) => outcome.effects);
    expect(effects.length).toBeGreaterThan(0);
    expect(asGiven).toContain('The effects come from:');
    for (const effect of effects) expect(asGiven).toContain(sourceWords(effect.source));
  });

  if (topic.screening === undefined) {
    it('has no screening section, as the topic has no screening entries', () => {
      expect(asGiven).not.toContain('If you have the test');
    });
  } else {
    it('Trevena 2013 / IPDASi (tests): says what a positive result leads to', () => {
      expect(asGiven).toContain(
        `If you have the test: a positive result leads to ${sourceWords(topic.screening?.positiveLeadsTo ?? '')}.`,
      );
    });

    it('Trevena 2013 / IPDASi (tests): gives the chance of a missed case (false reassurance) per the sheet’s people', () => {
      // The demo's "3 in 1000" on a sheet out of 1000 people: 0.003 × 1000 = 3 (rounded half up, common practice).
      expect(result.wordsDenominator).toBe(1000);
      expect(asGiven).toContain('About 3 in 1000 people who have the test are told all is well, but they do have the illness.');
    });

    it('Trevena 2013 / IPDASi (tests): gives the chance of overdiagnosis per the sheet’s people', () => {
      // "4 in 1000": 0.004 × 1000 = 4.
      expect(asGiven).toContain(
        'About 4 in 1000 people who have the test are found to have an illness that would never have harmed them.',
      );
    });

    it('counts the screening chances per the sheet’s own number of people when it changes', () => {
      // Per 10,000: 0.003 × 10,000 = 30 and 0.004 × 10,000 = 40; per 100: 0.3 and 0.4 round to 0 people,
      // written "fewer than 1" because the chance is not 0 (the app's rule for counts that round to none).
      const per10000 = computeTopic(topic, { per: 10000 });
      expect(sheetText(per10000, topic)).toContain('About 30 in 10,000 people who have the test are told all is well');
      expect(sheetText(per10000, topic)).toContain('About 40 in 10,000 people who have the test are found');
      const per100 = computeTopic(topic, { per: 100 });
      expect(per100.wordsDenominator).toBe(100);
      expect(sheetText(per100, topic)).toContain('Fewer than 1 in 100 people who have the test are told all is well');
    });

    it('leaves the screening section out once nothing of it is filled in', () => {
      const none = sheetText(result, { ...topic, screening: { positiveLeadsTo: ' ', missedCase: null, overdiagnosis: null } });
      expect(none).not.toContain('If you have the test');
    });
  }
});
