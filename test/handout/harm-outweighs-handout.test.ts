/**
 * A handout where a side effect outweighs the benefit (an invented, illustrative topic): the
 * harm is told with the same elements as the benefit, read back from the PDF with pdftotext.
 */
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { handoutContent } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import { harmOutweighsTopic } from './harm-outweighs-topic.ts';
import { pdfText, testFonts, writePdf } from './support.ts';

// Equal detail for positive and negative features: IPDAS certification criterion (Joseph-Williams
// et al. 2014, Med Decis Making 34(6):699–710); both frames, one denominator and period, the
// incremental change and its uncertainty: Trevena et al. 2013, BMC Med Inform Decis Mak 13(Suppl 2):S7;
// certainty statements: Santesso et al. 2020, J Clin Epidemiol 119:126–135 (high: "increases";
// moderate: "probably reduces").
// Arithmetic (derived): stroke 3% × RR 0.9 = 2.7%: 30 and 27 in 1000, 3 fewer; RR 0.8 to 0.99 gives
// 2.4% to 2.97%, 0 to 6 fewer. Bleeding 2% × RR 3 = 6%: 20 and 60 in 1000, 40 more; RR 2 to 4.5 gives
// 4% to 9%, 20 to 70 more.
describe('a handout where the harm outweighs the benefit', () => {
  const topic = harmOutweighsTopic();
  const handout = buildHandout(computeTopic(topic), topic, { date: '2026-12-01', appVersion: '0.1.0' }, testFonts());
  if (!handout.ok) throw new Error(handout.message);
  const text = pdfText(writePdf(handout.pdf));

  it('prints on one page, with pictures for both outcomes', () => {
    expect(handout.pages).toBe(1);
    expect(handout.pictures).toBe(true);
    // Four arrays of 1000 people, each look drawn once and placed per person: the project's own size target.
    expect(handout.pdf.byteLength).toBeLessThan(100_000);
    expect(text).toContain('Chance of a stroke over 5 years');
    expect(text).toContain('Side effect: chance of serious bleeding over 5 years');
  });

  it('gives the harm its counts with and without, the "will not" frame, the extra people, the range and the certainty', () => {
    expect(text).toContain(
      'No tablet: about 20 in 1000 people like you will have serious bleeding in the next 5 years. About 980 will not.',
    );
    expect(text).toContain(
      'The tablet: about 60 in 1000 people like you will have serious bleeding in the next 5 years. About 940 will not.',
    );
    expect(text).toContain('About 40 in 1000 get serious bleeding because of the tablet.');
    expect(text).toContain('could be anywhere between 20 and 70 in 1000');
    expect(text).toContain('The tablet increases the chance of serious bleeding.');
  });

  it('gives the benefit the same elements', () => {
    expect(text).toContain(
      'No tablet: about 30 in 1000 people like you will have a stroke in the next 5 years. About 970 will not.',
    );
    expect(text).toContain(
      'The tablet: about 27 in 1000 people like you will have a stroke in the next 5 years. About 973 will not.',
    );
    expect(text).toContain('With the tablet, about 3 of those 1000 people avoid a stroke.');
    expect(text).toContain('could be anywhere between 0 and 6 in 1000');
    expect(text).toContain('The tablet probably reduces the chance of a stroke.');
  });

  it('asks what matters by naming the benefit and the harm', () => {
    expect(text).toContain('How much does avoiding a stroke matter to you? Weigh it against the chance of serious bleeding.');
  });

  // EU SmPC guideline (European Commission 2009, section 4.8): 2% and 6% are both "common" (1 in 100 to
  // 1 in 10), so the band word stands with the numbers with and without and the change of 40.
  it('never lets the band word "common" hide the difference between 20 and 60 in 1000', () => {
    const content = handoutContent(computeTopic(topic), topic, {
      date: '2026-12-01',
      appVersion: '0.1.0',
      showNnt: false,
      clinician: '',
      words: englishHandoutWords,
    });
    const bleed = content.table.sections.flatMap((section) => section.rows).find((row) => row.outcomeId === 'bleed');
    expect(bleed?.cells.map((cell) => [cell.value, cell.change])).toEqual([
      ['common: 20 in 1000', null],
      ['common: 60 in 1000', '40 more'],
    ]);
    const stroke = content.table.sections.flatMap((section) => section.rows).find((row) => row.outcomeId === 'stroke');
    expect(stroke?.cells.map((cell) => [cell.value, cell.change])).toEqual([
      ['30 in 1000', null],
      ['27 in 1000', '3 fewer'],
    ]);
  });
});
