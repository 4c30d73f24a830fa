/**
 * The people of an icon array joined into one SVG path per look: every person of a group
 * drawn in one look becomes one subpath run ("M x,y" and the glyph's relative commands) of
 * a single `d`. The layout stays the model of every person's place; this only joins it for
 * drawing, so a browser lays out a handful of elements instead of one per person.
 */
import type { PersonGroup } from '../../core/types.ts';
import { type GlyphPath, gridPlacer } from '../glyphs/svg-path-context.ts';
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
  // One run of path text per group and look, indexed by their places in the two orders (no key strings per person).
  const groupPlace: Readonly<Record<PersonGroup, number>> = { event: 0, prevented: 1, caused: 2, free: 3 };
  const width = lookOrder.length;
  const runs: string[] = new Array<string>(GROUP_ORDER.length * width).fill('');
  const counts: number[] = new Array<number>(GROUP_ORDER.length * width).fill(0);
  const place = gridPlacer(path);
  for (const person of layout.people) {
    if (only !== null && !only.has(person.group)) continue;
    const look = looks[person.index];
    const lookPlace = look === undefined ? -1 : lookOrder.indexOf(look);
    if (lookPlace < 0) {
      throw new RangeError(`person ${person.index} has no look among ${lookOrder.join(', ')} (got ${String(look)})`);
    }
    const slot = groupPlace[person.group] * width + lookPlace;
    runs[slot] += place(person.x, person.y);
    counts[slot] = (counts[slot] as number) + 1;
  }
  const shapes: PeopleShape<Look>[] = [];
  GROUP_ORDER.forEach((group, groupIndex) => {
    lookOrder.forEach((look, lookIndex) => {
      const slot = groupIndex * width + lookIndex;
      const count = counts[slot] as number;
      if (count > 0) shapes.push({ group, look, count, d: runs[slot] as string });
    });
  });
  return shapes;
}
