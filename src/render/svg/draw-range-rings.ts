/**
 * The range outline of one icon array as SVG: one `<path class="range-outline">` laid over
 * the people, `data-look="outline"` and `data-count` (how many people it rings), its `d`
 * holding one dashed rounded square per person whose group depends on where in the interval
 * the truth lies. The people themselves are not touched, so what the picture counts stays
 * what its legend says.
 */
import type { IconArrayLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { type RangeRing, rangeRing } from '../range-ring.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { setChangedAttribute } from './set-changed-attribute.ts';
import { svgNumber } from './svg-number.ts';

/**
 * A ring as SVG path commands: the path a `<rect>` with `rx = ry` stands for (SVG 2, W3C
 * 2018, §10.2 "The rect element": start at (x + rx, y), then clockwise with an arc at each
 * corner), so its dashes fall where the rectangle's would.
 *
 * @example ringPath({ x: 1, y: 2, side: 10, radius: 1, lineWidth: 0.1, dash: [1, 1] })
 * // => 'M2,2h8a1,1,0,0,1,1,1v8a1,1,0,0,1,-1,1h-8a1,1,0,0,1,-1,-1v-8a1,1,0,0,1,1,-1z'
 */
export function ringPath(ring: RangeRing): string {
  const r = svgNumber(ring.radius);
  const straight = svgNumber(ring.side - 2 * ring.radius);
  const corner = (dx: string, dy: string) => `a${r},${r},0,0,1,${dx},${dy}`;
  const back = svgNumber(-ring.radius);
  return (
    `M${svgNumber(ring.x + ring.radius)},${svgNumber(ring.y)}h${straight}${corner(r, r)}v${straight}${corner(back, r)}` +
    `h-${straight}${corner(back, back)}v-${straight}${corner(r, back)}z`
  );
}

/**
 * Set `outline` (a `<path>`) to the rings of the people in `span` (none when null) and the
 * ring paint, writing only values that change.
 */
export function drawRangeRings(outline: Element, layout: IconArrayLayout, span: RankSpan | null, palette: ChartPalette): void {
  const { iconSize, cellSize } = layout.geometry;
  const sample = rangeRing(0, 0, iconSize, cellSize, palette);
  const ringed = layout.people.filter((person) => isUncertain(person.rank, span));
  const d = ringed.map((person) => ringPath(rangeRing(person.x, person.y, iconSize, cellSize, palette))).join('');
  const attributes: readonly (readonly [string, string])[] = [
    ['class', 'range-outline'],
    ['aria-hidden', 'true'],
    ['data-look', 'outline'],
    ['data-count', String(ringed.length)],
    ['fill', 'none'],
    ['stroke', palette.uncertainOutline],
    ['stroke-width', svgNumber(sample.lineWidth, 3)],
    ['stroke-dasharray', `${svgNumber(sample.dash[0])} ${svgNumber(sample.dash[1])}`],
    ['d', d],
  ];
  for (const [name, value] of attributes) setChangedAttribute(outline, name, value);
}
