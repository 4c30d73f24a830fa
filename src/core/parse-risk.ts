import { parseNumber } from './parse-number.ts';
import { fail } from './problems.ts';
import type { RiskInput } from './topic/topic.ts';

const NUMBER = String.raw`([-+\u2212]?(?:\d+(?:\.\d*)?|\.\d+))`;
const PERCENT = new RegExp(String.raw`^${NUMBER}\s*%$`);
const FRACTION = new RegExp(String.raw`^${NUMBER}\s*(?:/|\bin\b|\bper\b|\bout of\b)\s*${NUMBER}$`, 'i');
const BARE = new RegExp(String.raw`^${NUMBER}$`);

/** Read a signed risk from the forms clinicians write; the caller checks the range. */
function readRisk(input: RiskInput, field: string): number {
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) fail('risk-unparsable', field, { input: String(input) });
    if (Math.abs(input) > 1) fail('risk-ambiguous', field, { input: String(input), asProportion: String(input / 100) });
    return input;
  }
  const text = input.trim();
  if (text === '') fail('risk-empty', field);
  const percent = PERCENT.exec(text);
  if (percent !== null) return parseNumber(percent[1] ?? '', field) / 100;
  const fraction = FRACTION.exec(text);
  if (fraction !== null) {
    const top = parseNumber(fraction[1] ?? '', field);
    const bottom = parseNumber(fraction[2] ?? '', field);
    if (bottom === 0) fail('risk-denominator-zero', field, { input: text });
    if (bottom < 0) fail('risk-out-of-range', field, { input: text });
    return top / bottom;
  }
  if (BARE.test(text)) {
    const value = parseNumber(text, field);
    if (Math.abs(value) > 1) fail('risk-ambiguous', field, { input: text, asProportion: String(value / 100) });
    return value;
  }
  return fail('risk-unparsable', field, { input: text });
}

/**
 * Read a risk written as 0.2, 20%, 20/100, 1 in 5 or 200 per 1000, as a proportion in [0, 1].
 * A bare number above 1 is refused as ambiguous ("write 20% or 0.2").
 *
 * @throws InputError `risk-empty`, `risk-unparsable`, `risk-ambiguous`, `risk-denominator-zero`, `risk-out-of-range`
 * @example parseRisk('1 in 5', 'baseline') // => 0.2
 */
export function parseRisk(input: RiskInput, field: string): number {
  const value = readRisk(input, field);
  if (value < 0 || value > 1) fail('risk-out-of-range', field, { input: String(input) });
  return value;
}

/**
 * Read a signed risk (an absolute risk reduction, which may be negative) in [−1, 1].
 *
 * @example parseSignedRisk('-2%', '--arr') // => -0.02
 */
export function parseSignedRisk(input: RiskInput, field: string): number {
  const value = readRisk(input, field);
  if (value < -1 || value > 1) fail('arr-out-of-range', field, { value });
  return value;
}

/**
 * Read a patient's baseline risk, which must lie strictly between 0 and 1.
 *
 * @throws InputError as parseRisk, and `baseline-out-of-range` for 0 or 1
 * @example parseBaselineRisk('15%', 'baseline') // => 0.15
 */
export function parseBaselineRisk(input: RiskInput, field: string): number {
  const value = parseRisk(input, field);
  if (value <= 0 || value >= 1) fail('baseline-out-of-range', field, { risk: value });
  return value;
}
