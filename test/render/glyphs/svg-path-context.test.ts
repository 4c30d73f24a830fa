import { describe, expect, it } from 'vitest';
import { arcSweep, arcToBezier } from '../../../src/render/glyphs/arc-to-bezier.ts';
import { SvgPathContext, glyphPath, gridPlacer, placeGlyphPath } from '../../../src/render/glyphs/svg-path-context.ts';
import { personGlyph } from '../../../src/render/glyphs/person.ts';

describe('SvgPathContext', () => {
  it('writes the first point absolute and the rest relative', () => {
    const context = new SvgPathContext(2);
    context.moveTo(1, 2);
    context.lineTo(4, 2);
    context.lineTo(4, 6);
    context.closePath();
    const path = context.result();
    expect([path.startX, path.startY]).toEqual([1, 2]);
    expect(path.tail).toBe('l3,0l0,4z');
    expect(placeGlyphPath(path, 10, 20)).toBe('M11,22l3,0l0,4z');
  });

  it('rounds every coordinate to the given decimals without drift', () => {
    const context = new SvgPathContext(2);
    context.moveTo(0.123456, 0);
    for (let step = 1; step <= 3; step += 1) context.lineTo(0.123456 + step / 3, 0);
    const { startX, tail } = context.result();
    expect(startX).toBe(0.12);
    // Points 0.12, 0.46, 0.79, 1.12 after rounding; deltas between rounded points: 0.34, 0.33, 0.33,
    // so the last point lands on 1.12 exactly (no accumulated error).
    expect(tail).toBe('l0.34,0l0.33,0l0.33,0');
  });

  // SVG 1.1 §8.3.8 (elliptical arc commands): a full circle needs two arcs; sweep-flag 1 is the
  // positive-angle direction, which is clockwise on screen (y down), as in Canvas.
  it('draws a full circle as two half arcs, starting at angle 0', () => {
    const context = new SvgPathContext(2);
    context.moveTo(3, 1);
    context.arc(1, 1, 2, 0, Math.PI * 2);
    expect(context.result().tail).toBe('a2,2,0,0,1,-4,0a2,2,0,0,1,4,0');
  });

  it('joins an arc to the current point with a line, as Canvas does', () => {
    const context = new SvgPathContext(2);
    context.moveTo(0, 0);
    context.arc(5, 0, 1, Math.PI, Math.PI * 1.5);
    expect(context.result().tail).toBe('l4,0a1,1,0,0,1,1,-1');
  });

  it('sets the large-arc flag for a three-quarter turn', () => {
    const context = new SvgPathContext(2);
    context.arc(0, 0, 1, 0, Math.PI * 1.5);
    expect(context.result().tail).toBe('a1,1,0,1,1,-1,-1');
  });

  it('gives the same path for the same glyph and size', () => {
    expect(glyphPath(personGlyph, 12.3)).toEqual(glyphPath(personGlyph, 12.3));
  });
});

describe('arcToBezier', () => {
  // The standard cubic approximation of a circular arc (handle length 4/3·tan(θ/4)·r) stays
  // within about 0.03% of the radius for a quarter turn (common practice; from memory).
  it('stays within 0.03% of the radius for a full circle', () => {
    const radius = 10;
    const segments = arcToBezier(0, 0, radius, 0, Math.PI * 2);
    expect(segments).toHaveLength(4);
    let start: [number, number] = [radius, 0];
    for (const [x1, y1, x2, y2, x, y] of segments) {
      for (let step = 0; step <= 20; step += 1) {
        const t = step / 20;
        const u = 1 - t;
        const pointX = u ** 3 * start[0] + 3 * u * u * t * x1 + 3 * u * t * t * x2 + t ** 3 * x;
        const pointY = u ** 3 * start[1] + 3 * u * u * t * y1 + 3 * u * t * t * y2 + t ** 3 * y;
        expect(Math.abs(Math.hypot(pointX, pointY) - radius)).toBeLessThan(radius * 3e-4);
      }
      start = [x, y];
    }
    expect(start[0]).toBeCloseTo(radius, 9);
    expect(start[1]).toBeCloseTo(0, 9);
  });

  it('turns anticlockwise when asked', () => {
    const [first] = arcToBezier(0, 0, 1, 0, -Math.PI / 2, true);
    expect(first![5]).toBeCloseTo(-1, 12);
  });

  it('limits the sweep to one turn, with Canvas rules', () => {
    expect(arcSweep(0, 10)).toBeCloseTo(Math.PI * 2, 12);
    expect(arcSweep(0, -Math.PI / 2)).toBeCloseTo(Math.PI * 1.5, 12);
    expect(arcSweep(0, Math.PI / 2, true)).toBeCloseTo(-Math.PI * 1.5, 12);
  });
});

describe('gridPlacer', () => {
  it('writes exactly what placeGlyphPath writes, for every place of a grid, however often a column or row comes back', () => {
    const path = glyphPath(personGlyph, 0.88);
    const place = gridPlacer(path);
    for (const x of [0.06, 1.06, 2.31, 0.06, -0.004, Number.NaN])
      for (const y of [0.06, 9.31, 0.06, 107.024]) expect(place(x, y)).toBe(placeGlyphPath(path, x, y));
  });
});
