/**
 * An icon array drawn with jsPDF's own drawing calls, from the same layout as the
 * SVG renderer (no SVG conversion), so the handout matches the screen. Each look is
 * drawn once as a form and placed per person (`figure-forms.ts`).
 */
import type { jsPDF } from 'jspdf';
import { type PersonLook, lookOf } from '../../core/direction.ts';
import type { PersonGroup } from '../../core/types.ts';
import { type IconArrayLayout, scaleLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { type FormCell, figureForm, placeForm, ringForm } from './figure-forms.ts';

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
  const cell: FormCell = { cellSize, iconSize, tile: patternTile, lineWidth: cellSize * palette.outlineWidth };
  // A person's cell starts this far up and left of their glyph box.
  const inset = (cellSize - iconSize) / 2;
  const forms = new Map<PersonLook, string>();
  const formOf = (look: PersonLook): string => {
    let key = forms.get(look);
    if (key === undefined) {
      key = figureForm(doc, scaled.geometry.glyph, look, cell, palette);
      forms.set(look, key);
    }
    return key;
  };
  const drawn: Record<PersonGroup, number> = { event: 0, prevented: 0, caused: 0, free: 0 };
  const looks: Record<PersonLook, number> = { event: 0, helped: 0, harmed: 0, free: 0 };
  const wanted = options.wanted ?? false;
  const ringed: (typeof scaled.people)[number][] = [];
  for (const person of scaled.people) {
    const look = lookOf(person.group, wanted);
    placeForm(doc, formOf(look), cellSize, box.x + person.x - inset, box.y + person.y - inset);
    drawn[person.group] += 1;
    looks[look] += 1;
    if (isUncertain(person.rank, options.uncertain ?? null)) ringed.push(person);
  }
  // Rings after every figure, so no neighbour is drawn over one.
  if (ringed.length > 0) {
    const ring = ringForm(doc, cell, palette);
    for (const person of ringed) placeForm(doc, ring, cellSize, box.x + person.x - inset, box.y + person.y - inset);
  }
  return { height: scaled.geometry.height, drawn, looks, outlined: ringed.length };
}
