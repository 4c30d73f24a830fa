import type { TimeUnit } from '../time-unit.ts';
import type { OptionOutcomeResult, OutcomeResult } from '../topic/topic-result.ts';
import type { PeopleCounts } from '../types.ts';
import type { Amount, OptionValues, WordingMessages } from './wording-catalogue.ts';
import type { SentenceKind, WordingSentence } from './wording-sentence.ts';

/** Everything a sentence builder needs about one option and one outcome. */
export interface OptionContext {
  readonly outcome: OutcomeResult;
  readonly option: OptionOutcomeResult;
  readonly denominator: number;
  readonly years: number;
  /** The unit the topic's period was given in, for the words. */
  readonly unit: TimeUnit;
  readonly catalogue: WordingMessages;
  /** The reference-class phrase for a count of people. */
  readonly group: (count: number) => string;
}

/** The values every sentence about this option and outcome shares. */
export function optionValues(context: OptionContext): OptionValues {
  return { option: context.option.name, outcome: context.outcome.name, wanted: context.outcome.wanted };
}

/**
 * People who have the outcome with this option, at the words' denominator. Up to 1000 this is
 * the picture's `event` plus `caused`; for rare outcomes the words count per more people.
 */
export function optionCount(option: OptionOutcomeResult): number {
  return option.wordsPeople.intervention;
}

/** People who have the outcome with the comparison, at the words' denominator. */
export function comparisonCount(option: OptionOutcomeResult): number {
  return option.wordsPeople.comparison;
}

/** The unrounded risk behind `optionCount`, or null when the result has none. */
export function optionRisk(option: OptionOutcomeResult): number | null {
  const risk = option.isComparison ? option.comparisonRisk : option.interventionRisk;
  return risk === null ? null : risk.estimate;
}

/** The option's people counts at the words' denominator. */
export function peopleOf(option: OptionOutcomeResult): PeopleCounts<number> {
  return option.wordsPeople;
}

/** The numbers an amount writes: its count, plus the 1 of "fewer than 1". */
export function amountNumbers(amount: Amount, count: number): Record<string, number> {
  return amount.kind === 'fewer-than-one' ? { count, lessThan: 1 } : { count };
}

/** A sentence about one option and outcome. */
export function optionSentence(
  context: OptionContext,
  kind: SentenceKind,
  text: string,
  numbers: Record<string, number>,
  audience: WordingSentence['audience'] = 'patient',
): WordingSentence {
  return { kind, audience, outcomeId: context.outcome.outcomeId, optionId: context.option.optionId, text, numbers };
}
