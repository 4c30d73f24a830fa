/**
 * The handout of rare outcomes and of intervals at other levels: the enlarged block of a
 * picture of 1000 that holds the people who differ, side-effect bands whose numbers tell the
 * same story (EU SmPC guideline on the summary of product characteristics, 2009, §4.8:
 * very common ≥ 1/10, common ≥ 1/100, uncommon ≥ 1/1000, rare ≥ 1/10,000, very rare below),
 * the words' denominator in the table, and the ranges' level.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import { frequencyBand } from '../../src/core/wording/frequency-band.ts';
import { bandOfCount, rowDenominator } from '../../src/handout/band-denominator.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { handoutContent } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import { pdfInfo, pdfText, testFonts, writePdf } from './support.ts';

const options = { date: '2026-12-01', appVersion: '0.1.0', showNnt: false, clinician: '', words: englishHandoutWords };

function screening(): Topic {
  const path = fileURLToPath(new URL('../../assets/demo/02-bowel-screening.json', import.meta.url));
  const reading = readTopicFile(readFileSync(path, 'utf8'));
  if (!reading.ok) throw new Error('the screening demo does not read');
  return reading.topic;
}

/** A tablet against a rare serious bleed (baseline 0.1%, HR 0.8, 0.7 to 0.9) and a rare rash. Invented. */
function rareTopic(level = 0.95): Topic {
  return {
    title: 'Taking a tablet to lower the chance of a rare serious bleed (illustrative)',
    population: 'adults aged 50 to 70 with no past bleeding',
    periodYears: 5,
    illustrative: true,
    options: [
      { id: 'none', name: 'no tablet', isComparison: true },
      { id: 'tablet', name: 'the tablet', isComparison: false },
    ],
    outcomes: [
      {
        id: 'bleed',
        name: 'a serious bleed',
        kind: 'benefit',
        isHeadline: true,
        baseline: { risk: 0.001, periodYears: 5, source: 'Invented population table' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'hr', estimate: 0.8, lower: 0.7, upper: 0.9, level },
            source: 'Invented',
            followUpYears: 5,
            certainty: 'moderate',
            importance: 'important',
          },
        ],
      },
      {
        id: 'rash',
        name: 'a rash',
        kind: 'harm',
        isHeadline: false,
        baseline: { risk: 0.0003, periodYears: 5, source: 'Invented' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'rr', estimate: 2, lower: 1.2, upper: 3.1, level },
            source: 'Invented',
            followUpYears: 5,
            certainty: 'low',
            importance: 'important',
          },
        ],
      },
    ],
    evidence: { summary: 'Invented numbers for tests.', reviewed: '2026-11-01' },
    questions: ['What matters most to me?'],
    clinician: '',
  };
}

describe('the screening demo’s handout (pictures of 1000)', () => {
  const topic = screening();
  const result = computeTopic(topic);
  const content = handoutContent(result, topic, options);

  // A conversion happens in sight: the line under the outcome's sentences says the starting chance was given for another period.
  it('says where the numbers are read that the starting chance was worked out for 15 years from 10', () => {
    expect(content.outcomes[0]?.assumptions[0]).toBe(
      'Your starting chance of dying of bowel cancer was given for 10 years. It was worked out for 15 years, assuming it stays steady.',
    );
  });

  // Derived from the demo file: 2% over 10 years is 1 − 0.98^1.5 = 2.98% over 15, 30 in 1000;
  // with HR 0.8, 1 − (1 − 0.0298)^0.8 = 2.39%, 24 in 1000 (Altman & Andersen 1999, BMJ 319:1492).
  it('enlarges block 0, which holds the 6 people screening helps, in both pictures', () => {
    expect(result.denominator).toBe(1000);
    const closeUp = content.outcomes[0]?.pictures.closeUp;
    expect(closeUp?.block).toBe(0);
    expect(closeUp?.layouts.map((layout) => layout.groups)).toEqual([
      { denominator: 100, event: 30, prevented: 0, caused: 0, free: 70 },
      { denominator: 100, event: 24, prevented: 6, caused: 0, free: 70 },
    ]);
    expect(closeUp?.label).toBe('The outlined 100 people, enlarged');
  });

  // Pictures are printed for every outcome or for none (PageMode): never the benefit's alone.
  it.each(['a4', 'letter'] as const)('prints on one page of %s, with every outcome’s pictures or none', (paper) => {
    const handout = buildHandout(result, topic, { ...options, paper }, testFonts());
    if (!handout.ok) throw new Error(handout.message);
    const path = writePdf(handout.pdf);
    expect(pdfInfo(path).Pages).toBe('1');
    const text = pdfText(path);
    const headings = text.match(/Chance of dying of bowel cancer over 15 years|Side effect: chance of/g) ?? [];
    expect(headings).toHaveLength(handout.pictures ? 3 : 0);
  });

  // The bleed: 5 in 10,000 without (rare), 5 + 10 = 15 in 10,000 with screening (uncommon).
  it('writes the rare bleed per 10,000, so that its band and its number agree', () => {
    const bleed = content.table.sections.flatMap((section) => section.rows).find((row) => row.outcomeId === 'bleed');
    expect(bleed?.denominator).toBe(10000);
    expect(bleed?.cells.map((cell) => cell.value)).toEqual(['rare: 5 in 10,000', 'uncommon: 15 in 10,000']);
    const camera = content.table.sections.flatMap((section) => section.rows).find((row) => row.outcomeId === 'camera');
    expect(camera?.cells.map((cell) => cell.value)).toEqual(['common: 10 in 1000', 'common: 90 in 1000']);
    expect(content.audience.at(-1)).toBe('Every number on this sheet is out of 1000 people, over the next 15 years.');
    expect(content.table.rareNote).toBe(
      'A rare side effect’s row counts out of more people, as it says, so that the word and the number agree.',
    );
  });
});

