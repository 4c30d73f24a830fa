/**
 * The headline outcome's numbers in one line, for the summary pinned under the header in
 * narrow windows, where the full results sit below the editor: how many people of so many
 * have the outcome with each option, counted as the tables count them.
 */
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { WordsDenominator } from '../../core/types.ts';

export interface HeadlineSummary {
  readonly outcome: string;
  /** Out of how many people (the words' and tables' denominator). */
  readonly per: WordsDenominator;
  readonly options: readonly { readonly optionId: string; readonly name: string; readonly people: number }[];
}

/** The headline outcome's people per option, or null when there are no results. */
export function headlineSummary(result: TopicResult | null): HeadlineSummary | null {
  if (result === null) return null;
  const outcome = result.outcomes.find((found) => found.isHeadline) ?? result.outcomes[0];
  if (outcome === undefined) return null;
  return {
    outcome: outcome.name,
    per: result.wordsDenominator,
    options: outcome.options.map((option) => ({
      optionId: option.optionId,
      name: option.name,
      people: option.isComparison ? option.wordsPeople.comparison : option.wordsPeople.intervention,
    })),
  };
}
