import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { type ParsedFont, parseTrueType, subsetTrueType } from '../../src/handout/font-subset.ts';
import { normalise, writePdf } from './support.ts';

const folder = join(dirname(createRequire(import.meta.url).resolve('dejavu-fonts-ttf/package.json')), 'ttf');
const regularBytes = readFileSync(join(folder, 'DejaVuSans.ttf'));
const regular = parseTrueType(regularBytes);

const SAMPLE = 'Taking a tablet: about 15 in 100 people, 3 ≤ 5, 7 ≥ 2, ∞ – ’ é (Zoë, naïve).';
const codes = (text: string) => [...text].map((character) => character.codePointAt(0) ?? 0);

function data(bytes: Uint8Array): DataView {
  return new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

/** Advance width of a glyph, from 'hmtx' (OpenType 'hmtx': the last advance repeats past numberOfHMetrics). */
function advance(font: ParsedFont, glyph: number): number {
  const at = font.tables.get('hmtx')?.offset ?? 0;
  return data(font.bytes).getUint16(at + 4 * Math.min(glyph, font.horizontalMetricCount - 1));
}

/** The big-endian uint32 sum of `bytes`, zero-padded to a multiple of 4 (OpenType table checksum). */
function sum(bytes: Uint8Array): number {
  let total = 0;
  const padded = new Uint8Array(Math.ceil(bytes.length / 4) * 4);
  padded.set(bytes);
  const view = data(padded);
  for (let at = 0; at < padded.length; at += 4) total = (total + view.getUint32(at)) >>> 0;
  return total;
}

describe('cutting a TrueType font down to some characters', () => {
  const subset = subsetTrueType(regular, codes(SAMPLE));
  const parsed = parseTrueType(subset);

  it('keeps a glyph for every character asked for', () => {
    for (const code of codes(SAMPLE)) expect(parsed.glyphOf.get(code), String.fromCodePoint(code)).toBeGreaterThan(0);
  });

  it('keeps the advance width of every character as in the full font', () => {
    for (const code of codes(SAMPLE)) {
      expect(advance(parsed, parsed.glyphOf.get(code) ?? 0)).toBe(advance(regular, regular.glyphOf.get(code) ?? 0));
    }
  });

  // In DejaVu Sans "é" is a composite glyph (an "e" and an acute accent); its parts must come along, renumbered.
  it('brings along the parts of composite glyphs, with their new numbers', () => {
    const only = parseTrueType(subsetTrueType(regular, codes('é')));
    expect(only.glyphCount).toBeGreaterThanOrEqual(3);
    const view = data(only.bytes);
    const loca = only.tables.get('loca')?.offset ?? 0;
    const glyf = only.tables.get('glyf')?.offset ?? 0;
    const glyph = only.glyphOf.get(0xe9) ?? 0;
    const start = glyf + view.getUint32(loca + 4 * glyph);
    expect(view.getInt16(start)).toBeLessThan(0);
    const firstPart = view.getUint16(start + 12);
    expect(firstPart).toBeGreaterThan(0);
    expect(firstPart).toBeLessThan(only.glyphCount);
    expect(view.getUint32(loca + 4 * (firstPart + 1))).toBeGreaterThan(view.getUint32(loca + 4 * firstPart));
  });

  // OpenType 1.9, table directory: each record's checksum is its table's uint32 sum; 'head': the whole
  // file, with checksumAdjustment in place, sums to 0xB1B0AFBA.
  it('leaves the full font as it was, so the next subset of it is the same bytes', () => {
    // The font is read from disk as a Node Buffer, whose slices share its memory: renumbering a
    // composite's parts in a slice would change the font itself (common practice: copy, never alias).
    const fresh = parseTrueType(Buffer.from(regularBytes));
    const before = Buffer.from(fresh.bytes);
    const first = subsetTrueType(fresh, codes('migrañas ¿Qué? Página'));
    expect(Buffer.from(fresh.bytes).equals(before)).toBe(true);
    expect(Buffer.from(subsetTrueType(fresh, codes('migrañas ¿Qué? Página'))).equals(Buffer.from(first))).toBe(true);
  });

  it('passes the OpenType table and file checksums', () => {
    const view = data(subset);
    const tables = view.getUint16(4);
    for (let index = 0; index < tables; index += 1) {
      const record = 12 + 16 * index;
      const tag = String.fromCharCode(...subset.slice(record, record + 4));
      const offset = view.getUint32(record + 8);
      const length = view.getUint32(record + 12);
      const bytes = subset.slice(offset, offset + length);
      if (tag === 'head') data(bytes).setUint32(8, 0);
      expect(sum(bytes), tag).toBe(view.getUint32(record + 4));
    }
    expect(sum(subset)).toBe(0xb1b0afba);
  });

  it('is a small part of the full font', () => {
    expect(subset.length).toBeLessThan(regularBytes.length / 10);
  });

  it('leaves out characters the font does not have', () => {
    const cut = parseTrueType(subsetTrueType(regular, [...codes('ab'), 0x4e00]));
    expect(regular.glyphOf.has(0x4e00)).toBe(false);
    expect(cut.glyphOf.has(0x4e00)).toBe(false);
    expect(cut.glyphCount).toBe(3);
  });

  // The clinical symbols jsPDF's standard fonts cannot print (WinAnsi has no ≤ ≥).
  it('prints text that pdftotext reads back exactly, ≤ and ≥ included', () => {
    const binary = (bytes: Uint8Array) => Array.from(bytes, (byte) => String.fromCharCode(byte)).join('');
    const doc = new jsPDF({ unit: 'mm', format: 'a4', compress: true });
    doc.addFileToVFS('cut.ttf', binary(subset));
    doc.addFont('cut.ttf', 'Cut', 'normal');
    doc.setFont('Cut', 'normal');
    doc.setFontSize(10);
    doc.text(SAMPLE, 15, 20);
    const path = writePdf(new Uint8Array(doc.output('arraybuffer')));
    expect(normalise(execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' }))).toBe(SAMPLE);
  });
});

describe('reading a font', () => {
  it('refuses a file without the tables a font needs', () => {
    expect(() => parseTrueType(new Uint8Array([0, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0]))).toThrow(RangeError);
  });
});
