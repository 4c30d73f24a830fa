import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEJAVU_SANS_BOLD_WIDTHS, DEJAVU_SANS_WIDTHS } from '../../../src/render/text/dejavu-sans-widths.ts';
import { measureDejaVuSans, wrapText } from '../../../src/render/text/measure-text.ts';

/** Advance widths (thousandths of an em) of ASCII 32–126 read from a TrueType file's cmap and hmtx (OpenType spec). */
function advanceWidths(file: string): number[] {
  const font = readFileSync(file);
  const tables: Record<string, number> = {};
  for (let table = 0; table < font.readUInt16BE(4); table += 1) {
    const record = 12 + table * 16;
    tables[font.toString('ascii', record, record + 4)] = font.readUInt32BE(record + 8);
  }
  const [head, hhea, hmtx, cmap] = [tables.head!, tables.hhea!, tables.hmtx!, tables.cmap!];
  const unitsPerEm = font.readUInt16BE(head + 18);
  const metrics = font.readUInt16BE(hhea + 34);
  let subtable = 0;
  for (let index = 0; index < font.readUInt16BE(cmap + 2); index += 1) {
    const record = cmap + 4 + index * 8;
    if (font.readUInt16BE(record) === 3 && font.readUInt16BE(record + 2) === 1) subtable = cmap + font.readUInt32BE(record + 4);
  }
  const segments = font.readUInt16BE(subtable + 6) / 2;
  const ends = subtable + 14;
  const starts = ends + segments * 2 + 2;
  const deltas = starts + segments * 2;
  const offsets = deltas + segments * 2;
  const glyph = (code: number) => {
    for (let segment = 0; segment < segments; segment += 1) {
      if (code > font.readUInt16BE(ends + segment * 2)) continue;
      const start = font.readUInt16BE(starts + segment * 2);
      if (code < start) return 0;
      const delta = font.readInt16BE(deltas + segment * 2);
      const offset = font.readUInt16BE(offsets + segment * 2);
      if (offset === 0) return (code + delta) & 0xffff;
      const found = font.readUInt16BE(offsets + segment * 2 + offset + (code - start) * 2);
      return found === 0 ? 0 : (found + delta) & 0xffff;
    }
    return 0;
  };
  const widths: number[] = [];
  for (let code = 32; code <= 126; code += 1) {
    widths.push(Math.round((font.readUInt16BE(hmtx + 4 * Math.min(glyph(code), metrics - 1)) / unitsPerEm) * 1000));
  }
  return widths;
}

const fontFolder = join(dirname(createRequire(import.meta.url).resolve('dejavu-fonts-ttf/package.json')), 'ttf');

describe('DejaVu Sans width tables', () => {
  // Source: the DejaVu Sans 2.37 font files themselves (hmtx and cmap tables, OpenType spec).
  it('match the advance widths in DejaVuSans.ttf', () => {
    expect(DEJAVU_SANS_WIDTHS).toEqual(advanceWidths(join(fontFolder, 'DejaVuSans.ttf')));
  });

  it('match the advance widths in DejaVuSans-Bold.ttf', () => {
    expect(DEJAVU_SANS_BOLD_WIDTHS).toEqual(advanceWidths(join(fontFolder, 'DejaVuSans-Bold.ttf')));
  });
});

describe('measureDejaVuSans', () => {
  it('adds the advance widths of the characters', () => {
    // H 752 + e 615 + l 278 + l 278 + o 612 = 2535 thousandths of an em.
    expect(measureDejaVuSans('Hello', 10, false)).toBeCloseTo(25.35, 10);
  });

  it('measures bold wider than regular', () => {
    expect(measureDejaVuSans('people', 14, true)).toBeGreaterThan(measureDejaVuSans('people', 14, false));
  });
});

describe('wrapText', () => {
  const measure = (text: string) => text.length;

  it('puts as many words on a line as fit', () => {
    expect(wrapText('four avoid a stroke because of option A', 12, 1, false, measure)).toEqual([
      'four avoid a',
      'stroke',
      'because of',
      'option A',
    ]);
  });

  it('keeps a word longer than the line on its own line', () => {
    expect(wrapText('a extraordinarily b', 5, 1, false, measure)).toEqual(['a', 'extraordinarily', 'b']);
  });

  it('gives no lines for empty text', () => {
    expect(wrapText('  ', 10, 1, false, measure)).toEqual([]);
  });
});
