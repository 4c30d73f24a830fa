/**
 * A TrueType font cut down to the characters a handout uses, so jsPDF parses,
 * subsets and compresses a few hundred glyphs instead of thousands. The font is
 * read once (`parseTrueType`); each handout takes its own subset
 * (`subsetTrueType`). Glyph outlines and advance widths are copied unchanged, so
 * text measures and looks exactly as in the full font.
 *
 * Table layouts follow the OpenType specification 1.9 (Microsoft): the table
 * directory, 'head', 'hhea', 'maxp', 'hmtx', 'loca', 'glyf' (composite glyph
 * flags), 'cmap' format 4 and 'post' format 3.
 */

/** Where a table lies in the font file. */
interface TableRecord {
  readonly offset: number;
  readonly length: number;
}

/** A TrueType font read once: its bytes, tables, glyph count and character map. */
export interface ParsedFont {
  readonly bytes: Uint8Array;
  readonly tables: ReadonlyMap<string, TableRecord>;
  readonly glyphCount: number;
  readonly horizontalMetricCount: number;
  /** 0 for short (16-bit, halved) 'loca' offsets, 1 for long ones. */
  readonly locaFormat: number;
  /** Unicode code point (Basic Multilingual Plane) → glyph index. */
  readonly glyphOf: ReadonlyMap<number, number>;
}

/** The tables a subset keeps, enough for jsPDF and for PDF viewers. */
const KEPT_TABLES = ['OS/2', 'cmap', 'glyf', 'head', 'hhea', 'hmtx', 'loca', 'maxp', 'name', 'post'] as const;

/** Composite glyph flags (OpenType 'glyf', composite glyph description). */
const ARG_1_AND_2_ARE_WORDS = 0x0001;
const WE_HAVE_A_SCALE = 0x0008;
const MORE_COMPONENTS = 0x0020;
const WE_HAVE_AN_X_AND_Y_SCALE = 0x0040;
const WE_HAVE_A_TWO_BY_TWO = 0x0080;

/** The 'head' checksum adjustment target (OpenType 'head', checksumAdjustment). */
const CHECKSUM_MAGIC = 0xb1b0afba;

