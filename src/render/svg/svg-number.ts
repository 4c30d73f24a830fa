/** A coordinate as short, deterministic text: rounded to `digits` decimals, no "-0". */
export function svgNumber(value: number, digits = 2): string {
  const scale = 10 ** digits;
  const rounded = Math.round(value * scale) / scale;
  return String(rounded === 0 ? 0 : rounded);
}
