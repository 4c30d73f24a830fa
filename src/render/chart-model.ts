/**
 * The chart model: everything needed to draw one outcome's people charts side by
 * side — one icon array per option, each with its title, labelled groups, range
 * sentence and layout — as plain data, with no DOM and no drawing.
 */
import { type PersonLook, lookOf } from '../core/direction.ts';
import { peopleGroups } from '../core/people-groups.ts';
import type { TimeUnit } from '../core/time-unit.ts';
import type { OptionOutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import type { Denominator, PeopleCounts, PeopleGroups, PersonGroup, WordsDenominator } from '../core/types.ts';
import { FILL_ORDER } from './fill-sequence.ts';
import { type ExactRisks, hiddenDifference } from './hidden-difference.ts';
import { type Arrangement, type IconArrayLayout, iconArrayLayout } from './icon-array-layout.ts';
import type { ArmRole, ChartMessages } from './messages/chart-messages.ts';
import { chartMessagesEn } from './messages/en.ts';
import { type RankSpan, uncertainRanks } from './uncertain-people.ts';

/** One group's label: "4 avoid a stroke because of option A". */
export interface ChartLabel {
  readonly group: PersonGroup;
  /** How the group is drawn: `lookOf(group, wanted)`. */
  readonly look: PersonLook;
  readonly count: number;
  readonly text: string;
}

/** The option's interval as people, and who it makes uncertain. */
export interface ChartRange {
  readonly lower: number;
  readonly upper: number;
  readonly text: string;
  /** Legend line for the outlined people drawn when the range is shown. */
  readonly outlineText: string;
  /** Ranks of the people whose group depends on where in the interval the truth lies. */
  readonly uncertain: RankSpan | null;
}

/** One icon array of the chart: one option. */
export interface ChartArray {
  readonly optionId: string;
  readonly name: string;
  readonly isComparison: boolean;
  readonly title: string;
  readonly groups: PeopleGroups;
  /** Labels of the groups drawn, in fill order. */
  readonly labels: readonly ChartLabel[];
  /**
   * A sentence when the picture shows the option changing no one: "the same number" only when
   * the exact difference is 0, otherwise the difference counted per more people.
   */
  readonly note: string | null;
  readonly range: ChartRange | null;
  /** The array in one sentence, with every count. */
  readonly summary: string;
  /** Layout at a cell size of 1; renderers scale it. */
  readonly layout: IconArrayLayout;
}

export interface ChartModel {
  /** Stable identifier (the outcome id, or "pair"), used to name SVG ids. */
  readonly id: string;
  readonly heading: string;
  /** Set for invented demonstration topics. */
  readonly illustrative: string | null;
  readonly outcomeName: string;
  readonly kind: 'benefit' | 'harm' | null;
  /** The event is one people want: gained people are drawn helped, people who lose it harmed. */
  readonly wanted: boolean;
  readonly denominator: Denominator;
  readonly periodYears: number | null;
  /** The unit the period was given in, for its wording. */
  readonly periodUnit: TimeUnit;
  readonly arrangement: Arrangement;
  /** Comparison first, then the options: same size, same grid. */
  readonly arrays: readonly ChartArray[];
  /** The same numbers in text: every array's summary, note and range. */
  readonly sentences: readonly string[];
  /** The text alternative of the whole chart (heading and every count). */
  readonly description: string;
}

export interface ChartOptions {
  readonly arrangement?: Arrangement;
  readonly seed?: number;
  /** Options to show besides the comparison, in order (default: every option of the topic). */
  readonly optionIds?: readonly string[];
  readonly messages?: ChartMessages;
}

/** An arm before wording: which option, its groups, and its interval as people. */
interface ArmInput {
  readonly optionId: string;
  readonly name: string;
  readonly role: ArmRole;
  readonly groups: PeopleGroups;
  readonly perPeople: PeopleCounts | null;
  /** The risks behind the counts, to tell a difference rounded away from none at all. */
  readonly risks: ExactRisks;
  /** The level of the option's interval, or null. */
  readonly level: number | null;
  /** The counts at the words' denominator (10,000 and up for rare outcomes), or null. */
  readonly wordsPeople: PeopleCounts<WordsDenominator> | null;
}

interface ChartContext {
  readonly id: string;
  readonly outcomeName: string;
  readonly kind: 'benefit' | 'harm' | null;
  readonly wanted: boolean;
  readonly denominator: Denominator;
  readonly periodYears: number | null;
  readonly periodUnit: TimeUnit;
  readonly illustrative: boolean;
  /** A bare pair, with no topic: arms are named "Without/With the option". */
  readonly bare: boolean;
}

/**
 * The chart model of one outcome of a computed topic: the comparison's array on
 * the left, then one per option, all per the topic's one denominator.
 *
 * @throws RangeError when the outcome or an option is unknown, or denominators differ
 * @example outcomeChart(result, 'stroke').arrays[1].labels[1].text // => '4 avoid a stroke because of option A'
 */
export function outcomeChart(result: TopicResult, outcomeId: string, options: ChartOptions = {}): ChartModel {
  const outcome = result.outcomes.find((candidate) => candidate.outcomeId === outcomeId);
  if (outcome === undefined) throw new RangeError(`outcomeChart requires a known outcome (got ${outcomeId})`);
  const comparison = outcome.options.find((option) => option.isComparison);
  if (comparison === undefined) throw new RangeError(`outcomeChart requires a comparison for ${outcomeId}`);
  const others = (
    options.optionIds ?? outcome.options.filter((option) => !option.isComparison).map((option) => option.optionId)
  ).map((optionId) => {
    const found = outcome.options.find((option) => option.optionId === optionId && !option.isComparison);
    if (found === undefined) throw new RangeError(`outcomeChart requires a known option (got ${optionId})`);
    return found;
  });
  const arm = (option: OptionOutcomeResult): ArmInput => ({
    optionId: option.optionId,
    name: option.name,
    role: option.isComparison ? 'comparison' : 'option',
    groups: option.groups,
    perPeople: option.perPeople,
    risks: { comparison: option.comparisonRisk.estimate, intervention: option.interventionRisk.estimate },
    level: option.isComparison ? null : option.level,
    wordsPeople: option.wordsPeople,
  });
  const context: ChartContext = {
    id: outcome.outcomeId,
    outcomeName: outcome.name,
    kind: outcome.kind,
    wanted: outcome.wanted,
    denominator: result.denominator,
    periodYears: result.periodYears,
    periodUnit: result.periodUnit,
    illustrative: result.illustrative,
    bare: false,
  };
  return buildChart([comparison, ...others].map(arm), context, options);
}

/** A comparison and one option with no topic: "Without the option" and "With the option". */
export interface PairInput {
  readonly perPeople: PeopleCounts;
  /** The comparison's and the option's risks behind the counts. */
  readonly risks: ExactRisks;
  /** The level of the option's interval (default none). */
  readonly level?: number | null;
  /** The counts at the words' denominator, when it is larger than the pictures'. */
  readonly wordsPeople?: PeopleCounts<WordsDenominator> | null;
  /** The outcome in a sentence ("a stroke"); default "the outcome". */
  readonly outcomeName?: string;
  readonly periodYears?: number | null;
  /** The unit the period was given in (default years). */
  readonly periodUnit?: TimeUnit;
  readonly kind?: 'benefit' | 'harm' | null;
  /** The event is one people want (default false). */
  readonly wanted?: boolean;
}

/**
 * The chart model of a bare pair: the comparison's and the option's people counts.
 *
 * @example pairChart({ perPeople: { denominator: 100, comparison: 20, intervention: 15, difference: 5, interventionRange: null },
 *   risks: { comparison: 0.2, intervention: 0.15 } })
 *   .arrays[1].groups // => { denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 }
 */
export function pairChart(pair: PairInput, options: ChartOptions = {}): ChartModel {
  const messages = options.messages ?? chartMessagesEn;
  const { denominator, comparison, intervention } = pair.perPeople;
  const context: ChartContext = {
    id: 'pair',
    outcomeName: pair.outcomeName ?? messages.defaultOutcome,
    kind: pair.kind ?? null,
    wanted: pair.wanted ?? false,
    denominator,
    periodYears: pair.periodYears ?? null,
    periodUnit: pair.periodUnit ?? 'years',
    illustrative: false,
    bare: true,
  };
  const arms: ArmInput[] = [
    {
      optionId: 'without',
      name: messages.pairComparisonName,
      role: 'comparison',
      groups: peopleGroups(comparison, comparison, denominator),
      perPeople: null,
      risks: { comparison: pair.risks.comparison, intervention: pair.risks.comparison },
      level: null,
      wordsPeople: null,
    },
    {
      optionId: 'with',
      name: messages.pairOptionName,
      role: 'option',
      groups: peopleGroups(comparison, intervention, denominator),
      perPeople: pair.perPeople,
      risks: pair.risks,
      level: pair.level ?? null,
      wordsPeople: pair.wordsPeople ?? null,
    },
  ];
  return buildChart(arms, context, options);
}

function buildChart(arms: readonly ArmInput[], context: ChartContext, options: ChartOptions): ChartModel {
  const messages = options.messages ?? chartMessagesEn;
  const arrangement = options.arrangement ?? 'grouped';
  const arrays = arms.map((arm) => buildArray(arm, context, messages, arrangement, options.seed));
  const heading = messages.heading(context.outcomeName, context.periodYears, context.periodUnit);
  const illustrative = context.illustrative ? messages.illustrative : null;
  const sentences = arrays
    .flatMap((array) => [array.summary, array.note, array.range?.text ?? null])
    .filter((sentence): sentence is string => sentence !== null);
  return {
    id: context.id,
    heading,
    illustrative,
    outcomeName: context.outcomeName,
    kind: context.kind,
    wanted: context.wanted,
    denominator: context.denominator,
    periodYears: context.periodYears,
    periodUnit: context.periodUnit,
    arrangement,
    arrays,
    sentences,
    description: [`${heading}.`, illustrative, ...sentences].filter((part) => part !== null).join(' '),
  };
}

function buildArray(
  arm: ArmInput,
  context: ChartContext,
  messages: ChartMessages,
  arrangement: Arrangement,
  seed: number | undefined,
): ChartArray {
  if (arm.groups.denominator !== context.denominator) {
    throw new RangeError(
      `outcomeChart requires one denominator (${arm.name} is per ${arm.groups.denominator}, not ${context.denominator})`,
    );
  }
  if (arm.role === 'comparison' && (arm.groups.prevented !== 0 || arm.groups.caused !== 0)) {
    throw new RangeError(`outcomeChart requires the comparison to have only event and free people (${arm.name})`);
  }
  const titleValues = {
    denominator: context.denominator,
    option: arm.name,
    periodYears: context.periodYears,
    periodUnit: context.periodUnit,
  };
  const title = context.bare
    ? messages.pairTitle(titleValues, arm.role)
    : arm.role === 'comparison'
      ? messages.comparisonTitle(titleValues)
      : messages.optionTitle(titleValues);
  const cause = messages.causeName(arm.name, context.bare);
  const words = context.wanted ? messages.wantedLabels : messages.labels;
  const labels = FILL_ORDER.filter((group) => arm.groups[group] > 0).map((group) => ({
    group,
    look: lookOf(group, context.wanted),
    count: arm.groups[group],
    text: words[group]({ count: arm.groups[group], outcome: context.outcomeName, option: cause, role: arm.role }),
  }));
  const interval = arm.role === 'option' ? (arm.perPeople?.interventionRange ?? null) : null;
  const range =
    interval === null || arm.perPeople === null
      ? null
      : {
          lower: interval.lower,
          upper: interval.upper,
          text: rangeText(arm, interval, context, messages, cause),
          outlineText: messages.rangeOutline(context.outcomeName, cause),
          uncertain: uncertainRanks(interval, arm.groups.event + arm.groups.caused),
        };
  return {
    optionId: arm.optionId,
    name: arm.name,
    isComparison: arm.role === 'comparison',
    title,
    groups: arm.groups,
    labels,
    note: noteOf(arm, context, messages, cause),
    range,
    summary: messages.summary(
      title,
      labels.map((label) => label.text),
    ),
    layout: iconArrayLayout(context.denominator, arm.groups, { arrangement, ...(seed === undefined ? {} : { seed }) }),
  };
}

/**
 * The sentence beside an option's picture that shows no one changed: "the same number" only
 * when the exact difference is 0; a difference rounded away is said in words, per more people.
 */
function noteOf(arm: ArmInput, context: ChartContext, messages: ChartMessages, cause: string): string | null {
  if (arm.role !== 'option' || arm.groups.prevented !== 0 || arm.groups.caused !== 0) return null;
  const hidden = hiddenDifference(arm.risks, context.denominator, arm.wordsPeople);
  if (hidden === null) return messages.noDifference(context.outcomeName, cause);
  return messages.belowOnePerson({
    outcome: context.outcomeName,
    option: cause,
    denominator: context.denominator,
    direction: hidden.direction,
    count: hidden.count,
    wordsDenominator: hidden.denominator,
  });
}

/**
 * The option's range as people, with its level; ends that show as the same count say the range
 * is less than one person, with the words' counts when they show the ends apart.
 */
function rangeText(
  arm: ArmInput,
  interval: { readonly lower: number; readonly upper: number },
  context: ChartContext,
  messages: ChartMessages,
  cause: string,
): string {
  const values = { ...interval, denominator: context.denominator, outcome: context.outcomeName, option: cause, level: arm.level };
  if (interval.lower !== interval.upper) return messages.range(values);
  const people = arm.wordsPeople;
  const counted = people === null || people.denominator <= context.denominator ? null : people.interventionRange;
  const apart = people !== null && counted !== null && counted.lower !== counted.upper;
  return messages.narrowRange({ ...values, words: apart ? { ...counted, denominator: people.denominator } : null });
}