function view(bytes: Uint8Array): DataView {
  return new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

function table(font: ParsedFont, tag: string): TableRecord {
  const found = font.tables.get(tag);
  if (found === undefined) throw new RangeError(`the font has no '${tag}' table`);
  return found;
}

/** The Unicode map of a 'cmap' format 4 subtable. */
function readFormat4(data: DataView, start: number): Map<number, number> {
  const segments = data.getUint16(start + 6) / 2;
  const ends = start + 14;
  const starts = ends + 2 * segments + 2;
  const deltas = starts + 2 * segments;
  const rangeOffsets = deltas + 2 * segments;
  const map = new Map<number, number>();
  for (let segment = 0; segment < segments; segment += 1) {
    const first = data.getUint16(starts + 2 * segment);
    const last = data.getUint16(ends + 2 * segment);
    const delta = data.getUint16(deltas + 2 * segment);
    const rangeAt = rangeOffsets + 2 * segment;
    const rangeOffset = data.getUint16(rangeAt);
    for (let code = first; code <= last && code !== 0xffff; code += 1) {
      let glyph: number;
      if (rangeOffset === 0) glyph = (code + delta) & 0xffff;
      else {
        const stored = data.getUint16(rangeAt + rangeOffset + 2 * (code - first));
        glyph = stored === 0 ? 0 : (stored + delta) & 0xffff;
      }
      if (glyph !== 0) map.set(code, glyph);
    }
  }
  return map;
}

/**
 * Read a TrueType font's table directory and Unicode character map.
 *
 * @throws RangeError when a needed table or a Unicode format 4 map is missing
 */
export function parseTrueType(bytes: Uint8Array): ParsedFont {
  const data = view(bytes);
  const tableCount = data.getUint16(4);
  const tables = new Map<string, TableRecord>();
  for (let index = 0; index < tableCount; index += 1) {
    const at = 12 + 16 * index;
    const tag = String.fromCharCode(bytes[at] ?? 0, bytes[at + 1] ?? 0, bytes[at + 2] ?? 0, bytes[at + 3] ?? 0);
    tables.set(tag, { offset: data.getUint32(at + 8), length: data.getUint32(at + 12) });
  }
  const partial = { bytes, tables, glyphCount: 0, horizontalMetricCount: 0, locaFormat: 0, glyphOf: new Map<number, number>() };
  for (const tag of KEPT_TABLES) table(partial, tag);
  const cmap = table(partial, 'cmap');
  let glyphOf: Map<number, number> | null = null;
  const subtables = data.getUint16(cmap.offset + 2);
  for (let index = 0; index < subtables && glyphOf === null; index += 1) {
    const at = cmap.offset + 4 + 8 * index;
    const platform = data.getUint16(at);
    const encoding = data.getUint16(at + 2);
    const start = cmap.offset + data.getUint32(at + 4);
    const unicode = (platform === 3 && encoding === 1) || platform === 0;
    if (unicode && data.getUint16(start) === 4) glyphOf = readFormat4(data, start);
  }
  if (glyphOf === null) throw new RangeError('the font has no Unicode format 4 character map');
  return {
    ...partial,
    glyphCount: data.getUint16(table(partial, 'maxp').offset + 4),
    horizontalMetricCount: data.getUint16(table(partial, 'hhea').offset + 34),
    locaFormat: data.getInt16(table(partial, 'head').offset + 50),
    glyphOf,
  };
}

/** Start and end of a glyph's outline inside 'glyf'. */
function glyphSpan(font: ParsedFont, glyph: number): { start: number; end: number } {
  const data = view(font.bytes);
  const loca = table(font, 'loca').offset;
  const base = table(font, 'glyf').offset;
  const at = (index: number) => (font.locaFormat === 0 ? 2 * data.getUint16(loca + 2 * index) : data.getUint32(loca + 4 * index));
  return { start: base + at(glyph), end: base + at(glyph + 1) };
}

/** Positions of the component glyph indices of a composite glyph (none for a simple one). */
function componentIndexPositions(font: ParsedFont, glyph: number): number[] {
  const { start, end } = glyphSpan(font, glyph);
  if (end - start < 10) return [];
  const data = view(font.bytes);
  if (data.getInt16(start) >= 0) return [];
  const positions: number[] = [];
  let at = start + 10;
  for (;;) {
    const flags = data.getUint16(at);
    positions.push(at + 2);
    at += 4 + (flags & ARG_1_AND_2_ARE_WORDS ? 4 : 2);
    if (flags & WE_HAVE_A_SCALE) at += 2;
    else if (flags & WE_HAVE_AN_X_AND_Y_SCALE) at += 4;
    else if (flags & WE_HAVE_A_TWO_BY_TWO) at += 8;
    if (!(flags & MORE_COMPONENTS)) return positions;
  }
}

/** Every glyph needed for `codes`: .notdef, each character's glyph, and the parts of composite glyphs. */
function glyphClosure(font: ParsedFont, codes: Iterable<number>): number[] {
  const data = view(font.bytes);
  const kept = new Set<number>([0]);
  const pending: number[] = [];
  for (const code of codes) {
    const glyph = font.glyphOf.get(code);
    if (glyph !== undefined && !kept.has(glyph)) {
      kept.add(glyph);
      pending.push(glyph);
    }
  }
  while (pending.length > 0) {
    const glyph = pending.pop() as number;
    for (const position of componentIndexPositions(font, glyph)) {
      const part = data.getUint16(position);
      if (!kept.has(part) && part < font.glyphCount) {
        kept.add(part);
        pending.push(part);
      }
    }
  }
  return [...kept].sort((first, second) => first - second);
}

/** A growable big-endian byte writer. */
class ByteWriter {
  #bytes = new Uint8Array(1024);
  #length = 0;

  get length(): number {
    return this.#length;
  }

  #room(extra: number): void {
    if (this.#length + extra <= this.#bytes.length) return;
    let size = this.#bytes.length * 2;
    while (size < this.#length + extra) size *= 2;
    const grown = new Uint8Array(size);
    grown.set(this.#bytes.subarray(0, this.#length));
    this.#bytes = grown;
  }

  uint16(value: number): void {
    this.#room(2);
    this.#bytes[this.#length] = (value >>> 8) & 0xff;
    this.#bytes[this.#length + 1] = value & 0xff;
    this.#length += 2;
  }

  uint32(value: number): void {
    this.uint16((value >>> 16) & 0xffff);
    this.uint16(value & 0xffff);
  }

  bytes(source: Uint8Array): void {
    this.#room(source.length);
    this.#bytes.set(source, this.#length);
    this.#length += source.length;
  }

  /** Zero bytes up to a multiple of four. */
  pad(): void {
    while (this.#length % 4 !== 0) this.bytes(new Uint8Array(1));
  }

  result(): Uint8Array {
    return this.#bytes.slice(0, this.#length);
  }
}

/** A 'cmap' with one Unicode (3, 1) format 4 subtable, runs of consecutive codes and glyphs merged. */
function cmapTable(codes: readonly (readonly [number, number])[]): Uint8Array {
  const segments: { start: number; end: number; delta: number }[] = [];
  for (const [code, glyph] of codes) {
    const last = segments[segments.length - 1];
    const delta = (glyph - code + 0x10000) & 0xffff;
    if (last !== undefined && last.end === code - 1 && last.delta === delta) last.end = code;
    else segments.push({ start: code, end: code, delta });
  }
  segments.push({ start: 0xffff, end: 0xffff, delta: 1 });
  const count = segments.length;
  const power = 2 ** Math.floor(Math.log2(count));
  const writer = new ByteWriter();
  writer.uint16(0);
  writer.uint16(1);
  writer.uint16(3);
  writer.uint16(1);
  writer.uint32(12);
  writer.uint16(4);
  writer.uint16(16 + 8 * count);
  writer.uint16(0);
  writer.uint16(2 * count);
  writer.uint16(2 * power);
  writer.uint16(Math.log2(power));
  writer.uint16(2 * count - 2 * power);
  for (const segment of segments) writer.uint16(segment.end);
  writer.uint16(0);
  for (const segment of segments) writer.uint16(segment.start);
  for (const segment of segments) writer.uint16(segment.delta);
  for (let index = 0; index < count; index += 1) writer.uint16(0);
  return writer.result();
}

/** Sum of a table's big-endian 32-bit words, the table padded with zeros (OpenType table checksum). */
function checksum(bytes: Uint8Array): number {
  let sum = 0;
  for (let at = 0; at < bytes.length; at += 4) {
    const word = ((bytes[at] ?? 0) << 24) | ((bytes[at + 1] ?? 0) << 16) | ((bytes[at + 2] ?? 0) << 8) | (bytes[at + 3] ?? 0);
    sum = (sum + (word >>> 0)) >>> 0;
  }
  return sum;
}

function copyOf(font: ParsedFont, tag: string): Uint8Array {
  const { offset, length } = table(font, tag);
  return Uint8Array.from(font.bytes.subarray(offset, offset + length));
}

/**
 * A TrueType font holding only the glyphs for `codes` (plus .notdef and the parts
 * of composite glyphs), renumbered in their original order, with long 'loca'
 * offsets and a 'post' table without glyph names.
 *
 * @param font - a font from `parseTrueType`
 * @param codes - Unicode code points; those the font lacks are left out
 * @returns the font file
 */
export function subsetTrueType(font: ParsedFont, codes: Iterable<number>): Uint8Array {
  const wanted = [...new Set(codes)].filter((code) => code >= 0 && code <= 0xfffe).sort((first, second) => first - second);
  const glyphs = glyphClosure(font, wanted);
  const newIndex = new Map(glyphs.map((glyph, index) => [glyph, index]));
  const source = view(font.bytes);

  const glyf = new ByteWriter();
  const loca = new ByteWriter();
  for (const glyph of glyphs) {
    loca.uint32(glyf.length);
    const { start, end } = glyphSpan(font, glyph);
    // A copy, never a view: a Node Buffer's slice shares its memory, and remapping a composite's
    // parts in place would corrupt the shared font for the next handout (its accented letters).
    const outline = Uint8Array.from(font.bytes.subarray(start, end));
    const outlineView = view(outline);
    for (const position of componentIndexPositions(font, glyph)) {
      outlineView.setUint16(position - start, newIndex.get(source.getUint16(position)) ?? 0);
    }
    glyf.bytes(outline);
    glyf.pad();
  }
  loca.uint32(glyf.length);

  const hmtx = new ByteWriter();
  const hmtxAt = table(font, 'hmtx').offset;
  const lastAdvance = source.getUint16(hmtxAt + 4 * (font.horizontalMetricCount - 1));
  for (const glyph of glyphs) {
    const long = glyph < font.horizontalMetricCount;
    hmtx.uint16(long ? source.getUint16(hmtxAt + 4 * glyph) : lastAdvance);
    const bearingAt = long
      ? hmtxAt + 4 * glyph + 2
      : hmtxAt + 4 * font.horizontalMetricCount + 2 * (glyph - font.horizontalMetricCount);
    hmtx.uint16(source.getUint16(bearingAt));
  }

  const head = copyOf(font, 'head');
  view(head).setUint32(8, 0);
  view(head).setInt16(50, 1);
  const hhea = copyOf(font, 'hhea');
  view(hhea).setUint16(34, glyphs.length);
  const maxp = copyOf(font, 'maxp');
  view(maxp).setUint16(4, glyphs.length);
  const post = copyOf(font, 'post').slice(0, 32);
  view(post).setUint32(0, 0x00030000);
  const codeGlyphs = wanted.flatMap((code) => {
    const glyph = font.glyphOf.get(code);
    const index = glyph === undefined ? undefined : newIndex.get(glyph);
    return index === undefined ? [] : [[code, index] as const];
  });

  const contents: Readonly<Record<(typeof KEPT_TABLES)[number], Uint8Array>> = {
    'OS/2': copyOf(font, 'OS/2'),
    cmap: cmapTable(codeGlyphs),
    glyf: glyf.result(),
    head,
    hhea,
    hmtx: hmtx.result(),
    loca: loca.result(),
    maxp,
    name: copyOf(font, 'name'),
    post,
  };
  const count = KEPT_TABLES.length;
  const power = 2 ** Math.floor(Math.log2(count));
  const file = new ByteWriter();
  file.uint32(0x00010000);
  file.uint16(count);
  file.uint16(16 * power);
  file.uint16(Math.log2(power));
  file.uint16(16 * count - 16 * power);
  let offset = 12 + 16 * count;
  for (const tag of KEPT_TABLES) {
    const bytes = contents[tag];
    for (let index = 0; index < 4; index += 1) file.bytes(new Uint8Array([tag.charCodeAt(index)]));
    file.uint32(checksum(bytes));
    file.uint32(offset);
    file.uint32(bytes.length);
    offset += Math.ceil(bytes.length / 4) * 4;
  }
  for (const tag of KEPT_TABLES) {
    file.bytes(contents[tag]);
    file.pad();
  }
  const result = file.result();
  const headOffset =
    12 +
    16 * count +
    KEPT_TABLES.slice(0, KEPT_TABLES.indexOf('head')).reduce((sum, tag) => sum + Math.ceil(contents[tag].length / 4) * 4, 0);
  view(result).setUint32(headOffset + 8, (CHECKSUM_MAGIC - checksum(result)) >>> 0);
  return result;
}
