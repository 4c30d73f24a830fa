import type { EffectComputation } from '../core/compute-effect.ts';
import type { EffectResult, TopicResult } from '../core/topic/topic-result.ts';
import type { Denominator, Estimate, PeopleCounts } from '../core/types.ts';
import { warningSentences } from './warning-sentences.ts';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Replace anything non-finite by null, so the JSON never holds Infinity or NaN. */
function finite(value: number | null | undefined): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

function estimateJson(value: Estimate | null): Json {
  if (value === null) return null;
  const estimate = finite(value.estimate);
  if (estimate === null) return null;
  return { estimate, lower: finite(value.lower), upper: finite(value.upper) };
}

/**
 * People counts at the words' denominator (100 up to 1,000,000), with the pictures' denominator
 * (100 or 1000) beside them.
 */
function peopleJson(value: PeopleCounts<number> | null, picture: Denominator | null): Json {
  if (value === null) return null;
  return {
    denominator: value.denominator,
    pictureDenominator: picture,
    comparison: value.comparison,
    intervention: value.intervention,
    difference: value.difference,
  };
}

/** The contract fields shared by a single effect and each option of a topic. */
export function effectFieldsJson(result: EffectResult, words: PeopleCounts<number> | null): { [key: string]: Json } {
  return {
    comparisonRisk: estimateJson(result.comparisonRisk),
    interventionRisk: estimateJson(result.interventionRisk),
    relativeRisk: estimateJson(result.relativeRisk),
    absoluteReduction: estimateJson(result.absoluteReduction),
    nnt: {
      estimate: finite(result.nnt.estimate),
      rounded: finite(result.nnt.rounded),
      label: result.nnt.label,
      text: result.nnt.text,
    },
    perPeople: peopleJson(words, result.perPeople?.denominator ?? null),
    level: result.level,
  };
}

/**
 * The JSON object printed by `chancewise compute` for bare effect flags or trial counts.
 * `wanted` says whether the event is one people want (`--wanted`); `absoluteReduction` and
 * `perPeople.difference` stay comparison − option either way, and `nnt.label` follows help and harm.
 */
export function effectJson(result: EffectComputation, wanted = false): Json {
  const fields: { [key: string]: Json } = { wanted, ...effectFieldsJson(result, result.wordsPeople) };
  const counts = result.counts;
  if (counts !== null) {
    Object.assign(fields, {
      oddsRatio: estimateJson(counts.oddsRatio),
      chiSquare:
        counts.chiSquare === null ? null : { statistic: finite(counts.chiSquare.statistic), p: finite(counts.chiSquare.p) },
      chiSquareYates:
        counts.chiSquareYates === null
          ? null
          : { statistic: finite(counts.chiSquareYates.statistic), p: finite(counts.chiSquareYates.p) },
      fisherExactP: finite(counts.fisherExactP),
      cramersV: finite(counts.cramersV),
    });
  }
  fields.warnings = warningSentences(result.notices);
  return fields;
}

/** The JSON object printed by `chancewise compute` for a topic. */
export function topicJson(result: TopicResult): Json {
  return {
    topic: result.title,
    illustrative: result.illustrative,
    population: result.population,
    denominator: result.wordsDenominator,
    pictureDenominator: result.denominator,
    period: result.periodYears,
    outcomes: result.outcomes.map((outcome) => ({
      name: outcome.name,
      kind: outcome.kind,
      wanted: outcome.wanted,
      headline: outcome.isHeadline,
      baselineRisk: finite(outcome.baselineRisk),
      options: outcome.options.map((option) => ({
        name: option.name,
        comparison: option.isComparison,
        ...effectFieldsJson(option, option.wordsPeople),
        groups: {
          event: option.groups.event,
          prevented: option.groups.prevented,
          caused: option.groups.caused,
          free: option.groups.free,
        },
        certainty: option.certainty,
      })),
    })),
    warnings: warningSentences(result.notices),
  };
}
