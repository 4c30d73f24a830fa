import { chooseDenominators } from '../compute-effect.ts';
import type { EffectComputation } from '../compute-effect.ts';
import { numberNeeded } from '../number-needed.ts';
import { peopleGroups } from '../people-groups.ts';
import { peopleCounts } from '../people-counts.ts';
import { parseBaselineRisk } from '../parse-risk.ts';
import type { Problem } from '../problems.ts';
import type { Denominator, Estimate, Notice, WordsDenominator } from '../types.ts';

/** Notices about the denominator: made once for the whole topic, never per effect. */
const DENOMINATOR_NOTICES: ReadonlySet<string> = new Set([
  'denominator-raised',
  'rounding-moves-difference',
  'rounding-hides-difference',
  'difference-below-one-in-a-million',
]);
import type { Topic, TopicOption, TopicOutcome } from './topic.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from './topic-result.ts';
import { checkTopic, trialBaseline } from './validate-topic.ts';

/** A topic that failed validation: every problem, each with its field. */
export class TopicError extends Error {
  readonly problems: readonly Problem[];
  constructor(problems: readonly Problem[]) {
    super(`topic has ${problems.length} problem(s): ${problems.map((found) => `${found.code} at ${found.field}`).join('; ')}`);
    this.name = 'TopicError';
    this.problems = problems;
  }
}

/** The result of checking and computing a topic in one call. */
export type TopicEvaluation =
  | { readonly ok: true; readonly result: TopicResult; readonly problems: readonly [] }
  | { readonly ok: false; readonly result: null; readonly problems: readonly Problem[] };

interface Computed {
  readonly option: TopicOption;
  readonly outcome: TopicOutcome;
  readonly computation: EffectComputation;
  readonly entry: TopicOutcome['effects'][number];
}

const point = (estimate: number): Estimate => ({ estimate, lower: null, upper: null });

function baselineOf(outcome: TopicOutcome): { risk: number; fromTrial: boolean } {
  if (outcome.baseline.risk !== null) return { risk: parseBaselineRisk(outcome.baseline.risk, 'baseline'), fromTrial: false };
  const first = outcome.effects.find((entry) => entry.effect.measure === 'counts');
  const risk = first !== undefined && first.effect.measure === 'counts' ? trialBaseline(first.effect) : null;
  return { risk: risk ?? 0.5, fromTrial: true };
}

function comparisonEntry(
  option: TopicOption,
  risk: number,
  denominator: Denominator,
  words: WordsDenominator,
): OptionOutcomeResult {
  // The comparison against itself: no difference, whichever way the event points.
  const people = peopleCounts(risk, point(risk), denominator);
  return {
    optionId: option.id,
    name: option.name,
    isComparison: true,
    comparisonRisk: point(risk),
    interventionRisk: point(risk),
    relativeRisk: point(1),
    absoluteReduction: point(0),
    nnt: numberNeeded(point(0)),
    level: null,
    perPeople: people,
    wordsPeople: peopleCounts(risk, point(risk), words),
    groups: peopleGroups(people.comparison, people.intervention, denominator),
    notices: [],
    certainty: null,
    importance: null,
    source: '',
  };
}

function optionEntry(
  item: Computed,
  baselineRisk: number,
  denominator: Denominator,
  words: WordsDenominator,
): OptionOutcomeResult {
  const { computation, option, entry } = item;
  const intervention = computation.interventionRisk ?? point(baselineRisk);
  const people = peopleCounts(baselineRisk, intervention, denominator);
  return {
    optionId: option.id,
    name: option.name,
    isComparison: false,
    comparisonRisk: computation.comparisonRisk ?? point(baselineRisk),
    interventionRisk: intervention,
    relativeRisk: computation.relativeRisk,
    absoluteReduction: computation.absoluteReduction,
    nnt: computation.nnt,
    level: computation.level,
    perPeople: people,
    wordsPeople: peopleCounts(baselineRisk, intervention, words),
    groups: peopleGroups(people.comparison, people.intervention, denominator),
    notices: computation.notices.filter((found) => !DENOMINATOR_NOTICES.has(found.code)),
    certainty: entry.certainty,
    importance: entry.importance,
    source: entry.source,
  };
}

/**
 * The notices of a topic, each once. Notices that name their option and outcome are unique by
 * construction; the others repeat per effect and are kept once per code and values.
 */
