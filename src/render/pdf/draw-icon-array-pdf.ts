/**
 * An icon array drawn with jsPDF's own drawing calls, from the same layout as the
 * SVG renderer (no SVG conversion), so the handout matches the screen.
 */
import type { jsPDF } from 'jspdf';
import { type PersonLook, lookOf } from '../../core/direction.ts';
import type { PersonGroup } from '../../core/types.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { type IconArrayLayout, scaleLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { rangeRing } from '../range-ring.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { drawFigurePdf, drawRingPdf } from './draw-figure-pdf.ts';

/** Where an array goes on the page, in the document's units; the height follows the layout. */
export interface PdfBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
}

export interface PdfArrayOptions {
  /** Ranks of the people whose group depends on the interval: each is ringed, still drawn in their look. */
  readonly uncertain?: RankSpan | null;
  /** The event is one people want, so `caused` people are drawn helped (default false). */
  readonly wanted?: boolean;
}

/** What was drawn: the height used and how many figures of each group. */
export interface PdfArrayDrawing {
  readonly height: number;
  readonly drawn: Readonly<Record<PersonGroup, number>>;
  /** How many figures were drawn in each look. */
  readonly looks: Readonly<Record<PersonLook, number>>;
  /** How many of those were ringed as uncertain. */
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
  const looks: Record<PersonLook, number> = { event: 0, helped: 0, harmed: 0, free: 0 };
  const wanted = options.wanted ?? false;
  const ringed: (typeof scaled.people)[number][] = [];
  for (const person of scaled.people) {
    const look = lookOf(person.group, wanted);
    drawFigurePdf(
      doc,
      glyph,
      look,
      {
        x: box.x + person.x,
        y: box.y + person.y,
        size: iconSize,
        tileOriginX: box.x,
        tileOriginY: box.y,
        tile: patternTile,
        lineWidth: cellSize * palette.outlineWidth,
        cellSize,
      },
      palette,
    );
    drawn[person.group] += 1;
    looks[look] += 1;
    if (isUncertain(person.rank, options.uncertain ?? null)) ringed.push(person);
  }
  // Rings after every figure, so no neighbour is drawn over one.
  for (const person of ringed)
    drawRingPdf(doc, rangeRing(box.x + person.x, box.y + person.y, iconSize, cellSize, palette), palette);
  return { height: scaled.geometry.height, drawn, looks, outlined: ringed.length };
}
