/**
 * Draw a chart model into an `<svg>` element: heading, then one
 * icon array per option side by side, each with its title and labelled legend.
 * Works on any DOM: the browser's, or jsdom's in Node.
 */
import { type Selection, select } from 'd3-selection';
import { type ChartFrame, type FrameArray, chartFrame } from '../chart-frame.ts';
import type { ChartArray, ChartModel } from '../chart-model.ts';
import { drawPeople, personLooks } from './draw-people.ts';
import { drawRangeRings } from './draw-range-rings.ts';
import { appendSwatch, appendText } from './draw-text.ts';
import { patternIdsFor } from './person-paint.ts';
import { type ResolvedSvgChartOptions, type SvgChartOptions, resolveSvgOptions } from './svg-chart-options.ts';
import { appendPatterns } from './svg-patterns.ts';
import { setChangedAttribute } from './set-changed-attribute.ts';
import { svgNumber } from './svg-number.ts';

type Root = Selection<SVGSVGElement, unknown, null, undefined>;

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/** Draw `model` into `svgElement`, replacing its content. Returns the frame drawn. */
export function drawChart(svgElement: SVGSVGElement, model: ChartModel, options: SvgChartOptions = {}): ChartFrame {
  const resolved = resolveSvgOptions(model, options);
  const frame = chartFrame(model, { width: resolved.width, fontSize: resolved.fontSize, showRange: resolved.showRange });
  const svg: Root = select(svgElement);
  svgElement.replaceChildren();
  setRootAttributes(svgElement, model, frame, resolved);
  svg.append('title').text(model.description);
  const ids = patternIdsFor(resolved.idPrefix);
  appendPatterns(
    svg,
    resolved.palette,
    ids,
    model.arrays[0] === undefined ? 1 : (frame.arrays[0]?.grid.layout.geometry.patternTile ?? 1),
  );
  svg
    .append('rect')
    .attr('class', 'background')
    .attr('width', svgNumber(frame.width))
    .attr('height', svgNumber(frame.height))
    .attr('fill', resolved.palette.background);
  drawHeading(svg.append('g').attr('class', 'chart-heading').attr('aria-hidden', 'true'), frame, resolved);
  model.arrays.forEach((array, index) => {
    const placed = frame.arrays[index];
    if (placed === undefined) return;
    const group = svg.append('g').attr('class', 'chart-array').attr('data-option-id', array.optionId);
    drawArrayText(group.append('g').attr('class', 'array-text').attr('aria-hidden', 'true'), array, placed, resolved);
    // Fill the people's group while it is detached, then attach it once.
    const people = svgElement.ownerDocument.createElementNS(SVG_NAMESPACE, 'g');
    people.setAttribute('class', 'people');
    people.setAttribute('transform', peopleTransform(placed));
    drawPeople(people, placed.grid.layout, personLooks(placed.grid.layout, model.wanted), resolved.palette, ids);
    group.node()?.appendChild(people);
    if (hasRangeOutline(array, resolved)) {
      const rings = svgElement.ownerDocument.createElementNS(SVG_NAMESPACE, 'path');
      rings.setAttribute('transform', peopleTransform(placed));
      drawRangeRings(rings, placed.grid.layout, array.range?.uncertain ?? null, resolved.palette);
      group.node()?.appendChild(rings);
    }
  });
  return frame;
}

/** Whether an array carries a range outline: when the range is shown and the array has an interval. */
export function hasRangeOutline(array: ChartArray, options: ResolvedSvgChartOptions): boolean {
  return options.showRange && array.range !== null;
}

/** Root attributes: size, the text alternative, and the options an update reuses. */
export function setRootAttributes(
  svgElement: SVGSVGElement,
  model: ChartModel,
  frame: ChartFrame,
  options: ResolvedSvgChartOptions,
): void {
  const attributes: readonly (readonly [string, string])[] = [
    ['viewBox', `0 0 ${svgNumber(frame.width)} ${svgNumber(frame.height)}`],
    ['width', svgNumber(frame.width)],
    ['height', svgNumber(frame.height)],
    ['role', 'img'],
    ['aria-label', model.description],
    ['class', 'people-chart'],
    ['font-family', options.fontFamily],
    ['data-denominator', String(model.denominator)],
    ['data-wanted', String(model.wanted)],
    ['data-arrangement', model.arrangement],
    ['data-palette', options.palette.name],
    ['data-width', svgNumber(options.width)],
    ['data-font-size', svgNumber(options.fontSize)],
    ['data-show-range', String(options.showRange)],
    ['data-id-prefix', options.idPrefix],
  ];
  for (const [name, value] of attributes) setChangedAttribute(svgElement, name, value);
}

/** Where an array's people sit in the chart. */
export function peopleTransform(placed: FrameArray): string {
  return `translate(${svgNumber(placed.grid.x)},${svgNumber(placed.grid.y)})`;
}

/** The heading and the illustrative line. */
export function drawHeading(
  group: Selection<SVGGElement, unknown, null, undefined>,
  frame: ChartFrame,
  options: ResolvedSvgChartOptions,
): void {
  appendText(group, frame.heading, options.palette, 'heading');
  if (frame.illustrative !== null) appendText(group, frame.illustrative, options.palette, 'illustrative');
}

/** An array's title and legend rows (swatches carry `data-look`, never `data-outcome`). */
export function drawArrayText(
  group: Selection<SVGGElement, unknown, null, undefined>,
  array: ChartArray,
  placed: FrameArray,
  options: ResolvedSvgChartOptions,
): void {
  appendText(group, placed.title, options.palette, 'array-title');
  const ids = patternIdsFor(options.idPrefix);
  for (const row of placed.legend) {
    if (row.swatch !== null) appendSwatch(group, row.swatch, array.layout.geometry.glyph, options.palette, ids);
    appendText(group, row.text, options.palette, row.swatch === null ? 'legend-note' : 'legend-label');
  }
}
