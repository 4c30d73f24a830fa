/**
 * A period as the results line and the list of examples show it, in the unit it was given
 * in: "10 years", "6 months", "3 days", "1 week".
 */
import { formatDecimal } from '../../core/messages/format-number.ts';
import { amountIn } from '../../core/time-unit.ts';
import type { TimeUnit } from '../../core/time-unit.ts';

const SINGULAR: Readonly<Record<TimeUnit, string>> = { days: 'day', weeks: 'week', months: 'month', years: 'year' };

/**
 * A period stored in years, as an amount of its unit with at most two decimals.
 *
 * @example periodWords(3 / 365.25, 'days') // => "3 days"
 */
export function periodWords(years: number, unit: TimeUnit): string {
  const amount = amountIn(years, unit);
  return `${formatDecimal(amount, 2)} ${amount === 1 ? SINGULAR[unit] : unit}`;
}
