/**
 * What the handout would print as "not stated": the disclosures not yet given (who prepared
 * the topic, funding, interests, the review-by date) and the effects with no source. They never
 * hold back the results; the editor lists them under "still to fill in" for the handout.
 */
import type { TopicDisclosures } from '../../core/topic/topic.ts';
import { effectKey } from './field-keys.ts';
import { effectOptionIds } from './topic-from-draft.ts';
import type { TopicDraft } from './topic-draft.ts';

/** What an entry the handout lacks is: an effect's source, or one of the disclosures. */
export type HandoutGapKind = 'effect-source' | keyof TopicDisclosures;

/** One entry the handout lacks: the field to fill in, and what it is (worded by the interface's words). */
export interface HandoutGap {
  readonly key: string;
  readonly what: HandoutGapKind;
}

/** The disclosures in the order the editor shows them. */
const DISCLOSURES: readonly (keyof TopicDisclosures)[] = ['preparedBy', 'funding', 'interests', 'reviewBy'];

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
        : [{ key: effectKey(outcome.id, optionId, 'source'), what: 'effect-source' as const }];
    }),
  );
  const about = DISCLOSURES.filter((field) => draft.about[field].trim() === '').map((field) => ({
    key: `about.${field}`,
    what: field,
  }));
  return [...sources, ...about];
}
