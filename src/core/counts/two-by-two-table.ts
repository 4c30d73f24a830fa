import type { ArmCounts } from '../types.ts';
import { checkArm } from './check-arm.ts';
import type { TwoByTwoTable } from './counts-types.ts';

/** Check both arms (fields "intervention" and "comparison") and lay them out as a 2×2 table. */
export function twoByTwoTable(intervention: ArmCounts, comparison: ArmCounts): TwoByTwoTable {
  checkArm(intervention, 'intervention');
  checkArm(comparison, 'comparison');
  return {
    optionEvents: intervention.events,
    optionNonEvents: intervention.total - intervention.events,
    comparisonEvents: comparison.events,
    comparisonNonEvents: comparison.total - comparison.events,
  };
}
