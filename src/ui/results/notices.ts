/**
 * The warnings shown with the results: the core's notices about the numbers, and a
 * reading-grade warning for any typed text that the handout would print and that reads
 * above the target grade.
 */
import { noticeSentences } from '../../core/messages/describe.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { Notice } from '../../core/types.ts';
import { readingWarnings } from '../../core/wording/readability.ts';
import type { UserText } from '../../core/wording/readability.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';

/** The typed texts a patient would read, named as the warning sentence says them. */
export function patientFacingTexts(draft: TopicDraft): UserText[] {
  const texts: UserText[] = [
    { field: 'the decision', text: draft.title },
    { field: 'who the numbers are for', text: draft.population },
    ...draft.questions.map((text, index) => ({ field: `question ${index + 1}`, text })),
  ];
  return texts.filter((item) => item.text.trim() !== '');
}

/**
 * The patient-facing texts of a draft as one string, equal whenever the texts are: a
 * derived value keyed on it skips the reading check when only a number was changed.
 */
export function patientTextsKey(draft: TopicDraft): string {
  return JSON.stringify(patientFacingTexts(draft));
}

/** Reading warnings for the texts a {@link patientTextsKey} holds. */
export function readingNoticesFor(key: string): readonly Notice[] {
  return readingWarnings(JSON.parse(key) as UserText[]);
}

/** Every warning as a sentence, the numbers' first, then those on the typed texts, without repeats. */
export function resultWarnings(result: TopicResult, reading: readonly Notice[]): string[] {
  return noticeSentences([...result.notices, ...reading]);
}
