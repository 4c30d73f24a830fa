/**
 * The range outline of one icon array as SVG: a `<g class="range-outline">` laid over the
 * people, with one dashed ring per person whose group depends on where in the interval
 * the truth lies. The people themselves are not touched, so what the picture counts
 * stays what its legend says.
 */
import type { IconArrayLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { rangeRing } from '../range-ring.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { setChangedAttribute } from './set-changed-attribute.ts';
import { svgNumber } from './svg-number.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/**
 * Fill `group` with the rings of the people in `span` (none when null), replacing what was
 * there only when the rings differ, and set the ring paint on the group.
 */
export function drawRangeRings(group: SVGGElement, layout: IconArrayLayout, span: RankSpan | null, palette: ChartPalette): void {
  const { iconSize, cellSize } = layout.geometry;
  const sample = rangeRing(0, 0, iconSize, cellSize, palette);
  const attributes: readonly (readonly [string, string])[] = [
    ['class', 'range-outline'],
    ['aria-hidden', 'true'],
    ['fill', 'none'],
    ['stroke', palette.uncertainOutline],
    ['stroke-width', svgNumber(sample.lineWidth, 3)],
    ['stroke-dasharray', `${svgNumber(sample.dash[0])} ${svgNumber(sample.dash[1])}`],
  ];
  for (const [name, value] of attributes) setChangedAttribute(group, name, value);
  const rings = layout.people
    .filter((person) => isUncertain(person.rank, span))
    .map((person) => {
      const ring = rangeRing(person.x, person.y, iconSize, cellSize, palette);
      const element = group.ownerDocument.createElementNS(SVG_NAMESPACE, 'rect');
      element.setAttribute('x', svgNumber(ring.x));
      element.setAttribute('y', svgNumber(ring.y));
      element.setAttribute('width', svgNumber(ring.side));
      element.setAttribute('height', svgNumber(ring.side));
      element.setAttribute('rx', svgNumber(ring.radius));
      element.setAttribute('data-index', String(person.index));
      return element;
    });
  const same =
    rings.length === group.children.length && rings.every((ring, index) => group.children[index]?.isEqualNode(ring) === true);
  if (!same) group.replaceChildren(...rings);
}
