/**
 * One topic ready to present: the topic, its computed result, and the choices that
 * say what each step shows (the option against the comparison, the harm, the steps).
 */
import { describeProblem } from '../core/messages/describe.ts';
import { evaluateTopic } from '../core/topic/compute-topic.ts';
import type { Topic } from '../core/topic/topic.ts';
import type { OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import type { ItemChoices } from './teaching-set-file.ts';

export interface PresentationItem extends ItemChoices {
  readonly topic: Topic;
  readonly result: TopicResult;
  /** The option shown against the comparison. */
  readonly optionId: string;
  /**
   * The harm outcomes of the "who is harmed" step, one slide each: the harm the choices name,
   * else every harm of the topic in its order; empty when the topic has no harm.
   */
  readonly harmIds: readonly string[];
}

/** Why a topic cannot be presented with the given choices. */
export type ItemProblem =
  | { readonly kind: 'not-computed'; readonly field: string; readonly detail: string }
  | { readonly kind: 'unknown-option'; readonly value: string; readonly known: readonly string[] }
  | { readonly kind: 'comparison-option'; readonly value: string }
  | { readonly kind: 'unknown-harm'; readonly value: string; readonly known: readonly string[] };

export type ItemCheck =
  { readonly ok: true; readonly item: PresentationItem } | { readonly ok: false; readonly problem: ItemProblem };

/** The headline outcome (the first outcome when none is marked). */
export function headlineOutcome(result: TopicResult): OutcomeResult | null {
  return result.outcomes.find((outcome) => outcome.isHeadline) ?? result.outcomes[0] ?? null;
}

/** The outcome of the "who is helped" step: the headline when it is a benefit, else the first benefit. */
export function benefitOutcome(result: TopicResult): OutcomeResult | null {
  const headline = headlineOutcome(result);
  if (headline !== null && headline.kind === 'benefit') return headline;
  return result.outcomes.find((outcome) => outcome.kind === 'benefit') ?? null;
}

/** Compute a topic and check the choices against it. */
export function presentationItem(topic: Topic, choices: ItemChoices): ItemCheck {
  const evaluation = evaluateTopic(topic, { per: choices.per });
  if (!evaluation.ok) {
    const first = evaluation.problems[0];
    return {
      ok: false,
      problem: { kind: 'not-computed', field: first?.field ?? '', detail: first === undefined ? '' : describeProblem(first) },
    };
  }
  const result = evaluation.result;
  const options = topic.options.filter((option) => !option.isComparison);
  const optionId = choices.option ?? options[0]?.id ?? '';
  if (choices.option !== null) {
    if (topic.options.some((option) => option.id === optionId && option.isComparison)) {
      return { ok: false, problem: { kind: 'comparison-option', value: optionId } };
    }
    if (!options.some((option) => option.id === optionId)) {
      return { ok: false, problem: { kind: 'unknown-option', value: optionId, known: options.map((option) => option.id) } };
    }
  }
  const harms = result.outcomes.filter((outcome) => outcome.kind === 'harm').map((outcome) => outcome.outcomeId);
  if (choices.harm !== null && !harms.includes(choices.harm)) {
    return { ok: false, problem: { kind: 'unknown-harm', value: choices.harm, known: harms } };
  }
  return { ok: true, item: { ...choices, topic, result, optionId, harmIds: choices.harm === null ? harms : [choices.harm] } };
}
