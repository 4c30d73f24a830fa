/**
 * A number as an editor shows it: at most 12 significant digits (so 0.03 × 100 reads "3",
 * not "3.0000000000000004") and never in exponent form.
 *
 * Written without `Intl`: the first locale formatter a page makes loads the locale data,
 * which cost the app's start-up more than everything else this module does.
 *
 * @example numberText(0.1 + 0.2) // => "0.3"
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return '';
  const rounded = Number(value.toPrecision(12));
  if (rounded === 0) return '0';
  // With at most 12 significant digits, JavaScript's shortest form is exact; only its
  // exponent form (below 1e-6 and from 1e21) needs writing out.
  return withoutExponent(String(rounded));
}

/** "2.5e-9" → "0.0000000025", "1e+21" → "1000000000000000000000"; other text unchanged. */
function withoutExponent(text: string): string {
  const match = /^(-?)(\d)(?:\.(\d+))?e([+-]\d+)$/.exec(text);
  if (match === null) return text;
  const [, sign = '', lead = '', rest = '', power = '0'] = match;
  const digits = lead + rest;
  const point = 1 + Number(power);
  if (point <= 0) return `${sign}0.${'0'.repeat(-point)}${digits}`;
  return `${sign}${digits.padEnd(point, '0')}${digits.length > point ? `.${digits.slice(point)}` : ''}`;
}
