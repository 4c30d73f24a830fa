/**
 * The warnings shown with the results: the core's notices about the numbers, and a
 * reading-grade warning for any typed text that the handout would print and that reads
 * above the target grade.
 */
import { describeNotice } from '../../core/messages/describe.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
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

/** Every warning as a sentence, the numbers' first, without repeats. */
export function resultWarnings(result: TopicResult, draft: TopicDraft): string[] {
  const sentences = [...result.notices, ...readingWarnings(patientFacingTexts(draft))].map((notice) => describeNotice(notice));
  return [...new Set(sentences)];
}
