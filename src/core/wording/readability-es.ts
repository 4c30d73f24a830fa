/**
 * Readability of Spanish text: the Szigriszt-Pazos perspicuity index (Szigriszt Pazos 1993,
 * Sistemas predictivos de legibilidad del mensaje escrito: fórmula de perspicuidad, doctoral
 * thesis, Universidad Complutense de Madrid), read on the INFLESZ scale (Barrio-Cantalejo IM,
 * Simón-Lorda P, Melguizo M, Escalona I, Marijuán MI, Hernando P. Validación de la Escala INFLESZ
 * para evaluar la legibilidad de los textos dirigidos a pacientes. An Sist Sanit Navar
 * 2008;31(2):135–152), and Fernández Huerta's readability (Fernández Huerta 1959, Medidas
 * sencillas de lecturabilidad, Consigna 214:29–32) in its corrected form.
 */
import type { TextCounts } from './readability.ts';
import { splitSentences, splitWords } from './split-text.ts';
import { spanishSyllables } from './spanish-syllables.ts';

const scorable = (counts: TextCounts): boolean => counts.sentences > 0 && counts.words > 0;

/**
 * Szigriszt-Pazos perspicuity (the IFSZ of the INFLESZ scale) =
 * 206.835 − 62.3 × (syllables / words) − (words / sentences). Higher is easier; not clamped.
 *
 * @returns the score, or null when there are no sentences or no words
 * @example szigrisztPerspicuity({ sentences: 1, words: 10, syllables: 20 }) // => 74.235
 */
export function szigrisztPerspicuity(counts: TextCounts): number | null {
  if (!scorable(counts)) return null;
  return 206.835 - 62.3 * (counts.syllables / counts.words) - counts.words / counts.sentences;
}

/**
 * Fernández Huerta's readability L = 206.84 − 0.60 × P − 1.02 × F with P the syllables per
 * 100 words and F the mean words per sentence. The form often quoted takes F as sentences per
 * 100 words, which makes shorter sentences score harder; that reading is a copying
 * error (Law G. Error in the Fernandez Huerta readability formula. LINGUIST List 22.2332,
 * 2011), and the form here is the one that keeps Flesch's structure, which the formula adapts.
 *
 * @returns the score, or null when there are no sentences or no words
 * @example fernandezHuertaReadability({ sentences: 1, words: 10, syllables: 20 }) // => 76.44
 */
export function fernandezHuertaReadability(counts: TextCounts): number | null {
  if (!scorable(counts)) return null;
  return 206.84 - 0.6 * ((100 * counts.syllables) / counts.words) - 1.02 * (counts.words / counts.sentences);
}

/** The INFLESZ bands (Barrio-Cantalejo et al. 2008), from hardest to easiest. */
export type InfleszBand = 'very-difficult' | 'somewhat-difficult' | 'normal' | 'fairly-easy' | 'very-easy';

/**
 * The INFLESZ band of a score: below 40 very difficult ("muy difícil"), 40 to 55 somewhat
 * difficult ("algo difícil"), 55 to 65 normal, 65 to 80 fairly easy ("bastante fácil"), above 80
 * very easy ("muy fácil"). The published ranges share their ends; here each end belongs to the
 * band above it except 80, which the scale puts in "bastante fácil" (">80 muy fácil").
 *
 * @example infleszBand(62) // => 'normal'
 */
export function infleszBand(score: number): InfleszBand {
  if (score < 40) return 'very-difficult';
  if (score < 55) return 'somewhat-difficult';
  if (score < 65) return 'normal';
  if (score <= 80) return 'fairly-easy';
  return 'very-easy';
}

/**
 * The lowest INFLESZ score for patient material without a warning: 55, the lower end of
 * "normal", which Barrio-Cantalejo et al. (2008) give as the level texts for patients should
 * reach (from memory).
 */
export const INFLESZ_TARGET = 55;

/** Abbreviations whose full stop does not end a Spanish sentence (common practice). */
export const SPANISH_ABBREVIATIONS: ReadonlySet<string> = new Set([
  'dr',
  'dra',
  'sr',
  'sra',
  'srta',
  'ud',
  'uds',
  'ej',
  'aprox',
  'vs',
  'núm',
  'pág',
  'cf',
]);

/**
 * Spanish numbers as single words before splitting: groups of three digits after a no-break or
 * thin space ("10 000") join their number, and a percent sign after a space ("15 %", as the
 * RAE writes it) joins the number before it.
 */
const joinNumbers = (text: string): string =>
  text.replace(/(\d)[\u00a0\u202f\u2009](?=\d{3}(?!\d))/g, '$1').replace(/(\d)[\s\u00a0\u202f]%/g, '$1%');

/** The words of a Spanish text, numbers kept whole. */
export const splitSpanishWords = (text: string): readonly string[] => splitWords(joinNumbers(text));

/** The sentences of a Spanish text. */
export const splitSpanishSentences = (text: string): readonly string[] => splitSentences(text, SPANISH_ABBREVIATIONS);

/** Counts and the scores of one Spanish text; scores are null when there is no word to score. */
export interface SpanishReadability extends TextCounts {
  readonly perspicuity: number | null;
  readonly fernandezHuerta: number | null;
}

/**
 * The counts of a Spanish text and both scores.
 *
 * @example spanishReadability('El gato come.').words // => 3
 */
export function spanishReadability(text: string): SpanishReadability {
  const words = splitSpanishWords(text);
  const counts: TextCounts = {
    sentences: splitSpanishSentences(text).length,
    words: words.length,
    syllables: words.reduce((sum, word) => sum + spanishSyllables(word), 0),
  };
  return { ...counts, perspicuity: szigrisztPerspicuity(counts), fernandezHuerta: fernandezHuertaReadability(counts) };
}
