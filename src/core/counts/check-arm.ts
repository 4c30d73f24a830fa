import { fail } from '../problems.ts';
import type { ArmCounts } from '../types.ts';

/** The most people one trial arm may hold: more is almost certainly a typing mistake. */
export const MAX_ARM_TOTAL = 1_000_000_000;

/**
 * Throw an InputError unless `arm` is a valid trial arm: whole counts, none negative, a total
 * of at least 1 and at most a billion, and no more events than people. `typed` is the arm as
 * the person wrote it, so that a message quotes what was typed.
 */
export function checkArm(arm: ArmCounts, field: string, typed?: string): void {
  const values = { input: typed ?? `${arm.events}/${arm.total}` };
  if (!Number.isInteger(arm.events) || !Number.isInteger(arm.total)) fail('counts-not-whole', field, values);
  if (Math.abs(arm.events) > MAX_ARM_TOTAL || Math.abs(arm.total) > MAX_ARM_TOTAL) {
    fail('counts-too-large', field, { ...values, limit: '1,000,000,000' });
  }
  if (arm.events < 0 || arm.total < 0) fail('counts-negative', field, values);
  if (arm.total === 0) fail('counts-total-zero', field, values);
  if (arm.events > arm.total) fail('counts-events-above-total', field, values);
}
