/**
 * An invented, illustrative topic result for the chart tests: a benefit (stroke)
 * and a harm (muscle pain) of one option against no treatment. Not real data.
 */
import { peopleGroups } from '../../src/core/people-groups.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../../src/core/topic/topic-result.ts';
import type { Denominator } from '../../src/core/types.ts';

interface ArmCounts {
  readonly comparison: number;
  readonly intervention: number;
  readonly range?: { readonly lower: number; readonly upper: number } | null;
  /** The outcome's event is one people want (default false). */
  readonly wanted?: boolean;
  /** The outcome's name in place of the fixture's. */
  readonly name?: string;
}

function option(
  id: string,
  name: string,
  isComparison: boolean,
  counts: ArmCounts,
  denominator: Denominator,
): OptionOutcomeResult {
  const intervention = isComparison ? counts.comparison : counts.intervention;
  const risk = { estimate: intervention / denominator, lower: null, upper: null };
  const people = {
    denominator,
    comparison: counts.comparison,
    intervention,
    difference: counts.comparison - intervention,
    interventionRange: isComparison ? null : (counts.range ?? null),
  };
  return {
    optionId: id,
    name,
    isComparison,
    level: isComparison ? null : 0.95,
    groups: peopleGroups(counts.comparison, intervention, denominator),
    certainty: isComparison ? null : 'moderate',
    importance: isComparison ? null : 'important',
    source: 'Invented for tests',
    comparisonRisk: { estimate: counts.comparison / denominator, lower: null, upper: null },
    interventionRisk: risk,
    relativeRisk: null,
    absoluteReduction: { estimate: (counts.comparison - intervention) / denominator, lower: null, upper: null },
    nnt: { estimate: null, rounded: null, label: null, text: '', interval: null },
    perPeople: people,
    wordsPeople: people,
    notices: [],
  };
}

function outcome(id: string, name: string, kind: 'benefit' | 'harm', counts: ArmCounts, denominator: Denominator): OutcomeResult {
  return {
    outcomeId: id,
    name: counts.name ?? name,
    kind,
    wanted: counts.wanted ?? false,
    isHeadline: kind === 'benefit',
    baselineRisk: counts.comparison / denominator,
    baselineSource: 'Invented for tests',
    options: [option('none', 'No treatment', true, counts, denominator), option('a', 'Option A', false, counts, denominator)],
  };
}

/** A topic with a stroke outcome (benefit) and a muscle-pain outcome (harm). */
export function topicFixture(
  denominator: Denominator = 100,
  stroke: ArmCounts = { comparison: 19, intervention: 15, range: { lower: 12, upper: 18 } },
  musclePain: ArmCounts = { comparison: 3, intervention: 5, range: { lower: 4, upper: 7 } },
): TopicResult {
  return {
    title: 'Taking option A to lower the chance of a stroke (illustrative)',
    population: 'people like you',
    periodYears: 10,
    periodUnit: 'years',
    wordsDenominator: denominator,
    denominator,
    illustrative: true,
    outcomes: [
      outcome('stroke', 'a stroke', 'benefit', stroke, denominator),
      outcome('muscle-pain', 'muscle pain', 'harm', musclePain, denominator),
    ],
    notices: [],
  };
}
