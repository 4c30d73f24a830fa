/**
 * A copy of a topic to be written in another language: the same numbers, options, outcomes,
 * effects and choices, the patient language changed, and every typed text kept as it was and
 * marked as still to translate (`translation.sourceTexts`), so the numbers stay readable while
 * the clinician rewrites the words. The topic it was copied from is not changed.
 */
import type { TopicTranslation } from '../../core/topic/topic.ts';
import { translatableTexts } from './translation-texts.ts';
import type { TopicDraft } from './topic-draft.ts';

/** The language a draft is written in: its tag, or English when it names none. */
const languageOf = (draft: TopicDraft): string => (draft.language.trim() === '' ? 'en' : draft.language.trim());

/**
 * The copy of a draft in another language (a BCP 47 tag, "es").
 *
 * @example translatedCopy(englishDraft, 'es').translation // => { from: 'en', sourceTexts: { title: '…', … } }
 */
export function translatedCopy(draft: TopicDraft, language: string): TopicDraft {
  const translation: TopicTranslation = {
    from: languageOf(draft),
    sourceTexts: Object.fromEntries(translatableTexts(draft).map((entry) => [entry.key, entry.text])),
  };
  return { ...draft, language, translation };
}
