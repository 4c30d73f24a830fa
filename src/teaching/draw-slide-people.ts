/**
 * Drawing a slide's people into an `<svg>`: one path per group and look, joining every
 * person of it (`render/svg/people-shapes.ts`), in the chart palette, with the dot and hatch patterns of the changed groups, sized by its view
 * box so that CSS decides how large it shows. Works on the page's DOM and on jsdom;
 * the live view and the slide export use the same drawing.
 */
import { select } from 'd3-selection';
import { glyphFor } from '../render/glyphs/glyph-for.ts';
import { glyphPath, placeGlyphPath } from '../render/glyphs/svg-path-context.ts';
import { peopleShapes } from '../render/svg/people-shapes.ts';
import { scaleLayout } from '../render/icon-array-layout.ts';
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import type { ChartPalette } from '../render/palette.ts';
import { colourPalette } from '../render/palette.ts';
import { patternIdsFor, personPaint } from '../render/svg/person-paint.ts';
import type { PatternIds } from '../render/svg/person-paint.ts';
import { appendPatterns } from '../render/svg/svg-patterns.ts';
import { svgNumber } from '../render/svg/svg-number.ts';
import type { PersonLook } from './slide-model.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';
/** Drawing units per cell: paths keep two decimals, so ten units per cell keep the figures smooth. */
const UNITS_PER_CELL = 10;
/** The looks a slide draws, in the order a group's shapes are drawn. */
const LOOK_ORDER: readonly PersonLook[] = ['event', 'helped', 'harmed', 'free', 'uncertain'];

/** Width and height of an array in drawing units. */
export function drawingSize(layout: IconArrayLayout): { readonly width: number; readonly height: number } {
  const factor = UNITS_PER_CELL / layout.geometry.cellSize;
  return { width: layout.geometry.width * factor, height: layout.geometry.height * factor };
}

/** Give a path the paint of a look. */
function paint(element: Element, look: PersonLook, palette: ChartPalette, ids: PatternIds, cellSize: number): void {
  // The palette is keyed by look (helped, harmed), as the charts are: one code for every chart and slide.
  const found = personPaint(palette, look, ids, cellSize);
  element.setAttribute('fill', found.fill);
  element.setAttribute('stroke', found.stroke);
  if (found.dash !== null) {
    element.setAttribute('stroke-dasharray', found.dash);
    element.setAttribute('stroke-width', svgNumber(cellSize * palette.outlineWidth * 1.6, 3));
  }
}

/**
 * Draw the people of `layout` into `group`, each with its look, the patterns in
 * `defs` under ids from `idPrefix`: one `<path class="person">` per group and look, with
 * `data-outcome` (the group), `data-look` and `data-count`. Returns the drawing's size.
 */
export function drawPeopleGroup(
  group: SVGGElement,
  defs: SVGSVGElement | SVGGElement,
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  idPrefix: string,
  palette: ChartPalette = colourPalette,
): { readonly width: number; readonly height: number } {
  if (looks.length !== layout.people.length) {
    throw new RangeError(
      `A slide array has ${layout.people.length} people but ${looks.length} looks; build both from the same groups.`,
    );
  }
  const scaled = scaleLayout(layout, UNITS_PER_CELL / layout.geometry.cellSize);
  const { cellSize, iconSize, patternTile } = scaled.geometry;
  const ids = patternIdsFor(idPrefix);
  appendPatterns(select(defs as SVGSVGElement), palette, ids, patternTile);
  const path = glyphPath(glyphFor(scaled.geometry.glyph), iconSize);
  const document = group.ownerDocument;
  group.setAttribute('stroke-width', svgNumber(cellSize * palette.outlineWidth, 3));
  group.setAttribute('stroke-linejoin', 'round');
  for (const shape of peopleShapes(scaled, path, looks, LOOK_ORDER)) {
    const element = document.createElementNS(SVG_NAMESPACE, 'path');
    element.setAttribute('class', 'person');
    // The group keeps its event meaning, as in the charts; the look says how the people are drawn.
    element.setAttribute('data-outcome', shape.group);
    element.setAttribute('data-look', shape.look);
    element.setAttribute('data-count', String(shape.count));
    paint(element, shape.look, palette, ids, cellSize);
    element.setAttribute('d', shape.d);
    group.appendChild(element);
  }
  return { width: scaled.geometry.width, height: scaled.geometry.height };
}

/** Draw a whole array into an `<svg>` element, replacing its content; the view box is the drawing's size. */
export function drawSlidePeople(
  svg: SVGSVGElement,
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  idPrefix: string,
): void {
  svg.replaceChildren();
  const group = svg.ownerDocument.createElementNS(SVG_NAMESPACE, 'g');
  const size = drawPeopleGroup(group, svg, layout, looks, idPrefix);
  svg.appendChild(group);
  svg.setAttribute('viewBox', `0 0 ${svgNumber(size.width)} ${svgNumber(size.height)}`);
  svg.setAttribute('data-denominator', String(layout.denominator));
  svg.setAttribute('data-arrangement', layout.arrangement);
}

/** Draw one figure of a look into a unit `<svg>`, for a legend swatch. */
export function drawSwatch(svg: SVGSVGElement, look: PersonLook, idPrefix: string, palette: ChartPalette = colourPalette): void {
  svg.replaceChildren();
  const ids = patternIdsFor(idPrefix);
  const size = UNITS_PER_CELL;
  appendPatterns(select(svg), palette, ids, size / 4);
  const element = svg.ownerDocument.createElementNS(SVG_NAMESPACE, 'path');
  // A swatch shows a look and draws no one: `data-look`, never `data-outcome`.
  element.setAttribute('data-look', look);
  element.setAttribute('d', placeGlyphPath(glyphPath(glyphFor('person'), size), 0, 0));
  element.setAttribute('stroke-width', svgNumber(size * palette.outlineWidth * 1.2, 3));
  element.setAttribute('stroke-linejoin', 'round');
  paint(element, look, palette, ids, size);
  svg.appendChild(element);
  svg.setAttribute('viewBox', `0 0 ${size} ${size}`);
}
