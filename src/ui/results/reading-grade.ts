/**
 * The reading grade of what the patient reads: the plain sentences of the handout,
 * scored with the Flesch–Kincaid grade level.
 */
import type { TopicResult } from '../../core/topic/topic-result.ts';
import { READING_GRADE_LIMIT, readability } from '../../core/wording/readability.ts';
import { handoutSentences } from '../../core/wording/topic-wording.ts';

export interface ReadingGrade {
  /** The grade to one decimal, or null when there is no text. */
  readonly grade: number | null;
  readonly limit: number;
  readonly withinLimit: boolean;
}

/** The Flesch–Kincaid grade of the patient wording of `result`. */
export function patientReadingGrade(result: TopicResult): ReadingGrade {
  const text = handoutSentences(result, { showNnt: false })
    .map((sentence) => sentence.text)
    .join(' ');
  const { grade } = readability(text);
  const rounded = grade === null ? null : Math.round(grade * 10) / 10;
  return { grade: rounded, limit: READING_GRADE_LIMIT, withinLimit: rounded !== null && rounded <= READING_GRADE_LIMIT };
}
