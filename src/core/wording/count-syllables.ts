/**
 * An English syllable counter for readability scores: vowel groups (y counts as
 * a vowel except at the start or after a vowel), with the usual adjustments for
 * silent final e, -es and -ed, syllabic -le, a few vowel pairs that are two
 * syllables (as in "Australian", "period", "usual", "medium", "client"), a few
 * compounds, and a small exceptions table. Like every such counter it is an
 * estimate; readability formulas are estimates too.
 */
import { numberSyllables } from './number-syllables.ts';

/** Words the rules get wrong, with their dictionary syllable counts (a plural "s" is looked up too). */
const EXCEPTIONS: Readonly<Record<string, number>> = {
  area: 3,
  idea: 3,
  create: 2,
  created: 3,
  react: 2,
  quiet: 2,
  diet: 2,
  science: 2,
  evening: 2,
  business: 2,
  maybe: 2,
  recipe: 3,
  video: 3,
  ratio: 3,
  soldier: 2,
  persuade: 2,
  poem: 2,
  diabetes: 4,
  element: 3,
  lifetime: 2,
  wednesday: 2,
};

/** Leading parts of compounds, with their own syllables, read before the rest of the word. */
const COMPOUND_STARTS: readonly (readonly [string, number])[] = [
  ['every', 2],
  ['any', 2],
  ['some', 1],
];

const VOWELS = new Set(['a', 'e', 'i', 'o', 'u']);

/** Which letters are vowels: a e i o u always; y unless first or after a vowel. */
function vowelMask(word: string): boolean[] {
  const mask: boolean[] = [];
  for (let index = 0; index < word.length; index += 1) {
    const letter = word.charAt(index);
    if (letter === 'y') mask.push(index > 0 && mask[index - 1] !== true);
    else mask.push(VOWELS.has(letter));
  }
  return mask;
}

const SYLLABIC_L = /[bcdfgkptz]l$/;

function ruleSyllables(word: string): number {
  const mask = vowelMask(word);
  let groups = 0;
  mask.forEach((isVowel, index) => {
    if (isVowel && mask[index - 1] !== true) groups += 1;
  });
  if (groups === 0) return 1;
  /** Whether the letter at `index` is a vowel standing alone after a consonant. */
  const ownGroup = (index: number): boolean => mask[index] === true && mask[index - 1] === false;
  const last = word.length - 1;
  let count = groups;

  if (word.endsWith('e') && ownGroup(last) && groups > 1 && !SYLLABIC_L.test(word.slice(0, -1))) count -= 1;
  if (word.endsWith('es') && ownGroup(last - 1) && groups > 1) {
    const stem = word.slice(0, -2);
    if (!/(?:[sxzcg]|ch|sh)$/.test(stem) && !SYLLABIC_L.test(stem)) count -= 1;
  }
  if (word.endsWith('ed') && ownGroup(last - 1) && groups > 1) {
    const stem = word.slice(0, -2);
    if (!/[td]$/.test(stem) && !SYLLABIC_L.test(stem)) count -= 1;
  }
  const medial = /^(.*[aeiouy](?:[^aeiouy]|[rn][cg]))e(?:ly|ments?|ful|ness|less)$/.exec(word);
  if (medial !== null && ownGroup((medial[1] ?? '').length)) count -= 1;

  count += (word.match(/(?<![cgstx])ia/g) ?? []).length;
  count += (word.match(/(?<![cgstxn]|ll)io/g) ?? []).length;
  count += (word.match(/(?<![qg])ua/g) ?? []).length;
  count += (word.match(/iu/g) ?? []).length;
  count += (word.match(/(?<![cgstn])ien[ct]/g) ?? []).length;
  if (/[^aeiouy]i(?:er|ers|est)$/.test(word) && groups > 1) count += 1;
  if (/[aeiou]ing$/.test(word) || (/ying$/.test(word) && mask[last - 3] === true)) count += 1;
  return Math.max(1, count);
}

function letterSyllables(word: string): number {
  const known = EXCEPTIONS[word] ?? (word.endsWith('s') ? EXCEPTIONS[word.slice(0, -1)] : undefined);
  if (known !== undefined) return known;
  for (const [start, syllables] of COMPOUND_STARTS) {
    if (word.length > start.length + 2 && word.startsWith(start)) return syllables + letterSyllables(word.slice(start.length));
  }
  return ruleSyllables(word);
}

/** Letters spelled out ("GP", "NNTB"): one syllable each, "w" three. */
const spelledOut = (letters: string): number => [...letters].reduce((sum, letter) => sum + (letter === 'w' ? 3 : 1), 0);

/**
 * Syllables of one English word as written: letters by the rules above, numerals
 * as read aloud, hyphenated parts added up, and short capitals without a vowel
 * ("GP", "NHS") spelled out letter by letter.
 *
 * @param word - one word; punctuation around it is ignored
 * @returns the syllable count (0 when the word has no letters or digits)
 * @example countSyllables('platypus') // => 3
 * @example countSyllables('15') // => 2
 */
export function countSyllables(word: string): number {
  // Most words are plain letters: they skip the Unicode clean-up below, whose first use
  // on a page also loads the browser's Unicode tables.
  if (PLAIN_LETTERS.test(word)) return runSyllables(word);
  const plain = NON_ASCII.test(word) ? word.normalize('NFD').replace(/[\u0300-\u036f]/g, '') : word;
  const parts = plain.split(/[-‐‑–—/]/).filter((part) => /[\p{L}\p{N}]/u.test(part));
  if (parts.length > 1) return parts.reduce((sum, part) => sum + countSyllables(part), 0);
  const token = (parts[0] ?? '').replace(/['’]/g, '').replace(/^[^\p{L}\p{N}.]+|[^\p{L}\p{N}%]+$/gu, '');
  if (token === '') return 0;
  const asNumber = numberSyllables(token);
  if (asNumber !== null) return asNumber;
  const runs = token.match(/\p{L}+|\d+/gu) ?? [];
  return runs.reduce((sum, run) => sum + (/^\d+$/.test(run) ? (numberSyllables(run) ?? 0) : runSyllables(run)), 0);
}

const PLAIN_LETTERS = /^[A-Za-z]+$/;
// eslint-disable-next-line no-control-regex -- the range is all of ASCII, control characters included
const NON_ASCII = /[^\u0000-\u007f]/;

/** Syllables of a run of letters: short capitals without a vowel spelled out, else by the rules. */
function runSyllables(run: string): number {
  if (/^[A-Z]{2,5}$/.test(run) && !/[AEIOU]/.test(run)) return spelledOut(run.toLowerCase());
  return letterSyllables(run.toLowerCase());
}
