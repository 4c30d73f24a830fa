import type { Amount } from './wording-catalogue.ts';

/**
 * The amount case of a rounded people count, so that the words never contradict
 * the picture: a count of 0 reads "none" only when the risk is exactly 0 and
 * "fewer than 1" otherwise; a count equal to the denominator reads "all" only when
 * the risk is exactly 1 and "nearly all" otherwise. The risk (a proportion, or
 * null when unknown) only decides these two edges; every number shown is the count.
 *
 * @param count - the rounded number of people, as drawn in the icon array
 * @param denominator - the people the count is out of (100 or 1000)
 * @param risk - the unrounded proportion behind the count, or null
 * @returns the amount case for the catalogue
 * @example amountOf(0, 100, 0.003) // => { kind: 'fewer-than-one' }
 */
export function amountOf(count: number, denominator: number, risk: number | null): Amount {
  if (count <= 0) return risk === 0 ? { kind: 'none' } : { kind: 'fewer-than-one' };
  if (count >= denominator) return risk === 1 ? { kind: 'all' } : { kind: 'nearly-all' };
  return { kind: 'about', count };
}
