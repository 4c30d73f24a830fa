import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { HANDOUT_FONT_FAMILY, codePointsOf, registerFonts } from '../../src/handout/handout-fonts.ts';
import {
  POINTS_PER_MM,
  type TextStyle,
  inkDepth,
  jsPdfMeasure,
  lineHeight,
  textBlock,
  wrapLines,
} from '../../src/handout/text-layout.ts';
import { testFonts } from './support.ts';

const SAMPLES = [
  'With the standard dose, about 4 of those 100 people avoid a heart attack or stroke.',
  'People aged ≥ 65 – with a risk ≤ 15%: Zoë’s naïve café ∞',
  'Wij fl ffi AV To',
];

function documentWithFonts(): jsPDF {
  const doc = new jsPDF({ unit: 'mm', format: 'a4' });
  registerFonts(doc, testFonts(), codePointsOf([...SAMPLES, 'Pneumonoultramicroscopicsilicovolcanoconiosis']));
  return doc;
}

const style: TextStyle = { size: 12, bold: false, colour: '#000000', leading: 1.35 };

describe('measuring text', () => {
  const doc = documentWithFonts();
  const measure = jsPdfMeasure(doc);

  it('gives the width jsPDF gives for the embedded font, in both faces and at any size', () => {
    for (const text of SAMPLES) {
      for (const bold of [false, true]) {
        for (const size of [9, 11, 12, 17]) {
          doc.setFont(HANDOUT_FONT_FAMILY, bold ? 'bold' : 'normal');
          doc.setFontSize(size);
          expect(measure(text, size, bold)).toBeCloseTo(doc.getTextWidth(text), 9);
        }
      }
    }
  });

  it('finds bold text wider than regular text', () => {
    expect(measure(SAMPLES[0] ?? '', 12, true)).toBeGreaterThan(measure(SAMPLES[0] ?? '', 12, false));
  });
});

describe('wrapping text', () => {
  const measure = jsPdfMeasure(documentWithFonts());

  it('puts as many words on each line as fit and keeps every word in order', () => {
    const text = SAMPLES.join(' ');
    const lines = wrapLines(text, 60, style, measure);
    expect(lines.length).toBeGreaterThan(2);
    expect(lines.join(' ')).toBe(text);
    for (const line of lines) expect(measure(line, 12, false)).toBeLessThanOrEqual(60);
    lines.slice(0, -1).forEach((line, index) => {
      const nextWord = (lines[index + 1] ?? '').split(' ')[0];
      expect(measure(`${line} ${nextWord}`, 12, false)).toBeGreaterThan(60);
    });
  });

  it('breaks a word wider than the line between characters, so no piece runs past the edge', () => {
    const lines = wrapLines('A Pneumonoultramicroscopicsilicovolcanoconiosis case', 30, style, measure);
    expect(lines.length).toBeGreaterThan(2);
    expect(lines.join('').replace(/ /g, '')).toBe('APneumonoultramicroscopicsilicovolcanoconiosiscase');
    for (const line of lines) expect(measure(line, 12, false)).toBeLessThanOrEqual(30);
  });

  it('leaves room for a run-in heading on the first line only', () => {
    const lines = wrapLines(SAMPLES[0] ?? '', 100, style, measure, 40);
    expect(measure(lines[0] ?? '', 12, false)).toBeLessThanOrEqual(60);
    expect(measure(lines[1] ?? '', 12, false)).toBeGreaterThan(60);
  });
});

describe('a text block', () => {
  const measure = jsPdfMeasure(documentWithFonts());

  it('spaces baselines one line apart and is one line high per line', () => {
    const block = textBlock(SAMPLES.join(' '), 70, style, measure);
    const step = (12 * 1.35) / POINTS_PER_MM;
    expect(lineHeight(style)).toBeCloseTo(step, 12);
    expect(block.height).toBeCloseTo(block.lines.length * step, 12);
    block.lines.slice(1).forEach((line, index) => expect(line.y - (block.lines[index]?.y ?? 0)).toBeCloseTo(step, 12));
    expect(block.lines[0]?.y).toBeGreaterThan((12 * 0.9) / POINTS_PER_MM);
  });

  it('reaches down to the descenders of its last line', () => {
    const tight = textBlock(SAMPLES[0] ?? '', 70, { ...style, leading: 1.2 }, measure);
    expect(inkDepth(tight)).toBeGreaterThanOrEqual(tight.height);
  });
});
