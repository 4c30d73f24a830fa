/**
 * Figures drawn once and placed many times: each look of person (and the range ring) is
 * drawn once into a PDF form XObject the size of one cell of the grid (ISO 32000-1 §8.10,
 * "Form XObjects"), and every person is a placement of it: `q`, a translation, `Do`, `Q`.
 * A page of 2 × 1000 people then carries a few short drawings and one line per person
 * instead of every figure's curves, fill, clip, pattern and outline.
 *
 * The dots and hatching line up from person to person as before: every cell's corner sits
 * a whole number of pattern tiles from the grid's corner (`iconArrayGeometry`), so a form
 * whose tiles start at the cell's corner shows the very pattern the grid would.
 *
 * Drawn with jsPDF's form objects (`beginFormObject`, `endFormObject`, `doFormObject`) in
 * its default ("compat") coordinate mode, where y grows down the page in the document's unit.
 */
import type { jsPDF } from 'jspdf';
import type { PersonLook } from '../../core/direction.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import type { GlyphName } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { rangeRing } from '../range-ring.ts';
import { drawFigurePdf, drawRingPdf } from './draw-figure-pdf.ts';

/** One cell of a grid, in the document's units. */
export interface FormCell {
  readonly cellSize: number;
  readonly iconSize: number;
  /** Side of a pattern tile. */
  readonly tile: number;
  /** Width of a figure's outline. */
  readonly lineWidth: number;
}

/**
 * Draw `draw` into a form of one cell with its top-left corner at the origin, under `key`.
 * jsPDF keeps the first form of a key and drops a later one, so a key names what is drawn.
 */
function defineForm(doc: jsPDF, key: string, cellSize: number, draw: () => void): string {
  const side = cellSize * doc.internal.scaleFactor;
  doc.beginFormObject(0, 0, side, side, doc.unitMatrix);
  draw();
  doc.endFormObject(key);
  return key;
}

/** The form of a figure in `look` in a cell, defined in `doc` on first use; returns its key. */
export function figureForm(doc: jsPDF, glyph: GlyphName, look: PersonLook, cell: FormCell, palette: ChartPalette): string {
  const style = palette.groups[look];
  const key = ['figure', glyph, look, style.fill, style.outline, style.pattern, style.patternInk, ...numbers(cell)].join(' ');
  const inset = (cell.cellSize - cell.iconSize) / 2;
  return defineForm(doc, key, cell.cellSize, () =>
    drawFigurePdf(
      doc,
      glyphFor(glyph),
      look,
      {
        x: inset,
        y: inset,
        size: cell.iconSize,
        tileOriginX: 0,
        tileOriginY: 0,
        tile: cell.tile,
        lineWidth: cell.lineWidth,
        cellSize: cell.cellSize,
      },
      palette,
    ),
  );
}

/** The form of the range outline's ring around a figure in a cell (see `range-ring.ts`). */
export function ringForm(doc: jsPDF, cell: FormCell, palette: ChartPalette): string {
  const [dash, gap] = palette.uncertainDash;
  const key = ['ring', palette.uncertainOutline, dash, gap, ...numbers(cell)].join(' ');
  const inset = (cell.cellSize - cell.iconSize) / 2;
  return defineForm(doc, key, cell.cellSize, () =>
    drawRingPdf(doc, rangeRing(inset, inset, cell.iconSize, cell.cellSize, palette), palette),
  );
}

/** Place the form `key` of a cell of side `cellSize` with the cell's top-left corner at (`x`, `y`). */
export function placeForm(doc: jsPDF, key: string, cellSize: number, x: number, y: number): void {
  const scale = doc.internal.scaleFactor;
  // Compat mode: a point (u, v) of the form is written at (u·k, side − v·k), the page's at
  // (x·k, pageHeight − y·k); the translation maps one onto the other.
  const pageHeight = doc.internal.pageSize.getHeight() * scale;
  doc.doFormObject(key, doc.Matrix(1, 0, 0, 1, x * scale, pageHeight - (y + cellSize) * scale));
}

function numbers(cell: FormCell): string[] {
  return [cell.cellSize, cell.iconSize, cell.tile, cell.lineWidth].map(String);
}
