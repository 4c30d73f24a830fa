import type { ArmCounts } from '../types.ts';
import { phiCoefficient } from './phi-coefficient.ts';

/** Cramér's V of the 2×2 table, which for two rows and two columns is |phi|. Null when a margin is 0. */
export function cramersV(intervention: ArmCounts, comparison: ArmCounts): number | null {
  const phi = phiCoefficient(intervention, comparison);
  return phi === null ? null : Math.abs(phi);
}
