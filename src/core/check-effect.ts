import { EFFECT_MEASURES } from './effect-measures.ts';
import { fail } from './problems.ts';
import type { EnteredEffect } from './types.ts';

/** The interval level used when none is given: 95% (common practice). Written here once. */
export const DEFAULT_LEVEL = 0.95;

/** An entered effect with its interval sorted (`lower ≤ upper`) and its level settled. */
export interface CheckedEffect {
  readonly measure: EnteredEffect['measure'];
  readonly estimate: number;
  readonly interval: { readonly lower: number; readonly upper: number } | null;
  readonly level: number;
  /** The effect was reported for the opposite event (see `riskWithOppositeEffect`). */
  readonly opposite: boolean;
}

function checkValue(measure: EnteredEffect['measure'], value: number, field: string): void {
  if (!Number.isFinite(value)) fail('number-unparsable', field, { input: String(value) });
  const spec = EFFECT_MEASURES[measure];
  if (!spec.allows(value)) fail(spec.problem, field, { measure, value });
}

/** Check an interval level: more than 50% and at most 99.9%. */
export function checkLevel(level: number, field: string): number {
  if (!Number.isFinite(level) || level <= 0.5 || level > 0.999) fail('level-out-of-range', field, { input: String(level) });
  return level;
}

/**
 * Check an entered effect: ratios above 0, a relative risk reduction below 100%, an absolute
 * reduction between −100% and 100%, an interval with both limits, lower first, that contains
 * the estimate. Limits in the wrong order ("0.9,0.6") are refused: they are almost certainly a
 * typing mistake, and the person must say which limit is which.
 *
 * @throws InputError `ratio-not-positive`, `rrr-out-of-range`, `arr-out-of-range`, `interval-incomplete`,
 *   `interval-excludes-estimate`, `interval-reversed`, `level-out-of-range`
 * @example checkEffect({ measure: 'or', estimate: 0.73, lower: 0.6, upper: 0.9 }, 'effect').interval // => { lower: 0.6, upper: 0.9 }
 */
export function checkEffect(effect: EnteredEffect, field: string): CheckedEffect {
  const { measure, estimate } = effect;
  checkValue(measure, estimate, `${field}.estimate`);
  const lower = effect.lower ?? null;
  const upper = effect.upper ?? null;
  const level = checkLevel(effect.level ?? DEFAULT_LEVEL, `${field}.level`);
  const opposite = effect.opposite === true;
  if (lower === null && upper === null) return { measure, estimate, interval: null, level, opposite };
  if (lower === null || upper === null) return fail('interval-incomplete', `${field}.interval`);
  checkValue(measure, lower, `${field}.lower`);
  checkValue(measure, upper, `${field}.upper`);
  // Limits in the wrong order are almost certainly a typing mistake: refused, not repaired.
  if (lower > upper) fail('interval-reversed', `${field}.interval`, { lower, upper });
  const low = lower;
  const high = upper;
  if (estimate < low || estimate > high) {
    fail('interval-excludes-estimate', `${field}.interval`, { lower: low, upper: high, estimate });
  }
  return { measure, estimate, interval: { lower: low, upper: high }, level, opposite };
}
