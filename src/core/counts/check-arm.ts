import { fail } from '../problems.ts';
import type { ArmCounts } from '../types.ts';

/**
 * Throw an InputError unless `arm` is a valid trial arm: whole (safe-integer) counts,
 * none negative, a total of at least 1 and no more events than people.
 */
export function checkArm(arm: ArmCounts, field: string): void {
  const values = { input: `${arm.events}/${arm.total}` };
  if (!Number.isSafeInteger(arm.events) || !Number.isSafeInteger(arm.total)) {
    fail('counts-not-whole', field, values);
  }
  if (arm.events < 0 || arm.total < 0) fail('counts-negative', field, values);
  if (arm.total === 0) fail('counts-total-zero', field, values);
  if (arm.events > arm.total) fail('counts-events-above-total', field, values);
}
