import type { IntervalEstimate } from './counts-types.ts';

/** Build an estimate whose bounds are widened, if rounding requires it, so that lower ≤ estimate ≤ upper. */
export function intervalEstimate(estimate: number, lower: number, upper: number): IntervalEstimate {
  return { estimate, lower: Math.min(lower, estimate), upper: Math.max(upper, estimate) };
}
