/**
 * A close-up of one 10 × 10 block of a picture of 1000: the block that holds the
 * people an option changes, laid out as a picture of 100 so that, printed larger,
 * those few people can be found at reading distance.
 */
import type { PersonGroup } from '../core/types.ts';
import { type IconArrayLayout, iconArrayLayout } from './icon-array-layout.ts';

/** People in one block of 100. */
const BLOCK = 100;

/** How many people of `groups` each block holds, over every picture. */
function perBlock(layouts: readonly IconArrayLayout[], groups: readonly PersonGroup[]): number[] {
  const counts = Array.from({ length: 10 }, () => 0);
  for (const layout of layouts) {
    for (const person of layout.people) if (groups.includes(person.group)) counts[person.block] = (counts[person.block] ?? 0) + 1;
  }
  return counts;
}

/**
 * The block that holds the most people changed by an option (prevented or caused) across
 * the pictures, the lowest such block on a tie. When no one is changed but every picture has
 * at most 100 people with the outcome (a rare outcome, a few figures of 1.5 mm), the block
 * that holds the most of them. Null for pictures of 100, or when neither applies. Every
 * picture of a chart shares one grid, so the same block is compared.
 *
 * @example closeUpBlock([comparison, option]) // => 0 when the 6 people screening helps sit in block 0
 */
export function closeUpBlock(layouts: readonly IconArrayLayout[]): number | null {
  if (layouts.length === 0 || layouts.some((layout) => layout.denominator !== 1000)) return null;
  const changed = perBlock(layouts, ['prevented', 'caused']);
  const few = layouts.every((layout) => layout.groups.event + layout.groups.caused <= 100);
  const counts = changed.some((count) => count > 0) || !few ? changed : perBlock(layouts, ['event']);
  const most = Math.max(...counts);
  return most === 0 ? null : counts.indexOf(most);
}

/**
 * One block of a picture of 1000 as a picture of 100: each person keeps their row,
 * column, group and rank, so the close-up reads exactly as the block does.
 *
 * @throws RangeError when the layout is not of 1000 people or the block is not 0 to 9
 * @example blockLayout(layout, 0).groups // => { denominator: 100, event: 24, prevented: 6, caused: 0, free: 70 }
 */
export function blockLayout(layout: IconArrayLayout, block: number): IconArrayLayout {
  if (layout.denominator !== 1000) throw new RangeError(`blockLayout requires a picture of 1000 (got ${layout.denominator})`);
  if (!Number.isInteger(block) || block < 0 || block > 9)
    throw new RangeError(`blockLayout requires a block from 0 to 9 (got ${block})`);
  const people = layout.people.slice(block * BLOCK, (block + 1) * BLOCK);
  const counts: Record<PersonGroup, number> = { event: 0, prevented: 0, caused: 0, free: 0 };
  for (const person of people) counts[person.group] += 1;
  const base = iconArrayLayout(100, { denominator: 100, ...counts });
  return {
    ...base,
    arrangement: layout.arrangement,
    seed: layout.seed,
    people: base.people.map((place, index) => {
      const person = people[index];
      if (person === undefined) throw new RangeError('blockLayout requires 100 people in each block');
      return { ...place, rank: person.rank, group: person.group };
    }),
  };
}
