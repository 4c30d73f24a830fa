import { InputError, type Problem } from '../../../src/core/problems.ts';

/** Run `action` and return the problem of the InputError it throws; fail the test if it does not throw one. */
export function problemOf(action: () => unknown): Problem {
  try {
    action();
  } catch (error) {
    if (error instanceof InputError) return error.problem;
    throw error;
  }
  throw new Error('expected an InputError, but nothing was thrown');
}

/** Round to 4 decimals, the precision of the published tables compared against. */
export const round4 = (value: number | null): number | null => (value === null ? null : Math.round(value * 1e4) / 1e4);
