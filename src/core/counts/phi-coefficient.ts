import type { ArmCounts } from '../types.ts';
import { twoByTwoTable } from './two-by-two-table.ts';

/**
 * The phi coefficient of the 2×2 table, (ad − bc) / √(product of the four margins), with
 * the option arm as the first row and events as the first column: positive when events
 * go with the option. Null when a margin is 0.
 */
export function phiCoefficient(intervention: ArmCounts, comparison: ArmCounts): number | null {
  const table = twoByTwoTable(intervention, comparison);
  const eventTotal = table.optionEvents + table.comparisonEvents;
  const nonEventTotal = table.optionNonEvents + table.comparisonNonEvents;
  if (eventTotal === 0 || nonEventTotal === 0) return null;
  const crossDifference = table.optionEvents * table.comparisonNonEvents - table.optionNonEvents * table.comparisonEvents;
  const scale = Math.sqrt(intervention.total) * Math.sqrt(comparison.total) * Math.sqrt(eventTotal) * Math.sqrt(nonEventTotal);
  return Math.min(1, Math.max(-1, crossDifference / scale));
}
