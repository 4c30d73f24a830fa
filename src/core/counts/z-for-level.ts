import { fail } from '../problems.ts';
import { normalUpperQuantile } from './normal-tail.ts';

/** Lowest and highest interval levels the core accepts: (0.5, 0.999]. */
export const LEVEL_ABOVE = 0.5;
export const LEVEL_MAX = 0.999;

/** The two-sided standard normal quantile for an interval level, z = Φ⁻¹((1 + level) / 2), the z with P(Z > z) = (1 − level) / 2. */
export function zForLevel(level: number): number {
  if (!(level > LEVEL_ABOVE && level <= LEVEL_MAX)) {
    fail('level-out-of-range', 'level', { input: Number.isFinite(level) ? level : String(level) });
  }
  return normalUpperQuantile((1 - level) / 2);
}
