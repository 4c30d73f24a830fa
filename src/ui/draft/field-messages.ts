/**
 * The sentences the editor shows beside its fields. Most are the core's own; those worded
 * for the command line ("for example 0.6,0.9", "write events/total", a period in years
 * when the person typed weeks) are said here in the editor's terms: its boxes, its units,
 * and the numbers exactly as they were typed.
 */
import { describeProblem } from '../../core/messages/describe.ts';
import type { Problem } from '../../core/problems.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import { EFFECT_MEASURES } from '../../core/effect-measures.ts';
import { TOPIC_LIMITS } from '../../core/topic/topic.ts';
import { effectOptionIds } from './topic-from-draft.ts';
import type { DraftMeasure, EffectDraft, TopicDraft } from './topic-draft.ts';

/** Two limits of the measure, as an example of a whole interval (from the registry of measures). */
function intervalExample(measure: DraftMeasure): string {
  const { lower, upper } = EFFECT_MEASURES[measure === 'counts' ? 'rr' : measure].example;
  return `${lower} and ${upper}`;
}

/** The effect a core field path belongs to: "outcomes.0.effects.1.effect.interval" → its draft and the rest. */
function effectAt(path: string, draft: TopicDraft): { effect: EffectDraft; rest: string } | null {
  const found = /^outcomes\.(\d+)\.effects\.(\d+)\.(.+)$/.exec(path);
  if (found === null) return null;
  const outcome = draft.outcomes[Number(found[1])];
  const optionId = effectOptionIds(draft)[Number(found[2])];
  const effect = outcome?.effects.find((candidate) => candidate.optionId === optionId);
  return effect === undefined ? null : { effect, rest: found[3] ?? '' };
}

/** The period a core field path names, as typed and in its unit. */
function periodAt(path: string, draft: TopicDraft): { typed: string; unit: TimeUnit } | null {
  if (path === 'periodYears') return { typed: draft.periodYears.trim(), unit: draft.periodUnit };
  const baseline = /^outcomes\.(\d+)\.baseline\.periodYears$/.exec(path);
  if (baseline !== null) {
    const outcome = draft.outcomes[Number(baseline[1])];
    return outcome === undefined ? null : { typed: outcome.baselinePeriodYears.trim(), unit: outcome.baselinePeriodUnit };
  }
  const place = effectAt(path, draft);
  if (place === null || place.rest !== 'followUpYears') return null;
  return { typed: place.effect.followUpYears.trim(), unit: place.effect.followUpUnit };
}

function intervalMessage(found: Problem, effect: EffectDraft): string | null {
  const lower = effect.lower.trim();
  const upper = effect.upper.trim();
  switch (found.code) {
    case 'interval-incomplete':
      return `The interval needs both limits: fill in both boxes, for example ${intervalExample(effect.measure)}, or leave both empty.`;
    case 'interval-reversed':
      return `The limits are the wrong way round: the lower limit, ${lower}, is above the upper limit, ${upper}. Put ${upper} in the lower box (the first) and ${lower} in the upper box (the second).`;
    case 'interval-excludes-estimate':
      return `The interval ${lower} to ${upper} does not contain the estimate ${effect.estimate.trim()}. The estimate lies between the lower and the upper limit: check all three numbers.`;
    default:
      return null;
  }
}

function armMessage(found: Problem, effect: EffectDraft, arm: 'intervention' | 'comparison'): string | null {
  const events = (arm === 'intervention' ? effect.interventionEvents : effect.comparisonEvents).trim();
  const total = (arm === 'intervention' ? effect.interventionTotal : effect.comparisonTotal).trim();
  const typed = `${events} of ${total}`;
  switch (found.code) {
    case 'counts-events-above-total':
      return `More people had the outcome (${events}) than were in the arm (${total}). Put the people with the outcome in the first box and everyone in the arm in the second, for example 12 of 100.`;
    case 'counts-not-whole':
      return `“${typed}” are not whole numbers of people. Write a whole number in each box, for example 12 of 100.`;
    case 'counts-negative':
      return `“${typed}” has a number below 0. Counts of people start at 0.`;
    case 'counts-total-zero':
      return 'The arm has no people: write at least 1 in the box for the people in the arm.';
    case 'counts-too-large':
      return `“${typed}” is more people than Chancewise counts in one arm (at most 1,000,000,000). Check the counts.`;
    default:
      return null;
  }
}

function periodMessage(found: Problem, period: { typed: string; unit: TimeUnit }): string | null {
  switch (found.code) {
    case 'period-not-positive':
      return `A period of “${period.typed}” ${period.unit} is not possible. Write a period longer than 0, for example 10 years.`;
    case 'period-too-long':
      return `A period of “${period.typed}” ${period.unit} is too long: write at most ${TOPIC_LIMITS.maxPeriodYears} years.`;
    default:
      return null;
  }
}

/**
 * The sentence for a problem as the editor shows it: in the editor's own words where the
 * core's are the command line's, with the numbers as typed; the core's sentence otherwise.
 */
export function fieldMessage(found: Problem, draft: TopicDraft): string {
  if (found.code === 'topic-language-unsupported' && found.field === 'language') {
    return `Chancewise cannot write patient wording in “${draft.language.trim()}”. Choose English or Español as the language the patient reads; nothing else you typed changes.`;
  }
  const place = effectAt(found.field, draft);
  if (place !== null && place.rest === 'effect.interval') return intervalMessage(found, place.effect) ?? describeProblem(found);
  const arm = place === null ? null : /^effect\.(intervention|comparison)$/.exec(place.rest);
  if (place !== null && arm !== null) {
    return armMessage(found, place.effect, arm[1] as 'intervention' | 'comparison') ?? describeProblem(found);
  }
  const period = periodAt(found.field, draft);
  if (period !== null) return periodMessage(found, period) ?? describeProblem(found);
  return describeProblem(found);
}
