import type { Estimate, PersonGroup } from './types.ts';

/**
 * Whether an option helps or harms follows from two directions: that of the event (wanted,
 * like "pain gone by day 3", or unwanted, like "a hip fracture") and that of the change.
 * Fewer unwanted events or more wanted events help; more unwanted or fewer wanted events
 * harm. Nothing else in the product infers help or harm from the sign of a difference.
 */
export type ChangeDirection = 'helps' | 'harms' | 'none';

/**
 * The look a person is drawn in: `event` has the outcome either way, `helped` and `harmed`
 * are the people the option changes things for, `free` has it in neither arm.
 */
export type PersonLook = 'event' | 'helped' | 'harmed' | 'free';

/**
 * A difference signed so that positive always means the option helps: comparison − option
 * for an unwanted event, option − comparison for a wanted one. The interval's ends swap
 * with the sign, so lower ≤ upper still holds.
 *
 * @example benefitOf({ estimate: -0.2, lower: -0.3, upper: -0.1 }, true) // => { estimate: 0.2, lower: 0.1, upper: 0.3 }
 */
export function benefitOf(difference: Estimate, wanted: boolean): Estimate {
  if (!wanted) return difference;
  const flip = (value: number | null): number | null => (value === null ? null : value === 0 ? 0 : -value);
  return { estimate: flip(difference.estimate) ?? 0, lower: flip(difference.upper), upper: flip(difference.lower) };
}

/**
 * Whether a difference (comparison − option, as the core reports it) helps or harms.
 *
 * @example changeOf(-0.2, true) // => 'helps' (more people have a wanted event)
 */
export function changeOf(difference: number, wanted: boolean): ChangeDirection {
  if (difference === 0 || !Number.isFinite(difference)) return 'none';
  return difference > 0 !== wanted ? 'helps' : 'harms';
}

/**
 * The look of one people group. `prevented` (has the event only without the option) helps
 * for an unwanted event and harms for a wanted one; `caused` the other way round.
 *
 * @example lookOf('caused', true) // => 'helped'
 */
export function lookOf(group: PersonGroup, wanted: boolean): PersonLook {
  switch (group) {
    case 'prevented':
      return wanted ? 'harmed' : 'helped';
    case 'caused':
      return wanted ? 'helped' : 'harmed';
    default:
      return group;
  }
}
