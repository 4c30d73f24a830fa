import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts } from '../types.ts';
import type { IntervalEstimate } from './counts-types.ts';
import { intervalEstimate } from './interval-estimate.ts';
import { wilsonInterval } from './wilson-interval.ts';

/**
 * Comparison risk − option risk with Newcombe's hybrid score interval (1998, method 10):
 * the square-and-add of the two Wilson intervals. With d = p₁ − p₂ (arm 1 the comparison),
 * lower = d − √((p₁ − l₁)² + (u₂ − p₂)²) and upper = d + √((u₁ − p₁)² + (p₂ − l₂)²).
 */
export function newcombeDifference(intervention: ArmCounts, comparison: ArmCounts, level = DEFAULT_LEVEL): IntervalEstimate {
  const first = wilsonInterval(comparison.events, comparison.total, level);
  const second = wilsonInterval(intervention.events, intervention.total, level);
  const difference = first.estimate - second.estimate;
  const lower = difference - Math.hypot(first.estimate - first.lower, second.upper - second.estimate);
  const upper = difference + Math.hypot(first.upper - first.estimate, second.estimate - second.lower);
  return intervalEstimate(difference, Math.max(-1, lower), Math.min(1, upper));
}
