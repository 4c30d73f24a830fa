/**
 * The key numbers of a computed topic as rows of text for the results table: people per
 * the topic's words denominator with each option (100 up to 1,000,000, so a rare outcome's
 * change shows as whole people), the change against the comparison with its range, the
 * absolute risk and the NNT, and the level of each range. Every number is the core's; only
 * the wording is here.
 */
import { writeNntInterval } from '../../core/nnt-interval.ts';
import { formatCount, formatPercentSignificant } from '../../core/messages/format-number.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../../core/topic/topic-result.ts';
import type { WordsDenominator } from '../../core/types.ts';
import { uiMessagesEn } from '../messages/en.ts';
import type { PeopleChangeMessages } from '../messages/ui-messages.ts';
import { levelText } from './interval-level.ts';

/** English unless the caller gives the interface's words (the results panel gives its locale's). */
const ENGLISH = uiMessagesEn.peopleChange;

/** A value and, when there is one, its range: shown as the value with the range beneath. */
export interface RangedText {
  readonly value: string;
  readonly range: string | null;
}

export interface KeyNumberRow {
  readonly optionId: string;
  readonly name: string;
  readonly isComparison: boolean;
  /** People with the outcome per the table's denominator: "11", range "10 to 12". */
  readonly people: RangedText;
  /** Against the comparison: "4 fewer", range "3 to 5 fewer"; null for the comparison. */
  readonly change: RangedText | null;
  /** The absolute risk (the chance, for a wanted event): "11.2%", range "10.2 to 12.4%". */
  readonly risk: RangedText;
  /** The core's NNT text, its interval beneath: "NNTB 27", range "NNTB 21 to 40"; null for the comparison. */
  readonly nnt: RangedText | null;
  /** The level of the row's ranges, "95%"; null when the row has no range. */
  readonly level: string | null;
}

export interface KeyNumberTable {
  readonly outcomeId: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /** The event is one people want: its column is headed "Chance", not "Risk". */
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  /** The people the counts are out of: the topic's words denominator. */
  readonly denominator: WordsDenominator;
  readonly rows: readonly KeyNumberRow[];
}

/** A change in people: the whole people shown and the exact value they round, both signed (positive: fewer). */
export interface PeopleChange {
  readonly shown: number;
  readonly exact: number;
}

type Side = 'fewer' | 'more' | 'none';

/** Below a billionth of a person, a difference is floating-point noise of an exact 0. */
const noise = (people: number): boolean => Math.abs(people) < 1e-9;

/** Which way a change goes; a change that rounds to 0 people keeps the direction of its exact value. */
function sideOf(change: PeopleChange): Side {
  const sign = change.shown !== 0 ? change.shown : noise(change.exact) ? 0 : change.exact;
  return sign > 0 ? 'fewer' : sign < 0 ? 'more' : 'none';
}

/** The size of a change: "4", "10,000", or "under 1" when it rounds to no one but is not exactly 0. */
function sizeOf(change: PeopleChange, words: PeopleChangeMessages): string {
  if (change.shown === 0) return noise(change.exact) ? '0' : words.underOne;
  return formatCount(Math.abs(change.shown));
}

const exactly = (shown: number): PeopleChange => ({ shown, exact: shown });

/**
 * A signed change in people as words: 4 → "4 fewer", −2 → "2 more", 0 → "no change". A change
 * that rounds to no one but is not exactly 0 is "under 1 fewer" or "under 1 more", never "no
 * change". The words say only how many people have the event; whether that helps is the
 * event's direction.
 */
export function changeWords(difference: number, exact: number = difference, words: PeopleChangeMessages = ENGLISH): string {
  const change = { shown: difference, exact };
  const side = sideOf(change);
  if (side === 'none') return words.noChange;
  return side === 'fewer' ? words.fewer(sizeOf(change, words)) : words.more(sizeOf(change, words));
}

/**
 * The range of a change in people, from its two ends: "3 to 5 fewer", "2 fewer to 1 more",
 * "under 1 to 2 fewer". `least` is the end with the fewest people spared (the option's upper
 * limit), `most` the other.
 */
