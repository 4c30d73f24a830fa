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
