/**
 * A path context that writes a compact, deterministic SVG path: every coordinate
 * rounded to a fixed number of decimals, every command after the first relative,
 * so one glyph path can be placed anywhere by changing only its first point.
 */
import { roundedDecimal } from '../rounded-decimal.ts';
import { arcSweep } from './arc-to-bezier.ts';
import type { Glyph, PathContext } from './path-context.ts';

/** A glyph's SVG path split into its absolute first point and its relative remainder. */
export interface GlyphPath {
  readonly startX: number;
  readonly startY: number;
  /** Relative commands following the first `M`. */
  readonly tail: string;
  readonly digits: number;
}

/** Records Canvas-style path calls as relative SVG path commands on a fixed grid. */
export class SvgPathContext implements PathContext {
  readonly #scale: number;
  readonly #parts: string[] = [];
  #current: [number, number] | null = null;
  #subpathStart: [number, number] | null = null;
  #first: [number, number] | null = null;

  constructor(readonly digits = 2) {
    this.#scale = 10 ** digits;
  }

  moveTo(x: number, y: number): void {
    const point = this.#snap(x, y);
    if (this.#first === null) this.#first = point;
    else this.#parts.push(`m${this.#delta(point)}`);
    this.#current = point;
    this.#subpathStart = point;
  }

  lineTo(x: number, y: number): void {
    if (this.#current === null) return this.moveTo(x, y);
    const point = this.#snap(x, y);
    this.#parts.push(`l${this.#delta(point)}`);
    this.#current = point;
  }

  bezierCurveTo(control1X: number, control1Y: number, control2X: number, control2Y: number, x: number, y: number): void {
    if (this.#current === null) this.moveTo(control1X, control1Y);
    const first = this.#snap(control1X, control1Y);
    const second = this.#snap(control2X, control2Y);
    const end = this.#snap(x, y);
    this.#parts.push(`c${this.#delta(first)},${this.#delta(second)},${this.#delta(end)}`);
    this.#current = end;
  }

  arc(x: number, y: number, radius: number, startAngle: number, endAngle: number, anticlockwise = false): void {
    const sweep = arcSweep(startAngle, endAngle, anticlockwise);
    const startX = x + radius * Math.cos(startAngle);
    const startY = y + radius * Math.sin(startAngle);
    const start = this.#snap(startX, startY);
    if (this.#current === null) this.moveTo(startX, startY);
    else if (start[0] !== this.#current[0] || start[1] !== this.#current[1]) this.lineTo(startX, startY);
    const sweepFlag = sweep > 0 ? 1 : 0;
    const ticks = (value: number) => this.#format(Math.round(value * this.#scale));
    // A full turn cannot be one SVG arc: draw it as two half turns.
    const halves = Math.abs(sweep) >= Math.PI * 2 - 1e-9 ? [startAngle + sweep / 2, startAngle + sweep] : [startAngle + sweep];
    for (const angle of halves) {
      const end = this.#snap(x + radius * Math.cos(angle), y + radius * Math.sin(angle));
      const large = halves.length === 1 && Math.abs(sweep) > Math.PI ? 1 : 0;
      this.#parts.push(`a${ticks(radius)},${ticks(radius)},0,${large},${sweepFlag},${this.#delta(end)}`);
      this.#current = end;
    }
  }

  closePath(): void {
    if (this.#current === null) return;
    this.#parts.push('z');
    this.#current = this.#subpathStart;
  }

  /** The recorded path, split for placement. */
  result(): GlyphPath {
    const first = this.#first ?? [0, 0];
    return { startX: first[0] / this.#scale, startY: first[1] / this.#scale, tail: this.#parts.join(''), digits: this.digits };
  }

  #snap(x: number, y: number): [number, number] {
    return [Math.round(x * this.#scale), Math.round(y * this.#scale)];
  }

  #delta(point: [number, number]): string {
    const from = this.#current ?? [0, 0];
    return `${this.#format(point[0] - from[0])},${this.#format(point[1] - from[1])}`;
  }

  #format(ticks: number): string {
    return String((ticks === 0 ? 0 : ticks) / this.#scale);
  }
}

/** A glyph's path at a size, ready to place with {@link placeGlyphPath}. */
export function glyphPath(glyph: Glyph, size: number, digits = 2): GlyphPath {
  const context = new SvgPathContext(digits);
  glyph.draw(context, size);
  return context.result();
}

/** The SVG `d` of a glyph path whose box has its top-left corner at (x, y). */
export function placeGlyphPath(path: GlyphPath, x: number, y: number): string {
  // Called once per person: no closure here, which V8 would otherwise allocate on every call.
  const left = x + path.startX;
  const top = y + path.startY;
  return `M${roundedDecimal(Number.isNaN(left) ? 0 : left, path.digits)},${roundedDecimal(Number.isNaN(top) ? 0 : top, path.digits)}${path.tail}`;
}

/**
 * {@link placeGlyphPath} for many people on one grid: the same text, with each distinct
 * column and row formatted once (a grid of 1000 people has 50 columns and 20 rows, so
 * 2000 placements format 70 numbers instead of 4000).
 */
export function gridPlacer(path: GlyphPath): (x: number, y: number) => string {
  const lefts = new Map<number, string>();
  const tops = new Map<number, string>();
  const format = (cache: Map<number, string>, value: number): string => {
    let text = cache.get(value);
    if (text === undefined) {
      text = roundedDecimal(Number.isNaN(value) ? 0 : value, path.digits);
      cache.set(value, text);
    }
    return text;
  };
  return (x, y) => `M${format(lefts, x + path.startX)},${format(tops, y + path.startY)}${path.tail}`;
}
