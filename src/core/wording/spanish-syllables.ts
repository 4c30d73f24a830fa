/**
 * A Spanish syllable counter for readability scores, by the orthographic rules of Spanish
 * syllables (RAE & ASALE 2010, Ortografía de la lengua española, on diphthongs, triphthongs and
 * hiatus; section from memory): each syllable has one vowel nucleus; a strong vowel (a, e, o)
 * with an unstressed weak one (i, u, ü), or two different weak vowels, make one diphthong
 * (three vowels, a triphthong); two strong vowels, two equal vowels, or a weak vowel with a
 * written accent (í, ú) beside a strong one are a hiatus, two syllables. The u of "que, qui,
 * gue, gui" is silent; y is a vowel when no vowel follows it ("muy", "y"); an h between vowels
 * does not break a diphthong ("prohibir", RAE & ASALE 2010, from memory). Numerals are read as
 * Spanish number words (`spanish-number-words.ts`).
 */
import { spanishNumberWords } from './spanish-number-words.ts';

const STRONG = new Set([...'aeoáéó']);
const WEAK = new Set([...'iuü']);
const ACCENTED_WEAK = new Set([...'íú']);
const isVowel = (letter: string): boolean => STRONG.has(letter) || WEAK.has(letter) || ACCENTED_WEAK.has(letter);

/** Whether two vowels side by side belong to two syllables. */
function hiatus(first: string, second: string): boolean {
  if (first === second) return true;
  if (STRONG.has(first) && STRONG.has(second)) return true;
  const accentedBesideStrong =
    (ACCENTED_WEAK.has(first) && STRONG.has(second)) || (STRONG.has(first) && ACCENTED_WEAK.has(second));
  return accentedBesideStrong;
}

/** The letters that sound as vowels, in order, with the silent u of qu/gu + e/i left out. */
function vowelLetters(word: string): string[] {
  const letters = [...word];
  const marks: (string | null)[] = letters.map((letter, index) => {
    const next = letters[index + 1] ?? '';
    if (letter === 'u' && (letters[index - 1] === 'q' || letters[index - 1] === 'g') && /[eéií]/.test(next)) return null;
    if (letter === 'y') return isVowel(next) ? null : 'i';
    return isVowel(letter) ? letter : null;
  });
  // Runs of vowels, an h between two vowels kept transparent.
  const out: string[] = [];
  marks.forEach((mark, index) => {
    if (mark !== null) out.push(mark);
    else if (letters[index] === 'h' && marks[index - 1] !== null && marks[index + 1] !== null && index > 0) out.push('');
    else out.push('|');
  });
  return out;
}

/** Syllables of one run of letters. */
function letterSyllables(run: string): number {
  const marks = vowelLetters(run.toLowerCase());
  let count = 0;
  let previous = '|';
  for (const mark of marks) {
    if (mark === '' || mark === '|') {
      if (mark === '|') previous = '|';
      continue;
    }
    if (previous === '|' || hiatus(previous, mark)) count += 1;
    previous = mark;
  }
  return Math.max(1, count);
}

/** Spanish names of the letters, in syllables, for capitals spelled out ("NNT": e-ne e-ne te). */
const LETTER_NAMES: Readonly<Record<string, number>> = {
  b: 1,
  c: 1,
  d: 1,
  f: 2,
  g: 1,
  h: 2,
  j: 2,
  k: 1,
  l: 2,
  m: 2,
  n: 2,
  ñ: 2,
  p: 1,
  q: 1,
  r: 2,
  s: 2,
  t: 1,
  v: 2,
  w: 4,
  x: 2,
  y: 1,
  z: 2,
};

/**
 * Syllables of one Spanish word as written: letters by the rules above, numerals as read aloud
 * in Spanish, hyphenated parts added up, short capitals without a vowel ("NNT") spelled out.
 *
 * @param word - one word; punctuation around it (¿ ¡ « » too) is ignored
 * @returns the syllable count (0 when the word has no letters or digits)
 * @example spanishSyllables('paciente') // => 3
 */
export function spanishSyllables(word: string): number {
  const parts = word
    .normalize('NFC')
    .split(/[-‐‑–—/]/)
    .filter((part) => /[\p{L}\p{N}]/u.test(part));
  if (parts.length > 1) return parts.reduce((sum, part) => sum + spanishSyllables(part), 0);
  const token = (parts[0] ?? '').replace(/^[^\p{L}\p{N}]+|[^\p{L}\p{N}%]+$/gu, '');
  if (token === '') return 0;
  const numeral = spanishNumberWords(token);
  if (numeral !== null) return numeral.reduce((sum, name) => sum + letterSyllables(name), 0);
  const runs = token.match(/\p{L}+|\d+/gu) ?? [];
  return runs.reduce((sum, run) => {
    if (/^\d+$/.test(run)) return sum + (spanishNumberWords(run) ?? []).reduce((s, name) => s + letterSyllables(name), 0);
    if (/^[A-ZÑ]{2,5}$/.test(run) && !/[AEIOU]/.test(run)) {
      return sum + [...run.toLowerCase()].reduce((s, letter) => s + (LETTER_NAMES[letter] ?? 1), 0);
    }
    return sum + letterSyllables(run);
  }, 0);
}
