import { roundedDecimal } from '../rounded-decimal.ts';

/** A coordinate as short, deterministic text: rounded to `digits` decimals, no "-0". */
export function svgNumber(value: number, digits = 2): string {
  return roundedDecimal(value, digits);
}
