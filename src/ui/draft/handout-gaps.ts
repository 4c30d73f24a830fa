/**
 * What the handout would print as "not stated": the disclosures not yet given (who prepared
 * the topic, funding, interests, the review-by date) and the effects with no source. They never
 * hold back the results; the editor lists them under "still to fill in" for the handout.
 */
import type { TopicDisclosures } from '../../core/topic/topic.ts';
import { effectKey } from './field-keys.ts';
import { effectOptionIds } from './topic-from-draft.ts';
import type { TopicDraft } from './topic-draft.ts';

/** One entry the handout lacks: the field to fill in, and what it is. */
export interface HandoutGap {
  readonly key: string;
  readonly message: string;
}

/** The disclosures in the order the editor shows them, with what each is called in the list. */
const DISCLOSURES: readonly (readonly [keyof TopicDisclosures, string])[] = [
  ['preparedBy', 'Who prepared this topic'],
  ['funding', 'Who funded it'],
  ['interests', 'Interests (conflicts of interest) of those who prepared it'],
  ['reviewBy', 'The date to review it by'],
];

/**
 * Every entry the handout lacks, in the order of the fields on screen: the effects' sources
 * (of the options compared, outcome by outcome), then the disclosures.
 *
 * @example handoutGaps(blankDraft()).map((gap) => gap.key).at(-1) // => 'about.reviewBy'
 */
export function handoutGaps(draft: TopicDraft): HandoutGap[] {
  const compared = effectOptionIds(draft);
  const sources = draft.outcomes.flatMap((outcome) =>
    compared.flatMap((optionId) => {
      const effect = outcome.effects.find((entry) => entry.optionId === optionId);
      return effect === undefined || effect.source.trim() !== ''
        ? []
        : [{ key: effectKey(outcome.id, optionId, 'source'), message: 'Where the effect comes from' }];
    }),
  );
  const about = DISCLOSURES.filter(([field]) => draft.about[field].trim() === '').map(([field, message]) => ({
    key: `about.${field}`,
    message,
  }));
  return [...sources, ...about];
}
