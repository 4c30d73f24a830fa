/**
 * Units in which a period can be given: a topic's period, a baseline's period, a trial's
 * follow-up. Every number is computed in years; the unit is kept so that the wording says
 * the period as the clinician gave it ("by day 3", "over the next 6 months").
 */
export type TimeUnit = 'days' | 'weeks' | 'months' | 'years';

export const TIME_UNITS: readonly TimeUnit[] = ['days', 'weeks', 'months', 'years'];

/** Units in one year: a year is 365.25 days (the Julian year), a month a twelfth of a year (common practice). */
export const UNITS_PER_YEAR: Readonly<Record<TimeUnit, number>> = {
  days: 365.25,
  weeks: 365.25 / 7,
  months: 12,
  years: 1,
};

/** True for one of the four unit names. */
export function isTimeUnit(value: unknown): value is TimeUnit {
  return value === 'days' || value === 'weeks' || value === 'months' || value === 'years';
}

/**
 * An amount in a unit, as years.
 *
 * @example yearsFrom(6, 'months') // => 0.5
 */
export function yearsFrom(amount: number, unit: TimeUnit): number {
  return unit === 'years' ? amount : amount / UNITS_PER_YEAR[unit];
}

/**
 * A period in years, as an amount of a unit, with the float noise of the conversion removed
 * (12 significant figures), so that 3 days stored as years reads back as exactly 3.
 *
 * @example amountIn(yearsFrom(3, 'days'), 'days') // => 3
 */
export function amountIn(years: number, unit: TimeUnit): number {
  if (unit === 'years') return years;
  return Number((years * UNITS_PER_YEAR[unit]).toPrecision(12));
}
