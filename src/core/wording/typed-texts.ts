/**
 * The texts of a topic that the clinician typed and the handout prints as running text (the
 * title, who the numbers are for, the questions), named for a warning that says which one it is.
 */
import type { Topic } from '../topic/topic.ts';
import type { Notice } from '../types.ts';
import type { UserText } from './readability.ts';
import { type ReadingLanguage, readingWarningsFor } from './reading-scale.ts';

/** What a reading warning calls each typed text: "The text in the title reads at about grade …". */
export interface TypedTextNames {
  readonly title: string;
  readonly population: string;
  /** The question at `number` (from 1). */
  readonly question: (number: number) => string;
}

/** The names the handout's warnings use, as the sheet prints the texts. */
export const HANDOUT_TEXT_NAMES: TypedTextNames = {
  title: 'the title',
  population: 'the population (who the numbers are for)',
  question: (number) => `question ${number}`,
};

/**
 * The typed texts of a topic (or of anything holding the same three fields, as the editor's
 * draft does), each named; empty ones are left out.
 */
export function typedTexts(
  source: Pick<Topic, 'title' | 'population' | 'questions'>,
  names: TypedTextNames = HANDOUT_TEXT_NAMES,
): UserText[] {
  const texts: UserText[] = [
    { field: names.title, text: source.title },
    { field: names.population, text: source.population },
    ...source.questions.map((text, index) => ({ field: names.question(index + 1), text })),
  ];
  return texts.filter((item) => item.text.trim() !== '');
}

/**
 * A reading notice for each typed text of `topic` that misses the handout's target on the scale
 * of the topic's language: `reading-grade-high` above `READING_GRADE_LIMIT` for English,
 * `reading-ease-low` below `INFLESZ_TARGET` for Spanish. It warns and never refuses.
 *
 * @example typedTextWarnings(topic)[0]?.values.field // => 'the title'
 */
export function typedTextWarnings(
  topic: Pick<Topic, 'title' | 'population' | 'questions'>,
  language: ReadingLanguage = 'en',
): readonly Notice[] {
  return readingWarningsFor(typedTexts(topic), language);
}
