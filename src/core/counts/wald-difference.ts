import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts } from '../types.ts';
import { checkArm } from './check-arm.ts';
import type { IntervalEstimate } from './counts-types.ts';
import { intervalEstimate } from './interval-estimate.ts';
import { zForLevel } from './z-for-level.ts';

/**
 * Comparison risk − option risk with the Wald interval (Newcombe 1998, method 1):
 * d ± z·√(p₁(1 − p₁)/n₁ + p₂(1 − p₂)/n₂), truncated to [−1, 1].
 */
export function waldDifference(intervention: ArmCounts, comparison: ArmCounts, level = DEFAULT_LEVEL): IntervalEstimate {
  checkArm(intervention, 'intervention');
  checkArm(comparison, 'comparison');
  const z = zForLevel(level);
  const comparisonRisk = comparison.events / comparison.total;
  const optionRisk = intervention.events / intervention.total;
  const difference = comparisonRisk - optionRisk;
  const standardError = Math.sqrt(
    (comparisonRisk * (1 - comparisonRisk)) / comparison.total + (optionRisk * (1 - optionRisk)) / intervention.total,
  );
  return intervalEstimate(difference, Math.max(-1, difference - z * standardError), Math.min(1, difference + z * standardError));
}
