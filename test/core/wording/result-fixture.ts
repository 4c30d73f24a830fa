/**
 * Hand-built computed topics for wording tests, with consistent numbers: the
 * icon-array groups follow from the two rounded counts, and the risks default to
 * count / denominator so every edge case (0 people, all people, no change,
 * increases) can be set up directly.
 */
import type { Certainty, Importance } from '../../../src/core/topic/topic.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../../../src/core/topic/topic-result.ts';
import type { Denominator } from '../../../src/core/types.ts';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import type { TopicWording } from '../../../src/core/wording/topic-wording.ts';
import type { SentenceKind, WordingSentence } from '../../../src/core/wording/wording-sentence.ts';

export interface OptionSpec {
  readonly id: string;
  readonly name: string;
  /** People with the outcome without any option (the comparison's count). */
  readonly comparison: number;
  /** People with the outcome with this option. */
  readonly intervention: number;
  readonly comparisonRisk?: number;
  readonly interventionRisk?: number | null;
  readonly range?: { readonly lower: number; readonly upper: number } | null;
  readonly relativeRisk?: number | null;
  readonly nnt?: { readonly rounded: number | null; readonly label: 'NNTB' | 'NNTH' | null };
  readonly certainty?: Certainty | null;
  readonly importance?: Importance | null;
  readonly isComparison?: boolean;
}

const point = (estimate: number) => ({ estimate, lower: null, upper: null });

/** One option's result, with groups derived from the two counts. */
export function optionFixture(spec: OptionSpec, denominator: Denominator): OptionOutcomeResult {
  const isComparison = spec.isComparison ?? false;
  const comparisonRisk = spec.comparisonRisk ?? spec.comparison / denominator;
  const interventionRisk = spec.interventionRisk === undefined ? spec.intervention / denominator : spec.interventionRisk;
  const reduction = comparisonRisk - (interventionRisk ?? comparisonRisk);
  const defaultNnt =
    Math.abs(reduction) < 1e-12
      ? { rounded: null, label: null }
      : { rounded: Math.ceil(1 / Math.abs(reduction) - 1e-9), label: reduction > 0 ? ('NNTB' as const) : ('NNTH' as const) };
  const nnt = spec.nnt ?? defaultNnt;
  const high = Math.max(spec.comparison, spec.intervention);
  const people = {
    denominator,
    comparison: spec.comparison,
    intervention: spec.intervention,
    difference: spec.comparison - spec.intervention,
    interventionRange: spec.range ?? null,
  };
  return {
    optionId: spec.id,
    name: spec.name,
    isComparison,
    level: isComparison ? null : 0.95,
    comparisonRisk: point(comparisonRisk),
    interventionRisk: (interventionRisk === null ? null : point(interventionRisk)) as OptionOutcomeResult['interventionRisk'],
    relativeRisk:
      spec.relativeRisk === undefined
        ? comparisonRisk > 0 && interventionRisk !== null
          ? point(interventionRisk / comparisonRisk)
          : null
        : spec.relativeRisk === null
          ? null
          : point(spec.relativeRisk),
    absoluteReduction: point(reduction),
    nnt: { estimate: nnt.rounded, rounded: nnt.rounded, label: nnt.label, text: '', interval: null },
    perPeople: people,
    wordsPeople: people,
    groups: {
      denominator,
      event: Math.min(spec.comparison, spec.intervention),
      prevented: Math.max(spec.comparison - spec.intervention, 0),
      caused: Math.max(spec.intervention - spec.comparison, 0),
      free: denominator - high,
    },
    notices: [],
    certainty: isComparison ? null : spec.certainty === undefined ? 'high' : spec.certainty,
    importance: isComparison ? null : spec.importance === undefined ? 'important' : spec.importance,
    source: 'Illustrative, invented for tests',
  };
}

