import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts } from '../types.ts';
import type { DifferenceMethod, IntervalEstimate } from './counts-types.ts';
import { newcombeDifference } from './newcombe-difference.ts';
import { waldDifference } from './wald-difference.ts';

/**
 * Risk difference as comparison risk − option risk (positive: the option reduces the
 * outcome), with Newcombe's hybrid score interval (default) or the Wald interval.
 */
export function riskDifference(
  intervention: ArmCounts,
  comparison: ArmCounts,
  level = DEFAULT_LEVEL,
  method: DifferenceMethod = 'newcombe',
): IntervalEstimate {
  return method === 'wald'
    ? waldDifference(intervention, comparison, level)
    : newcombeDifference(intervention, comparison, level);
}
