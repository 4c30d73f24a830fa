/**
 * A number as an editor shows it: at most 12 significant digits (so 0.03 × 100 reads "3",
 * not "3.0000000000000004") and never in exponent form.
 *
 * @example numberText(0.1 + 0.2) // => "0.3"
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return '';
  const rounded = Number(value.toPrecision(12));
  if (rounded === 0) return '0';
  const plain = rounded.toLocaleString('en-US', { useGrouping: false, maximumSignificantDigits: 12 });
  return plain;
}