export interface OutcomeSpec {
  readonly id?: string;
  readonly name?: string;
  readonly kind?: 'benefit' | 'harm';
  /** The event is one people want. */
  readonly wanted?: boolean;
  readonly isHeadline?: boolean;
  /** People with the outcome without any option, and its risk when not count / denominator. */
  readonly comparison: number;
  readonly comparisonRisk?: number;
  readonly options: readonly Omit<OptionSpec, 'comparison' | 'comparisonRisk'>[];
}

/** An outcome with the comparison ("no tablet") first, then the given options. */
export function outcomeFixture(spec: OutcomeSpec, denominator: Denominator): OutcomeResult {
  const comparisonRisk = spec.comparisonRisk ?? spec.comparison / denominator;
  const shared = { comparison: spec.comparison, comparisonRisk };
  return {
    outcomeId: spec.id ?? 'stroke',
    name: spec.name ?? 'a stroke',
    kind: spec.kind ?? 'benefit',
    wanted: spec.wanted ?? false,
    isHeadline: spec.isHeadline ?? true,
    baselineRisk: comparisonRisk,
    baselineSource: 'Illustrative, invented for tests',
    options: [
      optionFixture(
        {
          id: 'none',
          name: 'no tablet',
          ...shared,
          intervention: spec.comparison,
          interventionRisk: comparisonRisk,
          isComparison: true,
        },
        denominator,
      ),
      ...spec.options.map((option) => optionFixture({ ...shared, ...option }, denominator)),
    ],
  };
}

/** A computed topic around the given outcomes. */
export function topicFixture(
  outcomes: readonly OutcomeSpec[],
  settings: { readonly denominator?: Denominator; readonly periodYears?: number; readonly population?: string } = {},
): TopicResult {
  const denominator = settings.denominator ?? 100;
  return {
    title: 'Taking a tablet to lower the chance of a stroke (illustrative)',
    population: settings.population ?? 'adults aged 60 to 69 with high blood pressure',
    periodYears: settings.periodYears ?? 10,
    periodUnit: 'years',
    denominator,
    wordsDenominator: denominator,
    illustrative: true,
    outcomes: outcomes.map((outcome) => outcomeFixture(outcome, denominator)),
    notices: [],
  };
}

/** The one-option stroke topic most tests start from: 15 without, 11 with, range 9 to 13. */
export function strokeTopic(option: Partial<Omit<OptionSpec, 'comparison' | 'comparisonRisk'>> = {}): TopicResult {
  return topicFixture([
    {
      comparison: 15,
      options: [{ id: 'tablet', name: 'the tablet', intervention: 11, range: { lower: 9, upper: 13 }, ...option }],
    },
  ]);
}

/** Every number written in a text, after removing the given names (which may hold digits). */
export function numbersIn(text: string, names: readonly string[] = []): number[] {
  const stripped = names.reduce((rest, name) => rest.split(name).join(' '), text);
  return (stripped.match(/\d+(?:\.\d+)?/g) ?? []).map(Number);
}

/** Every "1 in N" written in a text, as the N. */
export function oneInDenominators(text: string): number[] {
  return [...text.matchAll(/(?<![\d.])1 in (\d+)/g)].map((match) => Number(match[1]));
}

/** The sentences about one option (by id) of one outcome (the first unless named). */
export function sentencesOf(wording: TopicWording, optionId: string, outcomeId?: string): readonly WordingSentence[] {
  const outcome = outcomeId === undefined ? wording.outcomes[0] : wording.outcomes.find((found) => found.outcomeId === outcomeId);
  const option = outcome?.options.find((found) => found.optionId === optionId);
  if (option === undefined) throw new Error(`no option ${optionId} in outcome ${outcomeId ?? '(first)'}`);
  return option.sentences;
}

/** The one sentence of a kind about an option, or undefined. */
export function sentenceOf(
  result: TopicResult,
  kind: SentenceKind,
  optionId = 'tablet',
  outcomeId?: string,
): WordingSentence | undefined {
  return sentencesOf(topicWording(result), optionId, outcomeId).find((found) => found.kind === kind);
}
