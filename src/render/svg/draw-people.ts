/**
 * The people of one icon array as SVG: exactly one `<path>` per person, carrying
 * `data-outcome` with the person's group, and a live update that touches only the
 * people whose look changed.
 */
import { type Selection, select } from 'd3-selection';
import type { PersonGroup } from '../../core/types.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { glyphPath, placeGlyphPath } from '../glyphs/svg-path-context.ts';
import type { IconArrayLayout, PersonPlacement } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { type RankSpan, isUncertain } from '../uncertain-people.ts';
import { type PatternIds, personPaint } from './person-paint.ts';
import { svgNumber } from './svg-number.ts';

/** What a person looks like: their group, outlined when it depends on the interval. */
export interface PersonLook {
  readonly group: PersonGroup;
  readonly uncertain: boolean;
}

/** Every person's look, in layout order. */
export function personLooks(layout: IconArrayLayout, uncertain: RankSpan | null, showRange: boolean): PersonLook[] {
  return layout.people.map((person) => ({ group: person.group, uncertain: showRange && isUncertain(person.rank, uncertain) }));
}

/** Draw the people of a layout into `group`, replacing what was there. */
export function drawPeople(
  group: Selection<SVGGElement, unknown, null, undefined>,
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  palette: ChartPalette,
  patternIds: PatternIds,
): void {
  const { cellSize, iconSize } = layout.geometry;
  const path = glyphPath(glyphFor(layout.geometry.glyph), iconSize);
  group
    .attr('stroke-width', svgNumber(cellSize * palette.outlineWidth, 3))
    .attr('stroke-linejoin', 'round');
  group
    .selectAll<SVGPathElement, PersonPlacement>('path')
    .data(layout.people)
    .join('path')
    .attr('d', (person) => placeGlyphPath(path, person.x, person.y))
    .attr('data-outcome', (person) => person.group)
    .each(function paint(person) {
      applyLook(this, looks[person.index] ?? { group: person.group, uncertain: false }, palette, patternIds, cellSize, true);
    });
}

/**
 * Bring the drawn people of `group` to new looks, touching only those whose
 * look changed. Returns how many people changed.
 */
export function updatePeople(
  group: SVGGElement,
  looks: readonly PersonLook[],
  palette: ChartPalette,
  patternIds: PatternIds,
  cellSize: number,
): number {
  let changed = 0;
  select(group)
    .selectAll<SVGPathElement, unknown>('path')
    .each(function update(_, index) {
      const look = looks[index];
      if (look === undefined) return;
      const uncertainNow = this.hasAttribute('stroke-dasharray');
      if (this.getAttribute('data-outcome') === look.group && uncertainNow === look.uncertain) return;
      this.setAttribute('data-outcome', look.group);
      applyLook(this, look, palette, patternIds, cellSize);
      changed += 1;
    });
  return changed;
}

function applyLook(
  element: SVGPathElement,
  look: PersonLook,
  palette: ChartPalette,
  patternIds: PatternIds,
  cellSize: number,
  fresh = false,
): void {
  const paint = personPaint(palette, look.uncertain ? 'uncertain' : look.group, patternIds, cellSize);
  element.setAttribute('fill', paint.fill);
  element.setAttribute('stroke', paint.stroke);
  if (paint.dash === null) {
    // A new element has nothing to remove; skipping the calls keeps the first draw fast.
    if (fresh) return;
    element.removeAttribute('stroke-dasharray');
    element.removeAttribute('stroke-width');
  } else {
    element.setAttribute('stroke-dasharray', paint.dash);
    element.setAttribute('stroke-width', svgNumber(cellSize * palette.outlineWidth * 1.6, 3));
  }
}
