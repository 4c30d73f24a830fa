/**
 * An icon array drawn with jsPDF's own drawing calls, from the same layout as the
 * SVG renderer (no SVG conversion), so the handout matches the screen.
 */
import type { jsPDF } from 'jspdf';
import type { PersonGroup } from '../../core/types.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { type IconArrayLayout, scaleLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { drawFigurePdf } from './draw-figure-pdf.ts';

/** Where an array goes on the page, in the document's units; the height follows the layout. */
export interface PdfBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
}

export interface PdfArrayOptions {
  /** Ranks of the people whose group depends on the interval, drawn outlined. */
  readonly uncertain?: RankSpan | null;
}

/** What was drawn: the height used and how many figures of each group. */
export interface PdfArrayDrawing {
  readonly height: number;
  readonly drawn: Readonly<Record<PersonGroup, number>>;
  /** How many of those were drawn outlined as uncertain. */
  readonly outlined: number;
}

/**
 * Draw `layout` scaled to `box.width`, top-left at (`box.x`, `box.y`).
 *
 * @example drawIconArrayPdf(doc, iconArrayLayout(100, groups), { x: 20, y: 30, width: 60 }, colourPalette).height // => 60
 */
export function drawIconArrayPdf(
  doc: jsPDF,
  layout: IconArrayLayout,
  box: PdfBox,
  palette: ChartPalette,
  options: PdfArrayOptions = {},
): PdfArrayDrawing {
  const scaled = scaleLayout(layout, box.width / layout.geometry.width);
  const { cellSize, iconSize, patternTile } = scaled.geometry;
  const glyph = glyphFor(scaled.geometry.glyph);
  const drawn: Record<PersonGroup, number> = { event: 0, prevented: 0, caused: 0, free: 0 };
  let outlined = 0;
  for (const person of scaled.people) {
    const uncertain = isUncertain(person.rank, options.uncertain ?? null);
    drawFigurePdf(doc, glyph, uncertain ? 'uncertain' : person.group, {
      x: box.x + person.x,
      y: box.y + person.y,
      size: iconSize,
      tileOriginX: box.x,
      tileOriginY: box.y,
      tile: patternTile,
      lineWidth: cellSize * palette.outlineWidth,
      cellSize,
    }, palette);
    drawn[person.group] += 1;
    if (uncertain) outlined += 1;
  }
  return { height: scaled.geometry.height, drawn, outlined };
}
