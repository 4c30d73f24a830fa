/**
 * English grammar helpers shared by every English catalogue (core wording, pictures, handout,
 * teaching): the plural rule, a capital first letter, and whether an outcome name starts with a verb.
 */

/** English plural rule: the `one` form for exactly 1, the `other` form otherwise. */
export function plural(count: number, one: string, other: string): string {
  return count === 1 ? one : other;
}

/** A sentence starts with a capital; names typed with a capital are left as they are. */
export const capitalise = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * Outcome names are usually noun phrases ("a stroke": "will have a stroke"). A few
 * start with a verb in -ing ("dying of bowel cancer"); those read "will end up dying".
 */
const VERBS_IN_ING = new Set([
  'becoming',
  'being',
  'breaking',
  'catching',
  'developing',
  'dying',
  'falling',
  'feeling',
  'getting',
  'going',
  'having',
  'leaving',
  'living',
  'losing',
  'needing',
  'returning',
  'spending',
  'staying',
  'starting',
  'stopping',
  'taking',
  'using',
]);

/** True when an outcome name starts with a verb in -ing ("dying of bowel cancer"). */
export const startsWithVerb = (outcome: string): boolean =>
  VERBS_IN_ING.has((outcome.trim().split(/\s+/)[0] ?? '').toLowerCase());
