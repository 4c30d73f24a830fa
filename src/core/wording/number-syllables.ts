/**
 * Syllables of a number as read aloud in English, so "15 in 100" scores like
 * "fifteen in one hundred". Whole numbers are read as cardinals without "and"
 * ("one hundred five"), decimals digit by digit after "point", a trailing "%"
 * as "percent"; thousands separators are ignored.
 */

/** zero … nineteen. */
const UNITS = [2, 1, 1, 1, 1, 1, 1, 2, 1, 1, 1, 3, 1, 2, 2, 2, 2, 3, 2, 2] as const;
/** (none), (ten), twenty … ninety. */
const TENS = [0, 1, 2, 2, 2, 2, 2, 3, 2, 2] as const;
/** hundred; thousand, million, billion, trillion, quadrillion. */
const HUNDRED = 2;
const SCALES = [0, 2, 2, 2, 2, 4] as const;

const unit = (digit: number): number => UNITS[digit] ?? 0;

function belowHundred(value: number): number {
  if (value < 20) return unit(value);
  const ones = value % 10;
  return (TENS[Math.floor(value / 10)] ?? 0) + (ones === 0 ? 0 : unit(ones));
}

function belowThousand(value: number): number {
  const hundreds = Math.floor(value / 100);
  const rest = value % 100;
  return (hundreds === 0 ? 0 : unit(hundreds) + HUNDRED) + (rest === 0 ? 0 : belowHundred(rest));
}

const digitByDigit = (digits: string): number => [...digits].reduce((sum, digit) => sum + unit(Number(digit)), 0);

/** Syllables of a run of digits read as a whole number; past the named scales, digit by digit. */
function wholeNumber(digits: string): number {
  const trimmed = digits.replace(/^0+(?=\d)/, '');
  if (/^0+$/.test(trimmed)) return unit(0);
  const groups: number[] = [];
  for (let end = trimmed.length; end > 0; end -= 3) groups.unshift(Number(trimmed.slice(Math.max(0, end - 3), end)));
  if (groups.length > SCALES.length) return digitByDigit(trimmed);
  return groups.reduce((sum, group, index) => {
    if (group === 0) return sum;
    return sum + belowThousand(group) + (SCALES[groups.length - 1 - index] ?? 0);
  }, 0);
}

/**
 * Syllables of a numeral as read aloud in English.
 *
 * @param numeral - digits with optional thousands commas, a decimal point and a trailing "%"
 * @returns the syllable count, or null when the text is not a numeral
 * @example numberSyllables('100') // => 3
 * @example numberSyllables('2.5') // => 3
 */
export function numberSyllables(numeral: string): number | null {
  const match = /^(\d{1,3}(?:,\d{3})+|\d*)(?:\.(\d+))?(%?)$/.exec(numeral);
  if (match === null) return null;
  const [, whole = '', fraction, percent] = match;
  if (whole === '' && fraction === undefined) return null;
  const wholePart = whole === '' ? 0 : wholeNumber(whole.replace(/,/g, ''));
  const fractionPart = fraction === undefined ? 0 : 1 + digitByDigit(fraction);
  return wholePart + fractionPart + (percent === '%' ? 2 : 0);
}
