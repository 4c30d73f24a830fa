/**
 * The prompt under "What matters most to you", built from the topic: the headline
 * benefit against the main side effects, so the patient weighs the two in their own
 * terms (values clarification, an IPDAS dimension: Elwyn et al. 2006; Trevena et al. 2013).
 */
import type { OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import type { HandoutMessages } from './messages/handout-messages.ts';

/** How many side effects the prompt names. */
const MAIN_HARMS = 2;

/** The most extra people any option gives the side effect, at the words' denominator (0 when none adds any). */
function mostAdded(outcome: OutcomeResult): number {
  return Math.max(0, ...outcome.options.map((option) => -option.wordsPeople.difference));
}

/**
 * The main side effects: those that most add people, at most {@link MAIN_HARMS}, in the
 * topic's order when equal.
 */
export function mainHarms(result: TopicResult, headlineId: string | null = null): OutcomeResult[] {
  return result.outcomes
    .filter((outcome) => outcome.kind === 'harm' && outcome.outcomeId !== headlineId)
    .map((outcome, index) => ({ outcome, index, added: mostAdded(outcome) }))
    .sort((first, second) => second.added - first.added || first.index - second.index)
    .slice(0, MAIN_HARMS)
    .map((found) => found.outcome);
}

/**
 * The values prompt: "How much does avoiding another kidney stone matter to you, compared
 * with the chance of broken sleep?", worded for a wanted benefit ("a better chance of a
 * pain-free throat") and for a topic with no side effects.
 *
 * @param result - the computed topic
 * @param headline - the outcome the pictures lead with
 * @param messages - the handout catalogue
 */
export function valuesPrompt(result: TopicResult, headline: OutcomeResult, messages: HandoutMessages): string {
  return messages.mattersPrompt({
    benefit: headline.name.trim(),
    wanted: headline.wanted,
    harms: mainHarms(result, headline.outcomeId).map((outcome) => outcome.name.trim()),
  });
}
