import { fail } from './problems.ts';

const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * Read a plain decimal number as typed by a person: "0.75", "-2", ".5", "1e-3".
 * A typographic minus (−) is accepted. Anything else, or a non-finite value, is refused.
 *
 * @throws InputError `number-unparsable`
 * @example parseNumber('−0.05', '--ci') // => -0.05
 */
export function parseNumber(input: string, field: string): number {
  const cleaned = input.trim().replace(/^\u2212/, '-');
  if (!DECIMAL.test(cleaned)) fail('number-unparsable', field, { input });
  const value = Number(cleaned);
  if (!Number.isFinite(value)) fail('number-out-of-reach', field, { input: input.trim(), size: 'large' });
  // "1e-400" reads as 0: refuse it rather than compute with a number other than the one typed.
  const mantissa = cleaned.replace(/e.*$/i, '');
  if (value === 0 && /[1-9]/.test(mantissa)) fail('number-out-of-reach', field, { input: input.trim(), size: 'small' });
  return value;
}
