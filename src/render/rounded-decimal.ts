/**
 * A number rounded to a fixed count of decimals, as the shortest text that reads back
 * as that rounded value: what `String(Math.round(value * 10 ** digits) / 10 ** digits)`
 * gives, with "-0" written "0". ECMAScript's Number-to-String gives the shortest digits
 * that round-trip (ECMA-262, Number::toString), and a whole count of hundredths has no
 * shorter such text than its own digits, so the text can be built from whole numbers,
 * which is several times faster than formatting a fraction. Drawing 2 × 1000 people
 * formats 4000 coordinates.
 */

/** Above this many ticks a whole-number split could lose exactness: format the slow way. */
const EXACT_TICKS = 2 ** 50;

/**
 * `value` rounded to `digits` decimals (half away from zero only as `Math.round` does), as text.
 *
 * @example roundedDecimal(107.024, 2) // => '107.02'
 * @example roundedDecimal(-0.004, 2) // => '0'
 */
export function roundedDecimal(value: number, digits: number): string {
  const scale = 10 ** digits;
  const ticks = Math.round(value * scale);
  if (ticks === 0) return '0';
  const size = ticks < 0 ? -ticks : ticks;
  if (!(size < EXACT_TICKS) || !Number.isInteger(digits) || digits < 0) return String(ticks / scale);
  const whole = Math.floor(size / scale);
  let fraction = size - whole * scale;
  let text = String(whole);
  if (fraction !== 0) {
    let places = digits;
    while (fraction % 10 === 0) {
      fraction /= 10;
      places -= 1;
    }
    text += `.${String(fraction).padStart(places, '0')}`;
  }
  return ticks < 0 ? `-${text}` : text;
}
