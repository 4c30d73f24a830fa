/**
 * The texts of a topic that the clinician typed and the handout prints as running text (the
 * title, who the numbers are for, the questions), named for a warning that says which one it is.
 */
import type { Topic } from '../topic/topic.ts';
import { readingWarnings } from './readability.ts';
import type { UserText } from './readability.ts';
import type { Notice } from '../types.ts';

/** The typed texts of `topic` the handout prints, each named as its warning says it; empty ones are left out. */
export function typedHandoutTexts(topic: Topic): UserText[] {
  const texts: UserText[] = [
    { field: 'the title', text: topic.title },
    { field: 'the population (who the numbers are for)', text: topic.population },
    ...topic.questions.map((text, index) => ({ field: `question ${index + 1}`, text })),
  ];
  return texts.filter((item) => item.text.trim() !== '');
}

/**
 * A `reading-grade-high` notice for each typed text of `topic` above the handout's grade target
 * (`READING_GRADE_LIMIT`): it warns and never refuses.
 *
 * @example typedTextWarnings(topic)[0]?.values.field // => 'the title'
 */
export function typedTextWarnings(topic: Topic): readonly Notice[] {
  return readingWarnings(typedHandoutTexts(topic));
}
