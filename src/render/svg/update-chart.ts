/**
 * Live redraw of a drawn chart: only the shapes of the groups whose people changed
 * are rewritten (one path per group, `draw-people.ts`), the others are left untouched; text is drawn again off the page and only the
 * blocks that changed are swapped in. Attributes are written only when their value
 * changes, since a rewritten `viewBox` or `transform` makes the browser lay out every
 * person again.
 */
import { type Selection, select } from 'd3-selection';
import { chartFrame } from '../chart-frame.ts';
import type { ChartModel } from '../chart-model.ts';
import { drawArrayText, drawChart, drawHeading, hasRangeOutline, peopleTransform, setRootAttributes } from './draw-chart.ts';
import { personLooks, updatePeople } from './draw-people.ts';
import { drawRangeRings } from './draw-range-rings.ts';
import { patternIdsFor } from './person-paint.ts';
import { setChangedAttribute } from './set-changed-attribute.ts';
import { type SvgChartOptions, recordedSvgOptions, resolveSvgOptions } from './svg-chart-options.ts';
import { svgNumber } from './svg-number.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/** What an update did: redrew everything, or changed this many people. */
export interface ChartUpdate {
  readonly redrawn: boolean;
  readonly peopleChanged: number;
}

/**
 * Update `svgElement` (drawn by `drawChart` or `renderChartSvg`) to show `model`.
 * When the arrays, denominator or arrangement differ, an interval appears or goes
 * away under a shown range, or options are given, the chart is drawn afresh;
 * otherwise only the shapes of groups whose people changed are touched.
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
    groups.every((group, index) => {
      const array = model.arrays[index];
      if (array === undefined || group.getAttribute('data-option-id') !== array.optionId) return false;
      // An interval that appears or goes away adds or removes the array's range outline.
      return (group.querySelector(':scope > path.range-outline') !== null) === hasRangeOutline(array, resolved);
    });
  if (!sameShape) {
    drawChart(svgElement, model, resolved);
    return { redrawn: true, peopleChanged: model.denominator * model.arrays.length };
  }
  const frame = chartFrame(model, { width: resolved.width, fontSize: resolved.fontSize, showRange: resolved.showRange });
  setRootAttributes(svgElement, model, frame, resolved);
  const title = svgElement.querySelector(':scope > title');
  if (title !== null && title.textContent !== model.description) title.textContent = model.description;
  const background = svgElement.querySelector(':scope > rect.background');
  if (background !== null) setChangedAttribute(background, 'height', svgNumber(frame.height));
  const heading = svgElement.querySelector<SVGGElement>(':scope > g.chart-heading');
  if (heading !== null) replaceChangedChildren(heading, (fresh) => drawHeading(fresh, frame, resolved));
  const ids = patternIdsFor(resolved.idPrefix);
  let peopleChanged = 0;
  model.arrays.forEach((array, index) => {
    const group = groups[index];
    const placed = frame.arrays[index];
    if (group === undefined || placed === undefined) return;
    const text = group.querySelector<SVGGElement>(':scope > g.array-text');
    if (text !== null) replaceChangedChildren(text, (fresh) => drawArrayText(fresh, array, placed, resolved));
    const people = group.querySelector<SVGGElement>(':scope > g.people');
    if (people === null) return;
    setChangedAttribute(people, 'transform', peopleTransform(placed));
    peopleChanged += updatePeople(
      people,
      placed.grid.layout,
      personLooks(placed.grid.layout, model.wanted),
      resolved.palette,
      ids,
    );
    const rings = group.querySelector(':scope > path.range-outline');
    if (rings !== null) {
      setChangedAttribute(rings, 'transform', peopleTransform(placed));
      drawRangeRings(rings, placed.grid.layout, array.range?.uncertain ?? null, resolved.palette);
    }
  });
  return { redrawn: false, peopleChanged };
}

/**
 * Draw a group's content afresh off the page, then swap in only the children that differ,
 * so unchanged titles and swatches are not laid out again.
 */
function replaceChangedChildren(
  group: SVGGElement,
  draw: (fresh: Selection<SVGGElement, unknown, null, undefined>) => void,
): void {
  const fresh = group.ownerDocument.createElementNS(SVG_NAMESPACE, 'g');
  draw(select(fresh));
  const before = [...group.children];
  const after = [...fresh.children];
  if (before.length !== after.length) {
    group.replaceChildren(...after);
    return;
  }
  after.forEach((child, index) => {
    const old = before[index];
    if (old !== undefined && !old.isEqualNode(child)) old.replaceWith(child);
  });
}
