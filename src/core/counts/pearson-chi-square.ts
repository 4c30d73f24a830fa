import type { ArmCounts } from '../types.ts';
import { chiSquareUpperTail } from './chi-square-upper-tail.ts';
import type { TestResult } from './counts-types.ts';
import { phiCoefficient } from './phi-coefficient.ts';

/**
 * Pearson's chi-square test of the 2×2 table (1 degree of freedom), without continuity
 * correction: X² = N(ad − bc)² / (row and column totals multiplied) = N·phi². Null when
 * a margin is 0 (no events at all, or every person has the event).
 */
export function pearsonChiSquare(intervention: ArmCounts, comparison: ArmCounts): TestResult | null {
  const phi = phiCoefficient(intervention, comparison);
  if (phi === null) return null;
  const statistic = (intervention.total + comparison.total) * phi * phi;
  return { statistic, p: chiSquareUpperTail(statistic) };
}