describe('a rare outcome’s handout: baseline 0.1%, HR 0.8 (0.7 to 0.9)', () => {
  const topic = rareTopic();
  const result = computeTopic(topic);
  const content = handoutContent(result, topic, options);

  it('says beside the picture that the difference is below one person of 1000, per 10,000', () => {
    expect(content.outcomes[0]?.pictures.notes).toEqual([
      null,
      'Fewer than 1 in 1000: about 2 in 10,000 fewer have a serious bleed with the tablet, too few to show as a whole person here.',
    ]);
  });

  it('enlarges the block holding the one person in 1000 with a bleed, as no one differs in the pictures', () => {
    expect(content.outcomes[0]?.pictures.closeUp?.block).toBe(0);
    expect(content.outcomes[0]?.pictures.closeUp?.layouts.map((layout) => layout.groups.event)).toEqual([1, 1]);
  });

  // The rash: 3 in 10,000 without (rare); RR 2 gives 6 in 10,000 (rare). The table uses the words' 10,000.
  it('writes the table and the sheet at the words’ denominator, 10,000, with the pictures at 1000', () => {
    const rash = content.table.sections[1]?.rows[0];
    expect(rash?.cells.map((cell) => cell.value)).toEqual(['rare: 3 in 10,000', 'rare: 6 in 10,000']);
    expect(content.audience.at(-1)).toBe(
      'The pictures show 1000 people; every other number is out of 10,000, over the next 5 years.',
    );
  });

  it('prints on one page, with no "same number" and no range of 1 to 1', () => {
    const handout = buildHandout(result, topic, options, testFonts());
    if (!handout.ok) throw new Error(handout.message);
    const text = pdfText(writePdf(handout.pdf));
    expect(handout.pages).toBe(1);
    expect(text).not.toMatch(/same number/i);
    expect(text).not.toContain('between 1 and 1 ');
    expect(text).toContain('about 2 in 10,000 fewer have a serious bleed');
    expect(text).toContain('Each range is a 95% interval.');
  });
});

describe('a 90% topic', () => {
  it('shows "90%" beside its range on the handout', () => {
    const topic = rareTopic(0.9);
    const handout = buildHandout(computeTopic(topic), topic, options, testFonts());
    if (!handout.ok) throw new Error(handout.message);
    const text = pdfText(writePdf(handout.pdf));
    expect(text).toContain('Each range is a 90% interval.');
    expect(text).not.toContain('95%');
  });
});

describe('band words agree with their numbers', () => {
  it('reads a written count as its band', () => {
    expect(bandOfCount(5, 10000)).toBe('rare');
    expect(bandOfCount(1, 1000)).toBe('uncommon');
    expect(bandOfCount(0, 1000)).toBeNull();
    expect(bandOfCount(0, 10000)).toBe('very-rare');
  });

  it('raises a row to the smallest denominator at which every cell agrees', () => {
    // 0.0005 is 1 of 1000 (uncommon, not rare) but 5 of 10,000 (rare).
    expect(rowDenominator([0.0005, 0.0015], 1000)).toBe(10000);
    // 0.00096 is rare: 1 of 1000 and 10 of 10,000 both read uncommon; 96 of 100,000 reads rare.
    expect(rowDenominator([0.00096], 1000)).toBe(100000);
    expect(rowDenominator([0.03, 0.09], 100)).toBe(100);
  });

  // Property over risks from 1 in 10 million to 50%: the written count reads as the risk's band.
  it('agrees for every risk, at the denominator chosen', () => {
    for (let step = 0; step <= 2000; step += 1) {
      const risk = 10 ** (-7 + (step / 2000) * 6.7);
      const denominator = rowDenominator([risk], 100);
      const count = Math.round(risk * denominator);
      const read = count === 0 ? (denominator >= 10000 ? 'very-rare' : null) : frequencyBand(count / denominator);
      if (denominator < 1000000) expect(read).toBe(frequencyBand(risk));
    }
  });
});
