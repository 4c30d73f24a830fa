import { describe, expect, it } from 'vitest';
import { buildHandout, type HandoutBuilt } from '../../src/handout/build-handout.ts';
import { spanishHandoutWords } from '../../src/handout/handout-words.ts';
import { HANDOUT_MARGIN } from '../../src/handout/paper-size.ts';
import { normalise, pdfInfo, pdfText, spanishDemos, testFonts, wordBoxes, writePdf } from './support.ts';

// The invented, illustrative Spanish demo (a daily tablet for fewer migraine days over 3 months),
// printed on both papers in Spanish: sentences, pictures and the sheet's own words.

const points = (millimetres: number) => (millimetres * 72) / 25.4;
// ISO 216 A4 = 595.28 × 841.89 pt; ANSI Letter = 612 × 792 pt (72 pt to the inch).
const PAGE_POINTS = { a4: { width: 595.28, height: 841.89 }, letter: { width: 612, height: 792 } } as const;

const demo = spanishDemos()[0];

function spanishHandout(paper: 'a4' | 'letter', showNnt = false): HandoutBuilt {
  if (demo === undefined) throw new Error('the Spanish demo topic is missing from assets/demo');
  const built = buildHandout(
    demo.result,
    demo.topic,
    { date: '2026-12-03', appVersion: '0.1.0', paper, showNnt, words: spanishHandoutWords },
    testFonts(),
  );
  if (!built.ok) throw new Error(`expected a handout, got: ${built.message}`);
  return built;
}

describe.each(['a4', 'letter'] as const)('the Spanish demo handout on %s', (paper) => {
  const handout = spanishHandout(paper);
  const path = writePdf(handout.pdf);
  const text = pdfText(path);

  it('is one page, with every word inside the 15 mm margins', () => {
    expect(pdfInfo(path).Pages).toBe('1');
    const margin = points(HANDOUT_MARGIN);
    const page = PAGE_POINTS[paper];
    const boxes = wordBoxes(path);
    expect(boxes.length).toBeGreaterThan(100);
    for (const box of boxes) {
      expect(box.xMin, box.word).toBeGreaterThanOrEqual(margin - 0.01);
      expect(box.xMax, box.word).toBeLessThanOrEqual(page.width - margin + 0.01);
      expect(box.yMax, box.word).toBeLessThanOrEqual(page.height - margin + 0.01);
    }
  });

  it('prints every sentence of the Spanish wording as extractable text', () => {
    expect(handout.wordingSentences.length).toBeGreaterThan(5);
    for (const sentence of handout.wordingSentences) expect(text).toContain(normalise(sentence));
  });

  it('says in Spanish that it supports and does not replace the clinician’s advice, and to follow local guidance', () => {
    expect(text).toContain('no una predicción para usted');
    expect(text).toContain('y no sustituye sus consejos.');
    expect(text).toContain('Siga las recomendaciones locales.');
  });

  it('marks the invented numbers and dates the sheet the Spanish way', () => {
    // Dates as "3 de diciembre de 2026": RAE & ASALE 2010, Ortografía de la lengua española, dates (from memory).
    expect(text).toContain('Ejemplo ilustrativo');
    expect(text).toContain('Impreso el 3 de diciembre de 2026');
    expect(text).toContain('Página 1 de 1');
  });

  it('writes its numbers as "de cada 100" with a decimal comma, and no English sentence', () => {
    expect(text).toContain('de cada 100');
    // The app's version in the footer ("Chancewise 0.1.0") is not a number the patient reads.
    expect(text.replace(/Chancewise \d+\.\d+\.\d+/, '')).not.toMatch(/\b\d+\.\d+\b/);
    expect(text).not.toMatch(/\b(in 100|people like you|because of|Printed on|Illustrative example)\b/);
  });
});

describe('the Spanish handout as a document', () => {
  const handout = spanishHandout('a4', true);

  it('declares Spanish as the document language, so a screen reader speaks it as Spanish', () => {
    // PDF 32000-1:2008 §14.9.2: the document catalogue's /Lang entry names the natural language.
    const raw = Buffer.from(handout.pdf).toString('latin1');
    expect(raw).toMatch(/\/Lang \(es\)/);
  });

  it('scores its prose on the INFLESZ scale, at or above the target of 55', () => {
    // Szigriszt-Pazos perspicuity, bands and target of Barrio-Cantalejo et al. 2008 (INFLESZ), 55 "normal" or easier.
    expect(handout.readingScale.scale).toBe('inflesz');
    expect(handout.readingScale.score ?? 0).toBeGreaterThanOrEqual(55);
    expect(handout.readingScale.withinTarget).toBe(true);
  });

  it('writes the number needed to treat with its Spanish interval when asked', () => {
    const text = pdfText(writePdf(handout.pdf));
    expect(text).toMatch(/NNTB \d+ \(NNTB \d+ a \d+\)/);
  });

  it('is the same bytes each time', () => {
    const first = spanishHandout('a4', true);
    const again = spanishHandout('a4', true);
    expect(Buffer.from(again.pdf).equals(Buffer.from(first.pdf))).toBe(true);
  });
});
