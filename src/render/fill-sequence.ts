import type { PeopleGroups, PersonGroup } from '../core/types.ts';

/** The order in which groups fill an icon array: the same in every array compared. */
export const FILL_ORDER: readonly PersonGroup[] = ['event', 'prevented', 'caused', 'free'];

/**
 * Every person's group in fill order: first those who have the outcome either way,
 * then those it changes for (prevented or caused), then those who never have it.
 *
 * @throws RangeError when a count is not a whole number ≥ 0 or the counts do not sum to the denominator
 * @example fillSequence({ denominator: 100, event: 2, prevented: 1, caused: 0, free: 97 }).slice(0, 4)
 * // => ['event', 'event', 'prevented', 'free']
 */
export function fillSequence(groups: PeopleGroups): PersonGroup[] {
  let total = 0;
  for (const group of FILL_ORDER) {
    const count = groups[group];
    if (!Number.isInteger(count) || count < 0) {
      throw new RangeError(`fillSequence requires whole, non-negative counts (${group}: ${count})`);
    }
    total += count;
  }
  if (total !== groups.denominator) {
    throw new RangeError(`fillSequence requires counts that sum to ${groups.denominator} (they sum to ${total})`);
  }
  const sequence: PersonGroup[] = [];
  for (const group of FILL_ORDER) {
    for (let person = 0; person < groups[group]; person += 1) sequence.push(group);
  }
  return sequence;
}
