/**
 * The reading warnings on the typed texts that the handout would print: a text that reads
 * above the target grade (or below the reading ease, for Spanish) is named in a warning.
 */
import type { Notice } from '../../core/types.ts';
import type { UserText } from '../../core/wording/readability.ts';
import { type ReadingLanguage, readingWarningsFor } from '../../core/wording/reading-scale.ts';
import { typedTexts } from '../../core/wording/typed-texts.ts';
import type { TypedTextNames } from '../../core/wording/typed-texts.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';

/** The names the results' warnings give the typed texts: the editor's own labels. */
const EDITOR_TEXT_NAMES: TypedTextNames = {
  title: 'the decision',
  population: 'who the numbers are for',
  question: (number) => `question ${number}`,
};

/** The typed texts a patient would read, named as the warning sentence says them. */
export function patientFacingTexts(draft: TopicDraft): UserText[] {
  return typedTexts(draft, EDITOR_TEXT_NAMES);
}

/**
 * The patient-facing texts of a draft as one string, equal whenever the texts are: a
 * derived value keyed on it skips the reading check when only a number was changed.
 */
export function patientTextsKey(draft: TopicDraft): string {
  return JSON.stringify(patientFacingTexts(draft));
}

/** Reading warnings for the texts a {@link patientTextsKey} holds, on the scale of the topic's language. */
export function readingNoticesFor(key: string, language: ReadingLanguage = 'en'): readonly Notice[] {
  return readingWarningsFor(JSON.parse(key) as UserText[], language);
}
