/**
 * The reading grade of what the patient reads: the plain sentences of the handout
 * (`handoutSentences` without the NNT), scored with the Flesch–Kincaid grade level.
 */
import { READING_GRADE_LIMIT, fleschKincaidGrade, readability } from '../../core/wording/readability.ts';
import type { TextCounts } from '../../core/wording/readability.ts';
import { type ReadingLanguage, type ReadingLevel, readabilityFor, readingLevelOf } from '../../core/wording/reading-scale.ts';

export interface ReadingGrade {
  /** The grade to one decimal, or null when there is no text. */
  readonly grade: number | null;
  readonly limit: number;
  readonly withinLimit: boolean;
}

/** Counts of sentences already scored: typing changes a number or two, so most sentences repeat. */
const counted = new Map<string, TextCounts>();

function countsOf(sentence: string): TextCounts {
  let found = counted.get(sentence);
  if (found === undefined) {
    const { sentences, words, syllables } = readability(sentence);
    found = { sentences, words, syllables };
    if (counted.size > 2000) counted.clear();
    counted.set(sentence, found);
  }
  return found;
}

/**
 * The Flesch–Kincaid grade of the patient's `sentences`: the counts of each added up, which
 * is the grade of the text they make together.
 */
export function patientReadingGrade(sentences: readonly string[]): ReadingGrade {
  const total = sentences.map(countsOf).reduce(
    (sum, counts) => ({
      sentences: sum.sentences + counts.sentences,
      words: sum.words + counts.words,
      syllables: sum.syllables + counts.syllables,
    }),
    { sentences: 0, words: 0, syllables: 0 },
  );
  const grade = fleschKincaidGrade(total);
  const rounded = grade === null ? null : Math.round(grade * 10) / 10;
  return { grade: rounded, limit: READING_GRADE_LIMIT, withinLimit: rounded !== null && rounded <= READING_GRADE_LIMIT };
}

/**
 * The reading level of the patient's `sentences` on the scale of their language: the
 * Flesch–Kincaid grade for English (as {@link patientReadingGrade}), the INFLESZ reading ease
 * for Spanish (see `core/wording/reading-scale.ts`).
 */
export function patientReadingLevel(sentences: readonly string[], language: ReadingLanguage): ReadingLevel {
  if (language === 'en') return readingLevelOf(patientReadingGrade(sentences).grade, 'en');
  return readabilityFor(sentences.join(' '), language);
}
