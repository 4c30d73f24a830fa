import type { Denominator, PeopleGroups } from './types.ts';

/**
 * The four icon-array groups of one option, from the rounded people counts of the
 * comparison and of the option, so that they always sum to the denominator:
 * `event` has the outcome either way, `prevented` only without the option,
 * `caused` only with it, `free` in neither case.
 *
 * @example peopleGroups(20, 15, 100) // => { denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 }
 */
export function peopleGroups(comparison: number, intervention: number, denominator: Denominator): PeopleGroups {
  const event = Math.min(comparison, intervention);
  return {
    denominator,
    event,
    prevented: Math.max(comparison - intervention, 0),
    caused: Math.max(intervention - comparison, 0),
    free: denominator - Math.max(comparison, intervention),
  };
}
