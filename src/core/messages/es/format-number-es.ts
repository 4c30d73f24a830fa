/**
 * Spanish number formatting for patient wording. The decimal sign is a comma ("2,5"), as the
 * issue that asked for Spanish wording fixes and as used in Spain and most of Latin America.
 * Digits are grouped in threes with a non-breaking space (U+00A0) from five digits up, and a
 * four-digit number is written solid ("1000", "10 000"): RAE & ASALE 2010, Ortografía de la
 * lengua española, chapter on numerals (from memory), which follows the SI Brochure (BIPM 2019,
 * 9th edition, §5.4.4) in refusing the point or comma as a thousands separator. The per cent
 * sign follows its number after a non-breaking space ("15 %"), as the same Ortografía asks.
 */
import { formatDecimal, formatSignificant } from '../format-number.ts';

/** The space between groups of digits and before "%": it never breaks a line. */
export const NUMBER_SPACE = '\u00a0';

/** A whole number, grouped from 10 000 up: 1000 → "1000", 10000 → "10 000" (with U+00A0). */
export function formatCountEs(value: number): string {
  const whole = String(Math.round(value));
  if (Math.abs(value) < 10000) return whole;
  return whole.replace(/\B(?=(\d{3})+(?!\d))/g, NUMBER_SPACE);
}

/** A number with up to `digits` decimals and a decimal comma, trailing zeros dropped: 2.50 → "2,5". */
export function formatDecimalEs(value: number, digits = 4): string {
  return withComma(formatDecimal(value, digits));
}

/** `formatSignificant` with a decimal comma: 0.02 → "0,02". */
export function formatSignificantEs(value: number, digits = 1): string {
  return withComma(formatSignificant(value, digits));
}

/** A proportion as a percentage with a decimal comma and a non-breaking space: 0.155 → "15,5 %". */
export function formatPercentEs(proportion: number, digits = 2): string {
  return `${formatDecimalEs(proportion * 100, digits)}${NUMBER_SPACE}%`;
}

/** `formatPercentSignificant` in Spanish: 0.001 → "0,1 %". */
export function formatPercentSignificantEs(proportion: number, digits = 1): string {
  return `${formatSignificantEs(proportion * 100, digits)}${NUMBER_SPACE}%`;
}

/** The integer part grouped as a count, the decimal point turned into a comma. */
function withComma(text: string): string {
  const [whole = '', decimals] = text.split('.');
  const sign = whole.startsWith('-') ? '-' : '';
  const digits = sign === '' ? whole : whole.slice(1);
  const grouped = /^\d+$/.test(digits) ? formatCountEs(Number(digits)) : digits;
  return `${sign}${grouped}${decimals === undefined ? '' : `,${decimals}`}`;
}
