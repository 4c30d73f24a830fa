import { type TimeUnit, amountIn } from '../../time-unit.ts';
import { formatDecimalEs } from './format-number-es.ts';

/** The Spanish names of the time units, singular and plural. */
export const UNIT_NAMES_ES: Readonly<Record<TimeUnit, readonly [string, string]>> = {
  days: ['día', 'días'],
  weeks: ['semana', 'semanas'],
  months: ['mes', 'meses'],
  years: ['año', 'años'],
};

/**
 * An amount of a unit in words: "3 días", "1 año", "2,5 meses". Spanish takes the plural for
 * every amount but exactly 1 ("1,5 años", "0,5 años": RAE & ASALE 2009, Nueva gramática, on the
 * agreement of decimal numerals; from memory).
 */
export function amountWithUnitEs(amount: number, unit: TimeUnit): string {
  const [one, other] = UNIT_NAMES_ES[unit];
  return `${formatDecimalEs(amount, 2)} ${amount === 1 ? one : other}`;
}

/**
 * A length of time given in years, in the unit it was given in: 10 years → "10 años",
 * 3/365.25 years in days → "3 días", 0.5 years in months → "6 meses".
 */
export function durationEs({ years, unit }: { readonly years: number; readonly unit: TimeUnit }): string {
  return amountWithUnitEs(amountIn(years, unit), unit);
}