export function changeRangeText(least: PeopleChange, most: PeopleChange, words: PeopleChangeMessages = ENGLISH): string {
  const sides = [sideOf(least), sideOf(most)];
  if (sides.every((side) => side === 'none')) return words.noChange;
  const leastSize = sizeOf(least, words);
  const mostSize = sizeOf(most, words);
  if (!sides.includes('more')) {
    return leastSize === mostSize ? words.fewer(mostSize) : words.fewerRange(leastSize, mostSize);
  }
  if (!sides.includes('fewer')) {
    return leastSize === mostSize ? words.more(leastSize) : words.moreRange(mostSize, leastSize);
  }
  return words.fewerToMore(mostSize, leastSize);
}

/** The range of a change in people, from the option's range of people: "3 to 5 fewer", "2 fewer to 1 more". */
export function changeRangeWords(
  comparison: number,
  range: { readonly lower: number; readonly upper: number },
  words: PeopleChangeMessages = ENGLISH,
): string {
  return changeRangeText(exactly(comparison - range.upper), exactly(comparison - range.lower), words);
}

/**
 * A risk as a percentage that keeps its meaning: one decimal from 1% up, two significant
 * figures below, so a risk that is not 0 never reads 0%: 0.1125 → "11.3%", 0.0008 → "0.08%".
 */
export function riskPercent(risk: number): string {
  return formatPercentSignificant(risk, 1);
}

function riskText(option: OptionOutcomeResult, words: PeopleChangeMessages): RangedText {
  const { estimate, lower, upper } = option.interventionRisk;
  if (option.isComparison || lower === null || upper === null) return { value: riskPercent(estimate), range: null };
  return { value: riskPercent(estimate), range: words.range(riskPercent(lower).replace('%', ''), riskPercent(upper)) };
}

/** The NNT cell from the core's parts, in the interface's words: "NNTB 7" over "NNTB 5 to 10". */
function nntText(option: OptionOutcomeResult, words: PeopleChangeMessages): RangedText {
  const { label, rounded, interval } = option.nnt;
  const value = label === null || rounded === null ? words.noNnt : `${label} ${rounded}`;
  return { value, range: interval === null ? null : writeNntInterval(interval, words.nntInterval) };
}

function changeText(option: OptionOutcomeResult, denominator: number, words: PeopleChangeMessages): RangedText {
  const people = option.wordsPeople;
  const base = option.comparisonRisk.estimate;
  const { estimate, lower, upper } = option.interventionRisk;
  const value = changeWords(people.difference, (base - estimate) * denominator, words);
  const range = people.interventionRange;
  if (range === null || lower === null || upper === null) return { value, range: null };
  return {
    value,
    range: changeRangeText(
      { shown: people.comparison - range.upper, exact: (base - upper) * denominator },
      { shown: people.comparison - range.lower, exact: (base - lower) * denominator },
      words,
    ),
  };
}

function row(option: OptionOutcomeResult, denominator: number, words: PeopleChangeMessages): KeyNumberRow {
  const people = option.wordsPeople;
  const count = option.isComparison ? people.comparison : people.intervention;
  const range = option.isComparison ? null : people.interventionRange;
  return {
    optionId: option.optionId,
    name: option.name,
    isComparison: option.isComparison,
    people: {
      value: formatCount(count),
      range: range === null ? null : words.range(formatCount(range.lower), formatCount(range.upper)),
    },
    change: option.isComparison ? null : changeText(option, denominator, words),
    risk: riskText(option, words),
    nnt: option.isComparison ? null : nntText(option, words),
    level: range === null || option.level === null ? null : levelText(option.level),
  };
}

function table(outcome: OutcomeResult, denominator: WordsDenominator, words: PeopleChangeMessages): KeyNumberTable {
  const ordered = [...outcome.options].sort((first, second) => Number(second.isComparison) - Number(first.isComparison));
  return {
    outcomeId: outcome.outcomeId,
    name: outcome.name,
    kind: outcome.kind,
    wanted: outcome.wanted,
    isHeadline: outcome.isHeadline,
    denominator,
    rows: ordered.map((option) => row(option, denominator, words)),
  };
}

/** One table per outcome, the headline first, then in the topic's order; the comparison first in each. */
export function keyNumberTables(result: TopicResult, words: PeopleChangeMessages = ENGLISH): KeyNumberTable[] {
  const tables = result.outcomes.map((outcome) => table(outcome, result.wordsDenominator, words));
  return [...tables.filter((found) => found.isHeadline), ...tables.filter((found) => !found.isHeadline)];
}
