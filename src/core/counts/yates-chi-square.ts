import type { ArmCounts } from '../types.ts';
import { chiSquareUpperTail } from './chi-square-upper-tail.ts';
import type { TestResult } from './counts-types.ts';
import { twoByTwoTable } from './two-by-two-table.ts';

/**
 * Chi-square with Yates' continuity correction as R's chisq.test and SciPy's
 * chi2_contingency apply it: each |O − E| is reduced by min(0.5, |O − E|), so the
 * correction never overshoots. In a 2×2 table every |O − E| equals |ad − bc| / N, so
 * X² = N·max(0, |ad − bc| − N/2)² / (margins multiplied). Null when a margin is 0.
 */
export function yatesChiSquare(intervention: ArmCounts, comparison: ArmCounts): TestResult | null {
  const table = twoByTwoTable(intervention, comparison);
  const eventTotal = table.optionEvents + table.comparisonEvents;
  const nonEventTotal = table.optionNonEvents + table.comparisonNonEvents;
  if (eventTotal === 0 || nonEventTotal === 0) return null;
  const grandTotal = intervention.total + comparison.total;
  const crossDifference = Math.abs(
    table.optionEvents * table.comparisonNonEvents - table.optionNonEvents * table.comparisonEvents,
  );
  const reduced = Math.max(0, crossDifference - grandTotal / 2);
  const scale = Math.sqrt(intervention.total) * Math.sqrt(comparison.total) * Math.sqrt(eventTotal) * Math.sqrt(nonEventTotal);
  const ratio = reduced / scale;
  const statistic = grandTotal * ratio * ratio;
  return { statistic, p: chiSquareUpperTail(statistic) };
}
