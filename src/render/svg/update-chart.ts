/**
 * Live redraw of a drawn chart: people whose look changed are updated in place,
 * everyone else is left untouched; text is redrawn (a handful of elements).
 */
import { select } from 'd3-selection';
import { chartFrame } from '../chart-frame.ts';
import type { ChartModel } from '../chart-model.ts';
import { drawArrayText, drawChart, drawHeading, setRootAttributes } from './draw-chart.ts';
import { personLooks, updatePeople } from './draw-people.ts';
import { patternIdsFor } from './person-paint.ts';
import { type SvgChartOptions, recordedSvgOptions, resolveSvgOptions } from './svg-chart-options.ts';
import { svgNumber } from './svg-number.ts';

/** What an update did: redrew everything, or changed this many people. */
export interface ChartUpdate {
  readonly redrawn: boolean;
  readonly peopleChanged: number;
}

/**
 * Update `svgElement` (drawn by `drawChart` or `renderChartSvg`) to show `model`.
 * When the arrays, denominator or arrangement differ, or options are given, the
 * chart is drawn afresh; otherwise only changed people are touched.
 */
export function updateChart(svgElement: SVGSVGElement, model: ChartModel, options?: SvgChartOptions): ChartUpdate {
  const resolved = options === undefined ? recordedSvgOptions(svgElement, model) : resolveSvgOptions(model, options);
  const svg = select(svgElement);
  const groups = svg.selectChildren<SVGGElement, unknown>('g.chart-array').nodes();
  const sameShape =
    options === undefined &&
    svgElement.getAttribute('data-denominator') === String(model.denominator) &&
    svgElement.getAttribute('data-arrangement') === model.arrangement &&
    groups.length === model.arrays.length &&
    groups.every((group, index) => group.getAttribute('data-option-id') === model.arrays[index]?.optionId);
  if (!sameShape) {
    drawChart(svgElement, model, resolved);
    return { redrawn: true, peopleChanged: model.denominator * model.arrays.length };
  }
  const frame = chartFrame(model, { width: resolved.width, fontSize: resolved.fontSize, showRange: resolved.showRange });
  setRootAttributes(svg, model, frame, resolved);
  svg.select('title').text(model.description);
  svg.select('rect.background').attr('height', svgNumber(frame.height));
  const heading = svg.select<SVGGElement>('g.chart-heading');
  heading.selectChildren().remove();
  drawHeading(heading, frame, resolved);
  const ids = patternIdsFor(resolved.idPrefix);
  let peopleChanged = 0;
  model.arrays.forEach((array, index) => {
    const group = groups[index];
    const placed = frame.arrays[index];
    if (group === undefined || placed === undefined) return;
    const text = select(group).select<SVGGElement>('g.array-text');
    text.selectChildren().remove();
    drawArrayText(text, array, placed, resolved);
    const people = select(group).select<SVGGElement>('g.people');
    people.attr('transform', `translate(${svgNumber(placed.grid.x)},${svgNumber(placed.grid.y)})`);
    const node = people.node();
    if (node === null) return;
    const looks = personLooks(placed.grid.layout, array.range?.uncertain ?? null, resolved.showRange);
    peopleChanged += updatePeople(node, looks, resolved.palette, ids, placed.grid.layout.geometry.cellSize);
  });
  return { redrawn: false, peopleChanged };
}
