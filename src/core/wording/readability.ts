/**
 * Readability of plain-language text by the Flesch Reading Ease and
 * Flesch–Kincaid Grade Level formulas (Flesch 1948; Kincaid et al. 1975), and
 * warnings for clinician-typed text above the grade the handout aims at.
 */
import type { Notice } from '../types.ts';
import { countSyllables } from './count-syllables.ts';
import { splitSentences, splitWords } from './split-text.ts';

/** The counts the formulas read. */
export interface TextCounts {
  readonly sentences: number;
  readonly words: number;
  readonly syllables: number;
}

/** Counts and scores of one text; scores are null when there is no word to score. */
export interface Readability extends TextCounts {
  readonly readingEase: number | null;
  readonly grade: number | null;
}

/**
 * The highest Flesch–Kincaid grade for handout text without a warning. Plain-language advice for
 * patient materials puts the target at about grade 6 to 8, by source (common practice); the
 * warning comes above the top of that range.
 */
export const READING_GRADE_LIMIT = 8;

const scorable = (counts: TextCounts): boolean => counts.sentences > 0 && counts.words > 0;

/**
 * Flesch Reading Ease = 206.835 − 1.015 × (words / sentences) − 84.6 × (syllables / words).
 * Higher is easier; not clamped, so very short words and sentences can score above 100.
 *
 * @param counts - sentences, words and syllables
 * @returns the score, or null when there are no sentences or no words
 * @example fleschReadingEase({ sentences: 1, words: 6, syllables: 6 }) // => 116.145
 */
export function fleschReadingEase(counts: TextCounts): number | null {
  if (!scorable(counts)) return null;
  return 206.835 - 1.015 * (counts.words / counts.sentences) - 84.6 * (counts.syllables / counts.words);
}

/**
 * Flesch–Kincaid Grade Level = 0.39 × (words / sentences) + 11.8 × (syllables / words) − 15.59
 * (Kincaid et al. 1975), a US school grade; not clamped, so it can be below 0.
 *
 * @param counts - sentences, words and syllables
 * @returns the grade, or null when there are no sentences or no words
 * @example fleschKincaidGrade({ sentences: 1, words: 6, syllables: 6 }) // => -1.45
 */
export function fleschKincaidGrade(counts: TextCounts): number | null {
  if (!scorable(counts)) return null;
  return 0.39 * (counts.words / counts.sentences) + 11.8 * (counts.syllables / counts.words) - 15.59;
}

/**
 * The readability of a text: its sentences, words and syllables (see
 * `split-text.ts` and `count-syllables.ts` for how they are counted) and both scores.
 *
 * @param text - plain text
 * @returns counts and scores
 * @example readability('The cat sat on the mat.').readingEase // => 116.145
 */
export function readability(text: string): Readability {
  const words = splitWords(text);
  const counts: TextCounts = {
    sentences: splitSentences(text).length,
    words: words.length,
    syllables: words.reduce((sum, word) => sum + countSyllables(word), 0),
  };
  return { ...counts, readingEase: fleschReadingEase(counts), grade: fleschKincaidGrade(counts) };
}

/** A piece of text the clinician typed, and the field it belongs to. */
export interface UserText {
  readonly field: string;
  readonly text: string;
}

/**
 * A `reading-grade-high` warning for every clinician-typed text whose
 * Flesch–Kincaid grade, to one decimal, is above `limit`. It warns and does not block.
 *
 * @param texts - the clinician's texts with their fields
 * @param limit - the highest grade without a warning
 * @returns one notice per text above the limit, in input order
 * @example readingWarnings([{ field: 'title', text: 'The cat sat on the mat.' }]) // => []
 */
export function readingWarnings(texts: readonly UserText[], limit: number = READING_GRADE_LIMIT): readonly Notice[] {
  return texts.flatMap(({ field, text }) => {
    const { grade } = readability(text);
    // Judged on the grade as the warning shows it (one decimal), so no warning reads "grade 8, above grade 8".
    const shown = grade === null ? null : Math.round(grade * 10) / 10;
    return shown !== null && shown > limit ? [{ code: 'reading-grade-high', values: { field, grade, limit } }] : [];
  });
}
