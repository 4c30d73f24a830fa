/**
 * Text measured with the embedded font's own metrics (jsPDF `getTextWidth` after
 * setting the face and size), wrapped to a width, and placed as baselines.
 */
import type { jsPDF } from 'jspdf';
import { HANDOUT_FONT_FAMILY } from './handout-fonts.ts';

/** Points per millimetre (72 pt to the inch, 25.4 mm to the inch). */
export const POINTS_PER_MM = 72 / 25.4;

/** Width of `text` in millimetres at `size` points. */
export type MeasureWidth = (text: string, size: number, bold: boolean) => number;

/**
 * A measure that asks jsPDF, so wrapping follows the font that is embedded.
 * jsPDF's width of a string (`getTextWidth`) is the sum of its characters'
 * advance widths (no kerning is applied with Identity-H fonts), so each
 * character's width is asked once per face (`getStringUnitWidth`) and summed.
 */
export function jsPdfMeasure(doc: jsPDF): MeasureWidth {
  const faces = { normal: new Map<number, number>(), bold: new Map<number, number>() };
  const millimetresPerPoint = 1 / doc.internal.scaleFactor;
  return (text, size, bold) => {
    const face = bold ? 'bold' : 'normal';
    const widths = faces[face];
    let units = 0;
    for (let index = 0; index < text.length; index += 1) {
      const code = text.charCodeAt(index);
      let width = widths.get(code);
      if (width === undefined) {
        doc.setFont(HANDOUT_FONT_FAMILY, face);
        width = doc.getStringUnitWidth(String.fromCharCode(code), { fontSize: 1, charSpace: 0 });
        widths.set(code, width);
      }
      units += width;
    }
    return units * size * millimetresPerPoint;
  };
}

/** How a run of text is set. */
export interface TextStyle {
  /** Size in points. */
  readonly size: number;
  readonly bold: boolean;
  readonly colour: string;
  /** Distance between baselines, as a multiple of the size. */
  readonly leading: number;
}

/** One line of text with its baseline, in millimetres from the block's top-left corner. */
export interface PlacedLine {
  readonly text: string;
  readonly x: number;
  readonly y: number;
}

/** A wrapped text block: lines, the style they are set in and the height it takes. */
export interface TextBlock {
  readonly lines: readonly PlacedLine[];
  readonly style: TextStyle;
  readonly height: number;
  /** The widest line, in millimetres. */
  readonly width: number;
}

/** DejaVu Sans ascent and descent (hhea 1901 and 483 / 2048 units per em), rounded up. */
const ASCENT = 0.93;
const DESCENT = 0.24;

/**
 * How far below a block's top its ink can reach: the last baseline plus the
 * font's descent. With tight leading this is a little more than the block's height.
 */
export function inkDepth(block: TextBlock): number {
  const last = block.lines[block.lines.length - 1];
  return last === undefined ? 0 : Math.max(block.height, last.y + (block.style.size * DESCENT) / POINTS_PER_MM);
}

/** Line height of a style, in millimetres. */
export function lineHeight(style: TextStyle): number {
  return (style.size * style.leading) / POINTS_PER_MM;
}

/** Split a word that is wider than the line into pieces that fit, character by character. */
function breakWord(word: string, maxWidth: number, style: TextStyle, measure: MeasureWidth): string[] {
  const pieces: string[] = [];
  let piece = '';
  for (const character of word) {
    if (piece !== '' && measure(piece + character, style.size, style.bold) > maxWidth) {
      pieces.push(piece);
      piece = character;
    } else {
      piece += character;
    }
  }
  if (piece !== '') pieces.push(piece);
  return pieces;
}

/**
 * Greedy wrapping: as many words on a line as fit in `maxWidth` (the first line
 * `firstLineIndent` less); a word wider than the line is broken between
 * characters so no text runs past the margin.
 *
 * @example wrapLines('one two three', 12, style, measure) // => ['one two', 'three'] (at a size where that fits)
 */
export function wrapLines(
  text: string,
  maxWidth: number,
  style: TextStyle,
  measure: MeasureWidth,
  firstLineIndent = 0,
): string[] {
  const words = text.split(/\s+/).filter((word) => word !== '');
  const lines: string[] = [];
  const room = () => (lines.length === 0 ? maxWidth - firstLineIndent : maxWidth);
  let line = '';
  for (const word of words) {
    const candidate = line === '' ? word : `${line} ${word}`;
    if (measure(candidate, style.size, style.bold) <= room()) {
      line = candidate;
      continue;
    }
    if (line !== '' || (lines.length === 0 && firstLineIndent > 0)) {
      lines.push(line);
    }
    if (measure(word, style.size, style.bold) <= room()) {
      line = word;
      continue;
    }
    const pieces = breakWord(word, room(), style, measure);
    lines.push(...pieces.slice(0, -1));
    line = pieces[pieces.length - 1] ?? '';
  }
  if (line !== '') lines.push(line);
  return lines;
}

/**
 * Wrap `text` into a block `maxWidth` wide, with its first baseline one ascent
 * below the top and a height of one line per line; `indent` moves every line
 * right, `firstLineIndent` the first line only (room for a run-in heading).
 */
export function textBlock(
  text: string,
  maxWidth: number,
  style: TextStyle,
  measure: MeasureWidth,
  indent = 0,
  firstLineIndent = 0,
): TextBlock {
  const wrapped = wrapLines(text, maxWidth - indent, style, measure, firstLineIndent);
  const step = lineHeight(style);
  const first = (style.size * ASCENT) / POINTS_PER_MM + (step - style.size / POINTS_PER_MM) / 2;
  return {
    lines: wrapped.map((line, index) => ({
      text: line,
      x: indent + (index === 0 ? firstLineIndent : 0),
      y: first + index * step,
    })),
    style,
    height: wrapped.length * step,
    width: wrapped.reduce((widest, line) => Math.max(widest, indent + measure(line, style.size, style.bold)), 0),
  };
}
