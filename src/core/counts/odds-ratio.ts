import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts } from '../types.ts';
import type { RatioEstimate } from './counts-types.ts';
import { logScaleInterval } from './log-scale-interval.ts';
import { ratioCells } from './ratio-cells.ts';
import { twoByTwoTable } from './two-by-two-table.ts';
import { zForLevel } from './z-for-level.ts';

/**
 * Odds ratio, option odds / comparison odds = ad / bc, with the Woolf logit interval:
 * SE(ln OR) = √(1/a + 1/b + 1/c + 1/d). Cells are corrected by 0.5 when one is 0;
 * null when neither arm has an event or both arms are all events.
 */
export function oddsRatio(intervention: ArmCounts, comparison: ArmCounts, level = DEFAULT_LEVEL): RatioEstimate | null {
  const cells = ratioCells(twoByTwoTable(intervention, comparison));
  const z = zForLevel(level);
  if (cells === null) return null;
  const { optionEvents, optionNonEvents, comparisonEvents, comparisonNonEvents } = cells.table;
  const logRatio =
    Math.log(optionEvents) + Math.log(comparisonNonEvents) - Math.log(optionNonEvents) - Math.log(comparisonEvents);
  const variance = 1 / optionEvents + 1 / optionNonEvents + 1 / comparisonEvents + 1 / comparisonNonEvents;
  return logScaleInterval(logRatio, Math.sqrt(variance), z, cells.corrected);
}
