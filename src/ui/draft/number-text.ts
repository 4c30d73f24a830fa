/**
 * A number as an editor shows it: at most 12 significant digits (so 0.03 × 100 reads "3",
 * not "3.0000000000000004") and never in exponent form.
 *
 * @example numberText(0.1 + 0.2) // => "0.3"
 */

/** Plain digits for magnitudes JavaScript would write in exponent form (made once: formatters are costly to make). */
const PLAIN_DIGITS = new Intl.NumberFormat('en-US', { useGrouping: false, maximumSignificantDigits: 12 });

export function numberText(value: number): string {
  if (!Number.isFinite(value)) return '';
  const rounded = Number(value.toPrecision(12));
  if (rounded === 0) return '0';
  const magnitude = Math.abs(rounded);
  // Between 1e-6 and 1e21 JavaScript's own shortest form has no exponent, and with at most
  // 12 significant digits it is exactly what the formatter writes, at a fraction of the cost.
  if (magnitude >= 1e-6 && magnitude < 1e21) return String(rounded);
  return PLAIN_DIGITS.format(rounded);
}
