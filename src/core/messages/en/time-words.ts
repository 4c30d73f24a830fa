import type { TimeUnit } from '../../time-unit.ts';
import { formatDecimal } from '../format-number.ts';

/** The English names of the time units, singular and plural. */
export const UNIT_NAMES_EN: Readonly<Record<TimeUnit, readonly [string, string]>> = {
  days: ['day', 'days'],
  weeks: ['week', 'weeks'],
  months: ['month', 'months'],
  years: ['year', 'years'],
};

/** An amount of a unit in words: "3 days", "1 year", "2.5 months". */
export function amountWithUnit(amount: number, unit: TimeUnit): string {
  const [one, other] = UNIT_NAMES_EN[unit];
  return `${formatDecimal(amount, 2)} ${amount === 1 ? one : other}`;
}
