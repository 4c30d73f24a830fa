/**
 * The typed texts of a topic that a patient reads, and which of them are still to translate.
 * A copy made in another language keeps each text as it was copied (`translation.sourceTexts`,
 * keyed by the editor's field key); a text that still reads the same as its source is still
 * to translate, and leaves the list once the clinician writes it in the new language.
 * Sources of effects, names (prepared by, clinician, patient) and dates are not translated:
 * a citation is kept as published, a name and a date read the same in either language.
 */
import type { TopicDisclosures } from '../../core/topic/topic.ts';
import { optionKey, outcomeKey } from './field-keys.ts';
import type { TopicDraft } from './topic-draft.ts';

/** What a typed text is, so the editor can name it in its own words. */
export type TranslatableKind =
  | 'title'
  | 'population'
  | 'optionName'
  | 'outcomeName'
  | 'evidenceSummary'
  | 'question'
  | 'funding'
  | 'interests'
  | 'positiveLeadsTo';

/** One typed text a patient reads: its field key, what it is, and the text as typed. */
export interface TranslatableText {
  readonly key: string;
  readonly kind: TranslatableKind;
  readonly text: string;
}

const ABOUT_TEXTS: readonly (readonly [keyof TopicDisclosures, TranslatableKind])[] = [
  ['funding', 'funding'],
  ['interests', 'interests'],
];

/**
 * Every non-empty typed text a patient reads, in the order of the fields on screen.
 *
 * @example translatableTexts(draft)[0] // => { key: 'title', kind: 'title', text: 'Treating a kidney stone …' }
 */
export function translatableTexts(draft: TopicDraft): TranslatableText[] {
  const texts: TranslatableText[] = [
    { key: 'title', kind: 'title', text: draft.title },
    { key: 'population', kind: 'population', text: draft.population },
    ...draft.options.map((option) => ({ key: optionKey(option.id), kind: 'optionName' as const, text: option.name })),
    ...draft.outcomes.map((outcome) => ({
      key: outcomeKey(outcome.id, 'name'),
      kind: 'outcomeName' as const,
      text: outcome.name,
    })),
    { key: 'evidence.summary', kind: 'evidenceSummary', text: draft.evidenceSummary },
    ...draft.questions.map((question, place) => ({ key: `questions.${place}`, kind: 'question' as const, text: question })),
    ...ABOUT_TEXTS.map(([field, kind]) => ({ key: `about.${field}`, kind, text: draft.about[field] })),
    { key: 'screening.positiveLeadsTo', kind: 'positiveLeadsTo', text: draft.screening.positiveLeadsTo },
  ];
  return texts.filter((entry) => entry.text.trim() !== '');
}

/**
 * The typed texts of a copy that still read as they did when it was copied (spaces around them
 * aside); none for a topic that is not a copy. A text typed after copying has no source and is
 * taken as written in the new language.
 */
export function untranslatedTexts(draft: TopicDraft): TranslatableText[] {
  const { translation } = draft;
  if (translation === null) return [];
  return translatableTexts(draft).filter((entry) => {
    const source = translation.sourceTexts[entry.key];
    return source !== undefined && source.trim() === entry.text.trim();
  });
}
