/**
 * One person figure on a jsPDF page: the glyph filled in its group's colour, the
 * group's dots or hatching laid over it through a clipping path (so greyscale
 * prints still tell the groups apart), then its outline.
 */
import type { jsPDF } from 'jspdf';
import type { PersonLook } from '../../core/direction.ts';
import type { Glyph } from '../glyphs/path-context.ts';
import type { ChartPalette, PatternName } from '../palette.ts';
import { DOT_CENTRES, DOT_RADIUS, HATCH_WIDTH } from '../pattern-geometry.ts';
import type { RangeRing } from '../range-ring.ts';
import { PdfPathContext } from './pdf-path-context.ts';

/** Where and how big a figure is, and the grid its pattern tiles align to. */
export interface FigurePlacement {
  readonly x: number;
  readonly y: number;
  readonly size: number;
  /** Origin and side of the pattern tiles (the icon grid's top-left corner). */
  readonly tileOriginX: number;
  readonly tileOriginY: number;
  readonly tile: number;
  /** Outline width and the cell size the dash is measured in. */
  readonly lineWidth: number;
  readonly cellSize: number;
}

/** Draw one figure in `look` (from `lookOf`). */
export function drawFigurePdf(
  doc: jsPDF,
  glyph: Glyph,
  look: PersonLook,
  placement: FigurePlacement,
  palette: ChartPalette,
): void {
  const trace = () => glyph.draw(new PdfPathContext(doc, placement.x, placement.y), placement.size);
  const style = palette.groups[look];
  doc.setFillColor(style.fill);
  doc.setDrawColor(style.outline);
  doc.setLineWidth(placement.lineWidth);
  if (style.pattern === 'solid') {
    trace();
    doc.fillStroke();
    return;
  }
  trace();
  doc.fill();
  doc.saveGraphicsState();
  trace();
  doc.clip();
  doc.discardPath();
  drawPattern(doc, style.pattern, style.patternInk, placement);
  doc.restoreGraphicsState();
  doc.setDrawColor(style.outline);
  doc.setLineWidth(placement.lineWidth);
  trace();
  doc.stroke();
}

/** The dots or hatch lines over a figure's box, on the grid's tiles. */
function drawPattern(doc: jsPDF, pattern: Exclude<PatternName, 'solid'>, ink: string, placement: FigurePlacement): void {
  const { x, y, size, tile, tileOriginX, tileOriginY } = placement;
  const firstColumn = Math.floor((x - tileOriginX) / tile);
  const lastColumn = Math.ceil((x + size - tileOriginX) / tile);
  const firstRow = Math.floor((y - tileOriginY) / tile);
  const lastRow = Math.ceil((y + size - tileOriginY) / tile);
  if (pattern === 'dots') {
    doc.setFillColor(ink);
    for (let row = firstRow; row < lastRow; row += 1) {
      for (let column = firstColumn; column < lastColumn; column += 1) {
        for (const [centreX, centreY] of DOT_CENTRES) {
          doc.circle(tileOriginX + (column + centreX) * tile, tileOriginY + (row + centreY) * tile, tile * DOT_RADIUS, 'F');
        }
      }
    }
    return;
  }
  // Lines x + y = k·tile in grid coordinates, as in the SVG hatch pattern.
  doc.setDrawColor(ink);
  doc.setLineWidth(tile * HATCH_WIDTH);
  const localX = x - tileOriginX;
  const localY = y - tileOriginY;
  const firstLine = Math.floor((localX + localY) / tile);
  const lastLine = Math.ceil((localX + localY + 2 * size) / tile);
  for (let line = firstLine; line <= lastLine; line += 1) {
    const sum = line * tile;
    // From the box's left edge to its right edge along x + y = sum.
    const fromX = localX - tile;
    const toX = localX + size + tile;
    doc.line(tileOriginX + fromX, tileOriginY + sum - fromX, tileOriginX + toX, tileOriginY + sum - toX);
  }
}

/** The dashed ring of the range outline around a figure (see `range-ring.ts`). */
export function drawRingPdf(doc: jsPDF, ring: RangeRing, palette: ChartPalette): void {
  doc.setDrawColor(palette.uncertainOutline);
  doc.setLineWidth(ring.lineWidth);
  doc.setLineDashPattern([...ring.dash], 0);
  doc.roundedRect(ring.x, ring.y, ring.side, ring.side, ring.radius, ring.radius, 'S');
  doc.setLineDashPattern([], 0);
}
