import { describe, expect, it } from 'vitest';
import { iconArrayGeometry } from '../../src/render/icon-array-layout.ts';
import { colourPalette } from '../../src/render/palette.ts';
import { rangeRing, ringedSwatch } from '../../src/render/range-ring.ts';

describe('rangeRing', () => {
  // Geometry of the layout: icons 0.88 of a cell per 100 and 0.9 per 1000 (icon-array-layout.ts).
  it.each([100, 1000] as const)('sits around the figure, clear of it and of the next person’s ring, per %i', (denominator) => {
    const { cellSize, iconSize } = iconArrayGeometry(denominator, 10);
    const inset = (cellSize - iconSize) / 2;
    const ring = rangeRing(inset, inset, iconSize, cellSize, colourPalette);
    // The line's inner edge stays outside the glyph box; its outer edge inside the cell.
    expect(ring.x + ring.lineWidth / 2).toBeLessThanOrEqual(inset + 1e-9);
    expect(ring.x - ring.lineWidth / 2).toBeGreaterThanOrEqual(-1e-9);
    expect(ring.x + ring.side + ring.lineWidth / 2).toBeLessThanOrEqual(cellSize + 1e-9);
    expect(ring.side).toBeCloseTo(iconSize + inset, 9);
    expect(ring.lineWidth).toBeCloseTo(cellSize * 0.05, 9);
    expect(ring.dash).toEqual([colourPalette.uncertainDash[0] * cellSize, colourPalette.uncertainDash[1] * cellSize]);
  });

  it('puts the legend’s ringed figure inside its swatch box', () => {
    const { figure, ring } = ringedSwatch(0, 0, 20, colourPalette);
    expect(figure).toEqual({ x: 2, y: 2, size: 16 });
    expect(ring.x - ring.lineWidth / 2).toBeGreaterThanOrEqual(0);
    expect(ring.x + ring.side + ring.lineWidth / 2).toBeLessThanOrEqual(20);
  });
});
