/**
 * Compact pictures: when the full-size pictures of every outcome do not fit, every outcome still
 * gets its pictures, all at one smaller scale, each with its option's two frames under it
 * (Trevena et al. 2013, the same format for every outcome compared; IPDAS 2005 checklist, both
 * frames for every outcome).
 */
import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { FIT_LADDER, type FitSettings } from '../../src/handout/fit-settings.ts';
import { codePointsOf, registerFonts } from '../../src/handout/handout-fonts.ts';
import { handoutContent } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import type { PageItem } from '../../src/handout/page-items.ts';
import { layoutPage } from '../../src/handout/page-layout.ts';
import { type Paper, contentBox } from '../../src/handout/paper-size.ts';
import { jsPdfMeasure } from '../../src/handout/text-layout.ts';
import { colourPalette } from '../../src/render/palette.ts';
import { demos, testFonts } from './support.ts';

const date = '2026-12-01';
const byName = (name: string) => {
  const found = demos().find((demo) => demo.name === name);
  if (found === undefined) throw new Error(`no demo ${name}`);
  return found;
};

/** The sheet's content for the demo `name`, without the NNT sentences. */
function contentOf(name: string) {
  const { topic, result } = byName(name);
  return handoutContent(result, topic, { date, appVersion: '0.1.0', showNnt: false, clinician: '', words: englishHandoutWords });
}

/** The compact page's items, laid out in a box `extra` millimetres taller than the paper's, at the ladder's tightest settings. */
function compactItems(name: string, paper: Paper, extra: number): { items: readonly PageItem[]; fits: boolean } {
  const content = contentOf(name);
  const doc = new jsPDF({ unit: 'mm', format: paper });
  const textOnly = content.outcomes.map((outcome) => ({
    ...outcome,
    pictures: { ...outcome.pictures, model: null, closeUp: outcome.pictures.closeUp?.label ?? null },
  }));
  registerFonts(doc, testFonts(), codePointsOf({ ...content, outcomes: textOnly }));
  const box = contentBox(paper);
  const layout = layoutPage(
    content,
    FIT_LADDER[FIT_LADDER.length - 1] as FitSettings,
    { ...box, height: box.height + extra },
    colourPalette,
    jsPdfMeasure(doc),
    { pictures: true, closeUps: false, compact: true, small: true },
  );
  return { items: layout.items, fits: layout.fits };
}

const words = (text: string) => text.replace(/\s+/g, ' ').trim();

describe.each([
  { name: '01-kidney-stone.json', denominator: 100 },
  { name: '02-bowel-screening.json', denominator: 1000 },
])('the compact pictures of $name', ({ name, denominator }) => {
  const { items } = compactItems(name, 'a4', 200);
  const { result } = byName(name);
  const pictures = items.filter(
    (item): item is Extract<PageItem, { kind: 'people' }> => item.kind === 'people' && item.layout.denominator === denominator,
  );

  it('draw a picture for every option of every outcome, benefits and side effects alike', () => {
    const options = result.outcomes[0]?.options.length ?? 0;
    expect(pictures).toHaveLength(result.outcomes.length * options);
    // Each picture's people add up to the sheet's denominator.
    for (const picture of pictures) expect(picture.layout.people).toHaveLength(denominator);
  });

  it('draw every picture at one scale, between 25 and 30 mm wide for pictures of 100', () => {
    const scales = new Set(pictures.map((picture) => (picture.width / picture.layout.geometry.width).toFixed(6)));
    expect(scales.size).toBe(1);
    if (denominator === 100) {
      for (const picture of pictures) {
        expect(picture.width).toBeGreaterThanOrEqual(25);
        expect(picture.width).toBeLessThanOrEqual(30);
      }
    }
  });

  it('print both frames of each option under its picture', () => {
    const content = contentOf(name);
    const texts = items.flatMap((item) =>
      item.kind === 'text' ? [{ x: item.x, y: item.y, text: words(item.block.lines.map((line) => line.text).join(' ')) }] : [],
    );
    let index = 0;
    for (const outcome of content.outcomes) {
      for (const frames of outcome.frames) {
        expect(frames).toHaveLength(2);
        const picture = pictures[index];
        index += 1;
        const caption = texts.find((text) => text.text === words(frames.join(' ')));
        expect(caption, frames.join(' ')).toBeDefined();
        // Under its own picture: below its top edge and within its slot (the step from one picture to the next).
        const slot = (pictures[1]?.x ?? 0) - (pictures[0]?.x ?? 0);
        expect(slot).toBeGreaterThan(0);
        expect(caption?.y ?? 0).toBeGreaterThan(picture?.y ?? Number.POSITIVE_INFINITY);
        expect(Math.abs((caption?.x ?? 0) - (picture?.x ?? 0))).toBeLessThan(slot);
      }
    }
  });
});

describe('the screening demo’s handout', () => {
  const { topic, result } = byName('02-bowel-screening.json');
  // On US Letter, 30 mm shorter, even the compact pictures do not fit with the screening section and
  // the disclosures, and the page falls back to the sentences without pictures.
  it.each(['a4'] as const)('prints every outcome’s pictures, compact, on %s', (paper) => {
    const built = buildHandout(result, topic, { date, appVersion: '0.1.0', paper }, testFonts());
    expect(built.ok).toBe(true);
    if (!built.ok) return;
    expect(built.pictures).toBe(true);
    expect(built.compactPictures).toBe(true);
    expect(built.pages).toBe(1);
  });
});

describe('the sore-throat demo, whose full-size pictures do not fit on A4', () => {
  it('prints compact pictures rather than none, its sentences at 9 pt or more', () => {
    const { topic, result } = byName('04-sore-throat.json');
    const built = buildHandout(result, topic, { date, appVersion: '0.1.0', paper: 'a4' }, testFonts());
    expect(built.ok && built.pictures && built.compactPictures).toBe(true);
    // The EU leaflet minimum (EC 2009 readability guideline).
    expect(built.ok ? built.sentenceSize : 0).toBeGreaterThanOrEqual(9);
  });
});

describe('the demo whose full-size pictures fit', () => {
  it.each(['03-fracture-medicine.json'])('keeps them full size on A4: %s', (name) => {
    const { topic, result } = byName(name);
    const built = buildHandout(result, topic, { date, appVersion: '0.1.0', paper: 'a4' }, testFonts());
    expect(built.ok && built.pictures && !built.compactPictures).toBe(true);
  });
});
