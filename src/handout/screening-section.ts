/**
 * The screening section of a sheet ("If you have the test:"): what a positive result leads to,
 * and the chances of a missed case and of overdiagnosis as people out of the sheet's words
 * denominator, rounded like every other count. Absent when the topic has no screening entries.
 */
import { parseRisk } from '../core/parse-risk.ts';
import { peopleFor } from '../core/people-counts.ts';
import type { RiskInput, Topic } from '../core/topic/topic.ts';
import { amountOf } from '../core/wording/amount-of.ts';
import type { Amount } from '../core/wording/wording-catalogue.ts';
import type { ScreeningMessages } from './messages/handout-messages.ts';

/** The section as printed: a heading and its sentences. */
export interface ScreeningSection {
  readonly heading: string;
  readonly items: readonly string[];
}

/** A chance as people out of `denominator`, or null when none was given. */
function peopleOf(chance: RiskInput | null, denominator: number, field: string): Amount | null {
  if (chance === null || (typeof chance === 'string' && chance.trim() === '')) return null;
  const risk = parseRisk(chance, field);
  return amountOf(peopleFor(risk, denominator), denominator, risk);
}

/**
 * The screening section of `topic` at the sheet's words denominator, or null when nothing of it is filled in.
 *
 * @throws InputError when a chance does not read as a risk (`validateTopic` refuses such a topic first)
 */
export function screeningSection(topic: Topic, denominator: number, messages: ScreeningMessages): ScreeningSection | null {
  const screening = topic.screening;
  if (screening === undefined) return null;
  const leadsTo = screening.positiveLeadsTo.trim();
  const missed = peopleOf(screening.missedCase, denominator, 'screening.missedCase');
  const overdiagnosed = peopleOf(screening.overdiagnosis, denominator, 'screening.overdiagnosis');
  const items = [
    ...(leadsTo === '' ? [] : [messages.positive(leadsTo)]),
    ...(missed === null ? [] : [messages.missedCase(missed, denominator)]),
    ...(overdiagnosed === null ? [] : [messages.overdiagnosis(overdiagnosed, denominator)]),
  ];
  return items.length === 0 ? null : { heading: messages.heading, items };
}
