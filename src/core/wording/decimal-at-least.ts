/**
 * Exact decimal comparison of a number with a threshold, free of binary-float
 * surprises at the boundary: the number is read as the shortest decimal that
 * round-trips to it (what JavaScript prints), the threshold as a decimal string.
 */

interface Decimal {
  readonly digits: bigint;
  readonly exponent: number;
}

function decimalOf(text: string): Decimal {
  const match = /^(-?)(\d*)(?:\.(\d*))?(?:e([+-]?\d+))?$/i.exec(text.trim());
  if (match === null) throw new RangeError(`decimalAtLeast requires a decimal, got "${text}"`);
  const [, sign = '', whole = '', fraction = '', power = '0'] = match;
  const digits = BigInt(`${sign}${whole}${fraction}` === sign ? '0' : `${sign}${whole}${fraction}`);
  return { digits, exponent: Number(power) - fraction.length };
}

/**
 * Whether `value` is at least `threshold`, compared as exact decimals.
 *
 * @param value - a finite number
 * @param threshold - a decimal written as text, for example "0.001"
 * @returns true when value ≥ threshold exactly
 * @example decimalAtLeast(0.1, '0.1') // => true
 * @example decimalAtLeast(0.0999, '0.1') // => false
 */
export function decimalAtLeast(value: number, threshold: string): boolean {
  if (!Number.isFinite(value)) throw new RangeError(`decimalAtLeast requires a finite number, got ${value}`);
  const left = decimalOf(String(value));
  const right = decimalOf(threshold);
  const exponent = Math.min(left.exponent, right.exponent);
  const scale = (found: Decimal): bigint => found.digits * 10n ** BigInt(found.exponent - exponent);
  return scale(left) >= scale(right);
}
