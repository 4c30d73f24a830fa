/**
 * The fonts embedded in a handout, passed in as bytes so the builder runs the
 * same in the browser (fonts fetched by the app) and in Node (fonts read from
 * disk by `node-fonts.ts`). Each handout embeds only the glyphs its text uses.
 */
import type { jsPDF } from 'jspdf';
import { type ParsedFont, parseTrueType, subsetTrueType } from './font-subset.ts';

/** The font family name the handout registers its two faces under. */
export const HANDOUT_FONT_FAMILY = 'DejaVuSans';

/** The regular and bold faces of one TrueType family, read once for any number of handouts. */
export interface HandoutFonts {
  readonly regular: ParsedFont;
  readonly bold: ParsedFont;
}

/** TrueType files start with the version 1.0 tag 00 01 00 00 (OpenType spec, table directory). */
const TRUETYPE_TAG = [0, 1, 0, 0] as const;

/** Characters always embedded besides those of the text: printable ASCII and the list bullet. */
const ALWAYS: readonly number[] = [...Array.from({ length: 95 }, (_, index) => 0x20 + index), 0x2022];

function checkedFont(bytes: Uint8Array, face: string): ParsedFont {
  if (!TRUETYPE_TAG.every((value, index) => bytes[index] === value)) {
    throw new RangeError(`handoutFonts requires TrueType font files (the ${face} face is not one)`);
  }
  return parseTrueType(bytes);
}

/**
 * Read the two faces of a TrueType family (DejaVu Sans in the app) once, for any
 * number of handouts.
 *
 * @throws RangeError when either file is not a TrueType font with a Unicode map
 * @example handoutFonts({ regular: regularBytes, bold: boldBytes }).regular.glyphOf.get(0x2265) // => a glyph index for ≥
 */
export function handoutFonts(files: { readonly regular: Uint8Array; readonly bold: Uint8Array }): HandoutFonts {
  return { regular: checkedFont(files.regular, 'regular'), bold: checkedFont(files.bold, 'bold') };
}

/** One character per byte, as jsPDF's file store expects. */
function binaryString(bytes: Uint8Array): string {
  const chunk = 0x2000;
  const parts: string[] = [];
  for (let start = 0; start < bytes.length; start += chunk) {
    parts.push(String.fromCharCode.apply(null, bytes.subarray(start, start + chunk) as unknown as number[]));
  }
  return parts.join('');
}

/** The code points of every string inside `value` (objects and arrays walked). */
export function codePointsOf(value: unknown, into: Set<number> = new Set(ALWAYS)): Set<number> {
  if (typeof value === 'string') {
    for (const character of value) into.add(character.codePointAt(0) ?? 0);
  } else if (Array.isArray(value)) {
    for (const item of value) codePointsOf(item, into);
  } else if (typeof value === 'object' && value !== null) {
    for (const item of Object.values(value)) codePointsOf(item, into);
  }
  return into;
}

/** Register both faces, cut down to `codes`, in a document and make the regular face current. */
export function registerFonts(doc: jsPDF, fonts: HandoutFonts, codes: ReadonlySet<number>): void {
  doc.addFileToVFS(`${HANDOUT_FONT_FAMILY}.ttf`, binaryString(subsetTrueType(fonts.regular, codes)));
  doc.addFont(`${HANDOUT_FONT_FAMILY}.ttf`, HANDOUT_FONT_FAMILY, 'normal');
  doc.addFileToVFS(`${HANDOUT_FONT_FAMILY}-Bold.ttf`, binaryString(subsetTrueType(fonts.bold, codes)));
  doc.addFont(`${HANDOUT_FONT_FAMILY}-Bold.ttf`, HANDOUT_FONT_FAMILY, 'bold');
  doc.setFont(HANDOUT_FONT_FAMILY, 'normal');
}