function distinctNotices(notices: readonly Notice[]): Notice[] {
  const seen = new Set<string>();
  const distinct: Notice[] = [];
  for (const found of notices) {
    if (found.values.outcome !== undefined && found.values.option !== undefined) {
      distinct.push(found);
      continue;
    }
    let key = found.code;
    for (const name in found.values) key += `|${name}=${String(found.values[name])}`;
    if (seen.has(key)) continue;
    seen.add(key);
    distinct.push(found);
  }
  return distinct;
}

/**
 * Check and compute a whole topic: every option against the comparison for every outcome,
 * over the topic's one period and with one denominator. Returns every problem at once when
 * the topic is not valid.
 */
export function evaluateTopic(topic: Topic, settings: { readonly per?: WordsDenominator | null } = {}): TopicEvaluation {
  const check = checkTopic(topic);
  if (check.problems.length > 0) return { ok: false, result: null, problems: check.problems };
  const computed: Computed[] = [];
  const notices: Notice[] = [];
  const baselines = new Map<string, number>();
  const conversions = new Map<string, Notice>();
  const optionsById = new Map(topic.options.map((option) => [option.id, option]));
  for (const outcome of topic.outcomes) {
    const baseline = baselineOf(outcome);
    let converted = baseline.risk;
    for (const entry of outcome.effects) {
      const option = optionsById.get(entry.optionId);
      const computation = check.computed.get(entry);
      if (option === undefined || computation === undefined) continue;
      converted = computation.baselineUsed ?? baseline.risk;
      computed.push({ option, outcome, computation, entry });
      for (const found of computation.notices) {
        if (found.code === 'baseline-period-converted') conversions.set(outcome.id, found);
        if (found.code === 'period-beyond-followup') {
          notices.push({ code: found.code, values: { ...found.values, option: option.name, outcome: outcome.name } });
        } else if (!DENOMINATOR_NOTICES.has(found.code)) {
          notices.push(found);
        }
      }
    }
    if (baseline.fromTrial) notices.push({ code: 'counts-baseline-from-trial', values: { outcome: outcome.name } });
    baselines.set(outcome.id, converted);
  }
  const choice = chooseDenominators(
    computed.map((item) => ({
      comparison: baselines.get(item.outcome.id) ?? 0,
      intervention: item.computation.interventionRisk?.estimate ?? 0,
    })),
    settings.per ?? null,
  );
  const denominator = choice.picture;
  const words = choice.words;
  notices.push(...choice.notices);
  const byOutcome = new Map<TopicOutcome, Map<string, Computed>>();
  for (const item of computed) {
    const forOutcome = byOutcome.get(item.outcome) ?? new Map<string, Computed>();
    forOutcome.set(item.option.id, item);
    byOutcome.set(item.outcome, forOutcome);
  }
  const outcomes: OutcomeResult[] = topic.outcomes.map((outcome) => {
    const baselineRisk = baselines.get(outcome.id) ?? 0;
    return {
      outcomeId: outcome.id,
      name: outcome.name,
      kind: outcome.kind,
      wanted: outcome.wanted === true,
      isHeadline: outcome.isHeadline,
      baselineRisk,
      baselineSource: outcome.baseline.source,
      baselineConversion: conversions.get(outcome.id) ?? null,
      options: topic.options.map((option) => {
        if (option.isComparison) return comparisonEntry(option, baselineRisk, denominator, words);
        const item = byOutcome.get(outcome)?.get(option.id);
        if (item === undefined) throw new Error(`no effect for ${option.id} on ${outcome.id} after validation`);
        return optionEntry(item, baselineRisk, denominator, words);
      }),
    };
  });
  return {
    ok: true,
    problems: [],
    result: {
      title: topic.title,
      population: topic.population,
      periodYears: topic.periodYears,
      periodUnit: topic.periodUnit ?? 'years',
      denominator,
      wordsDenominator: words,
      illustrative: topic.illustrative,
      outcomes,
      notices: distinctNotices(notices),
    },
  };
}

/**
 * Compute a whole topic in one call.
 *
 * @throws TopicError with every problem when the topic is not valid
 */
export function computeTopic(topic: Topic, settings: { readonly per?: WordsDenominator | null } = {}): TopicResult {
  const evaluation = evaluateTopic(topic, settings);
  if (!evaluation.ok) throw new TopicError(evaluation.problems);
  return evaluation.result;
}
