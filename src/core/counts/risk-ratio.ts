import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts } from '../types.ts';
import type { RatioEstimate } from './counts-types.ts';
import { logScaleInterval } from './log-scale-interval.ts';
import { ratioCells } from './ratio-cells.ts';
import { twoByTwoTable } from './two-by-two-table.ts';
import { zForLevel } from './z-for-level.ts';

/**
 * Risk ratio, option risk / comparison risk, with the Katz log interval:
 * SE(ln RR) = √(1/a − 1/n₁ + 1/c − 1/n₂). Cells are corrected by 0.5 when one is 0;
 * null when neither arm has an event or both arms are all events.
 */
export function riskRatio(intervention: ArmCounts, comparison: ArmCounts, level = DEFAULT_LEVEL): RatioEstimate | null {
  const cells = ratioCells(twoByTwoTable(intervention, comparison));
  const z = zForLevel(level);
  if (cells === null) return null;
  const { optionEvents, optionNonEvents, comparisonEvents, comparisonNonEvents } = cells.table;
  const optionTotal = optionEvents + optionNonEvents;
  const comparisonTotal = comparisonEvents + comparisonNonEvents;
  const logRatio = Math.log(optionEvents) - Math.log(optionTotal) - (Math.log(comparisonEvents) - Math.log(comparisonTotal));
  const variance = 1 / optionEvents - 1 / optionTotal + 1 / comparisonEvents - 1 / comparisonTotal;
  return logScaleInterval(logRatio, Math.sqrt(Math.max(0, variance)), z, cells.corrected);
}
