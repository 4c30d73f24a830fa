/**
 * Text measurement and line wrapping without a rendering engine.
 */
import { DEJAVU_SANS_BOLD_WIDTHS, DEJAVU_SANS_WIDTHS } from './dejavu-sans-widths.ts';

/** Width of `text` at `fontSize`, in the same units as `fontSize`. */
export type MeasureText = (text: string, fontSize: number, bold: boolean) => number;

/** Width of a character outside printable ASCII: that of a lower-case "o" (common practice for estimates). */
const FALLBACK_WIDTH = 612;

/**
 * The width of a string set in DejaVu Sans, from the font's own advance widths
 * (no kerning).
 *
 * @example measureDejaVuSans('Hello', 10, false) // => 25.35
 */
export const measureDejaVuSans: MeasureText = (text, fontSize, bold) => {
  const widths = bold ? DEJAVU_SANS_BOLD_WIDTHS : DEJAVU_SANS_WIDTHS;
  let thousandths = 0;
  for (const character of text) {
    const code = character.codePointAt(0) ?? 0;
    thousandths += (code >= 32 && code <= 126 ? widths[code - 32] : undefined) ?? FALLBACK_WIDTH;
  }
  return (thousandths / 1000) * fontSize;
};

/**
 * Greedy word wrapping: as many words on each line as fit in `maxWidth`; a word
 * longer than the line stands alone on its line.
 */
export function wrapText(text: string, maxWidth: number, fontSize: number, bold: boolean, measure: MeasureText): string[] {
  const words = text.split(/\s+/).filter((word) => word !== '');
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    const candidate = line === '' ? word : `${line} ${word}`;
    if (line !== '' && measure(candidate, fontSize, bold) > maxWidth) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line !== '') lines.push(line);
  return lines;
}
