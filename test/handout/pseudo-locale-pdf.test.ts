import { describe, expect, it } from 'vitest';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { englishHandoutWords, type HandoutWords } from '../../src/handout/handout-words.ts';
import { pseudoLocale, stripPseudo } from '../support/pseudo-locale.ts';
import { demos, pdfText, testFonts, writePdf } from './support.ts';

// Every word on the printed sheet comes from the handout's words (sentences, pictures, the sheet's
// own): with each of them wrapped as ⟦…⟧, what is left of the PDF's text once the wrapped parts
// are taken out is only what the clinician typed, numbers and symbols.

const pseudoWords: HandoutWords = {
  wording: pseudoLocale(englishHandoutWords.wording),
  chart: pseudoLocale(englishHandoutWords.chart),
  // The document language is a tag for the PDF, not a word on the sheet.
  handout: { ...pseudoLocale(englishHandoutWords.handout), language: englishHandoutWords.handout.language },
};

/** Every string a topic holds (title, population, names, questions, sources…), longest first. */
function typedStrings(value: unknown): string[] {
  if (typeof value === 'string') return value.trim() === '' ? [] : [value.trim()];
  if (Array.isArray(value)) return value.flatMap(typedStrings);
  if (value !== null && typeof value === 'object') return Object.values(value).flatMap(typedStrings);
  return [];
}

describe.each(demos().map((demo) => [demo.name, demo] as const))('the pseudo locale on the handout of %s', (_, demo) => {
  it('prints no word that did not come from the handout’s words', () => {
    const build = (showNnt: boolean) =>
      buildHandout(
        demo.result,
        demo.topic,
        { date: '2026-12-03', appVersion: '0.1.0', words: pseudoWords, showNnt },
        testFonts(),
      );
    // The brackets make every line longer: a sheet that then no longer fits with its NNT sentences is printed without them.
    const withNnt = build(true);
    const built = withNnt.ok ? withNnt : build(false);
    if (!built.ok) throw new Error(`expected a handout, got: ${built.message}`);
    // pdftotext breaks lines and hyphenates nothing: joined, a wrapped sentence reads whole again.
    let left = stripPseudo(pdfText(writePdf(built.pdf)).replace(/\s+/g, ' '));
    for (const typed of typedStrings(demo.topic).sort((a, b) => b.length - a.length)) {
      left = left.split(typed.replace(/\s+/g, ' ')).join(' ');
    }
    const words = left
      .replace(/NNT[BH]?|[\d.,%∞–—−·•()[\]:;/+=×÷«»“”"'’?!-]/g, ' ')
      .split(/\s+/)
      .filter((word) => word !== '');
    expect(words).toEqual([]);
  });
});
