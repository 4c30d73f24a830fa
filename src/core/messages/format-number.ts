/**
 * Number formatting for messages: short, locale-free and never scientific.
 */

/** A proportion as a percentage with up to `digits` decimals, trailing zeros dropped: 0.6 → "60%". */
export function formatPercent(proportion: number, digits = 2): string {
  return `${formatDecimal(proportion * 100, digits)}%`;
}

/** A number with up to `digits` decimals, trailing zeros dropped: 0.7300 → "0.73". */
export function formatDecimal(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return String(value);
  const fixed = value.toFixed(digits);
  const trimmed = fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}

/**
 * A number written so that it keeps its meaning: a true zero is "0"; a value of 1 or more in
 * size keeps `digits` decimals (trailing zeros dropped); a smaller one keeps two significant
 * figures, so that a non-zero value never reads as 0 and a negative limit never loses its sign.
 *
 * @example formatSignificant(0.02) // => "0.02"
 * @example formatSignificant(-0.0123) // => "-0.012"
 * @example formatSignificant(12.34) // => "12.3"
 */
export function formatSignificant(value: number, digits = 1): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const size = Math.abs(value);
  if (size >= 1) return formatDecimal(value, digits);
  const decimals = Math.min(20, Math.max(digits, 1 - Math.floor(Math.log10(size))));
  const fixed = value.toFixed(decimals);
  // toFixed can round 0.0995 up to 0.10: that is still two significant figures.
  return fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
}

/** A proportion as a percentage by `formatSignificant`: 0.001 → "0.1%", 0.0000012 → "0.00012%". */
export function formatPercentSignificant(proportion: number, digits = 1): string {
  return `${formatSignificant(proportion * 100, digits)}%`;
}

/** A whole number with a comma between thousands from 10,000 up: 1000 → "1000", 10000 → "10,000". */
export function formatCount(value: number): string {
  const whole = String(Math.round(value));
  if (Math.abs(value) < 10000) return whole;
  return whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}
