/**
 * The people of an icon array joined into one SVG path per look: every person of a group
 * drawn in one look becomes one subpath run ("M x,y" and the glyph's relative commands) of
 * a single `d`. The layout stays the model of every person's place; this only joins it for
 * drawing, so a browser lays out a handful of elements instead of one per person.
 */
import type { PersonGroup } from '../../core/types.ts';
import { type GlyphPath, placeGlyphPath } from '../glyphs/svg-path-context.ts';
import type { IconArrayLayout } from '../icon-array-layout.ts';

/** The order the groups' shapes are drawn in, which is also the order of the layout's fill. */
export const GROUP_ORDER: readonly PersonGroup[] = ['event', 'prevented', 'caused', 'free'];

/** The people of one group drawn in one look: how many, and their joined path. */
export interface PeopleShape<Look extends string> {
  readonly group: PersonGroup;
  readonly look: Look;
  readonly count: number;
  readonly d: string;
}

/**
 * One shape per group and look that has people, in {@link GROUP_ORDER} and then in
 * `lookOrder`; each shape's subpaths follow the layout's order of people. With `only`,
 * just the shapes of those groups (the others are not built).
 *
 * @throws RangeError when a person's look is missing or not in `lookOrder`
 * @example peopleShapes(iconArrayLayout(100, groups), glyphPath(personGlyph, 0.88), looks, ['event', 'helped', 'harmed', 'free'])[0]
 * // => { group: 'event', look: 'event', count: 13, d: 'M0.6,0.3a…zM1.6,0.3a…z…' }
 */
export function peopleShapes<Look extends string>(
  layout: IconArrayLayout,
  path: GlyphPath,
  looks: readonly Look[],
  lookOrder: readonly Look[],
  only: ReadonlySet<PersonGroup> | null = null,
): PeopleShape<Look>[] {
  const runs = new Map<string, { group: PersonGroup; look: Look; parts: string[] }>();
  for (const person of layout.people) {
    if (only !== null && !only.has(person.group)) continue;
    const look = looks[person.index];
    if (look === undefined || !lookOrder.includes(look)) {
      throw new RangeError(`person ${person.index} has no look among ${lookOrder.join(', ')} (got ${String(look)})`);
    }
    const key = `${person.group} ${look}`;
    let run = runs.get(key);
    if (run === undefined) {
      run = { group: person.group, look, parts: [] };
      runs.set(key, run);
    }
    run.parts.push(placeGlyphPath(path, person.x, person.y));
  }
  const shapes: PeopleShape<Look>[] = [];
  for (const group of GROUP_ORDER) {
    for (const look of lookOrder) {
      const run = runs.get(`${group} ${look}`);
      if (run !== undefined) shapes.push({ group, look, count: run.parts.length, d: run.parts.join('') });
    }
  }
  return shapes;
}
