/**
 * A numeral as Spanish number words, for counting its syllables as read aloud (RAE & ASALE 2010,
 * Ortografía, on writing numbers in words; from memory): "15" is "quince", "100" "cien", "101"
 * "ciento uno", "1000" "mil", "21 000" "veintiún mil", "2,5" "dos coma cinco", "15 %" "quince
 * por ciento". A comma is the decimal sign; a point before groups of three digits separates
 * thousands ("1.000"), otherwise it is a decimal point read "punto".
 */

const UNITS = [
  'cero',
  'uno',
  'dos',
  'tres',
  'cuatro',
  'cinco',
  'seis',
  'siete',
  'ocho',
  'nueve',
  'diez',
  'once',
  'doce',
  'trece',
  'catorce',
  'quince',
  'dieciséis',
  'diecisiete',
  'dieciocho',
  'diecinueve',
  'veinte',
  'veintiuno',
  'veintidós',
  'veintitrés',
  'veinticuatro',
  'veinticinco',
  'veintiséis',
  'veintisiete',
  'veintiocho',
  'veintinueve',
] as const;
const TENS = ['', '', '', 'treinta', 'cuarenta', 'cincuenta', 'sesenta', 'setenta', 'ochenta', 'noventa'] as const;
const HUNDREDS = [
  '',
  'ciento',
  'doscientos',
  'trescientos',
  'cuatrocientos',
  'quinientos',
  'seiscientos',
  'setecientos',
  'ochocientos',
  'novecientos',
] as const;

function belowHundred(value: number): string[] {
  if (value < 30) return [UNITS[value] ?? ''];
  const ones = value % 10;
  const tens = TENS[Math.floor(value / 10)] ?? '';
  return ones === 0 ? [tens] : [tens, 'y', UNITS[ones] ?? ''];
}

function belowThousand(value: number): string[] {
  if (value === 100) return ['cien'];
  const hundreds = Math.floor(value / 100);
  const rest = value % 100;
  return [...(hundreds === 0 ? [] : [HUNDREDS[hundreds] ?? '']), ...(rest === 0 ? [] : belowHundred(rest))];
}

/** "uno" before "mil" or "millón" is "un" ("veintiún mil", "un millón"). */
const shortened = (words: string[]): string[] =>
  words.map((word, index) => (index === words.length - 1 ? word.replace(/uno$/, 'ún').replace(/^ún$/, 'un') : word));

const digitByDigit = (digits: string): string[] => [...digits].map((digit) => UNITS[Number(digit)] ?? '');

function wholeNumber(digits: string): string[] {
  const value = Number(digits);
  if (digits.length > 12 || !Number.isSafeInteger(value)) return digitByDigit(digits);
  if (value < 1000) return value === 0 ? ['cero'] : belowThousand(value);
  if (value < 1_000_000) {
    const thousands = Math.floor(value / 1000);
    const rest = value % 1000;
    return [...(thousands === 1 ? [] : shortened(belowThousand(thousands))), 'mil', ...(rest === 0 ? [] : belowThousand(rest))];
  }
  const millions = Math.floor(value / 1_000_000);
  const rest = value % 1_000_000;
  const head = millions === 1 ? ['un', 'millón'] : [...shortened(wholeNumber(String(millions))), 'millones'];
  return [...head, ...(rest === 0 ? [] : wholeNumber(String(rest)))];
}

/**
 * The words a Spanish reader says for a numeral.
 *
 * @param numeral - digits, optionally grouped by points or no-break spaces, a decimal comma, a trailing "%"
 * @returns the words, or null when the text is not a numeral
 * @example spanishNumberWords('2,5') // => ['dos', 'coma', 'cinco']
 */
export function spanishNumberWords(numeral: string): string[] | null {
  const match = /^(\d{1,3}(?:[.\u00a0\u202f\u2009]\d{3})+|\d*)(?:([,.])(\d+))?(\s?%)?$/.exec(numeral);
  if (match === null) return null;
  const [, whole = '', mark, fraction, percent] = match;
  if (whole === '' && fraction === undefined) return null;
  const wholeWords = whole === '' ? ['cero'] : wholeNumber(whole.replace(/\D/g, ''));
  const fractionWords =
    fraction === undefined
      ? []
      : [
          mark === ',' ? 'coma' : 'punto',
          ...digitByDigit(/^0/.exec(fraction) === null ? '' : fraction.replace(/[1-9]\d*$/, '')),
          ...(/[1-9]/.test(fraction) ? wholeNumber(fraction.replace(/^0+/, '')) : []),
        ];
  return [...wholeWords, ...fractionWords, ...(percent === undefined ? [] : ['por', 'ciento'])];
}
