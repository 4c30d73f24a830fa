/**
 * Float-safe rounding rules. Binary floating point turns 0.145 × 100 into 14.4999…
 * and 1 / (0.05 − 0.04) into 99.9999…; these helpers undo such noise before rounding.
 */

const RELATIVE_TOLERANCE = 1e-9;

/** Round up to a whole number, but keep a value within 1e-9 (relative) of a whole number as that number. */
export function ceilWhole(value: number): number {
  const nearest = Math.round(value);
  if (Math.abs(value - nearest) <= RELATIVE_TOLERANCE * Math.max(1, Math.abs(value))) return nearest;
  return Math.ceil(value);
}

/** Round down to a whole number, but keep a value within 1e-9 (relative) of a whole number as that number. */
export function floorWhole(value: number): number {
  const nearest = Math.round(value);
  if (Math.abs(value - nearest) <= RELATIVE_TOLERANCE * Math.max(1, Math.abs(value))) return nearest;
  return Math.floor(value);
}

/**
 * Round half up on the decimal value: 14.4999999999 (from 0.145 × 100) rounds to 15. A fraction
 * within 1e-9 (relative) below one half counts as one half.
 */
export function roundHalfUp(value: number): number {
  const whole = Math.floor(value);
  const fraction = value - whole;
  return fraction >= 0.5 - RELATIVE_TOLERANCE * Math.max(1, Math.abs(value)) ? whole + 1 : whole;
}
