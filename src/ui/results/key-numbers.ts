/**
 * The key numbers of a computed topic as rows of text for the results table: people
 * per denominator with each option, the change against the comparison with its range,
 * the absolute risk and the NNT. Every number is the core's; only the wording is here.
 */
import { formatPercent } from '../../core/messages/format-number.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../../core/topic/topic-result.ts';

/** A value and, when there is one, its range: shown as the value with the range beneath. */
export interface RangedText {
  readonly value: string;
  readonly range: string | null;
}

export interface KeyNumberRow {
  readonly optionId: string;
  readonly name: string;
  readonly isComparison: boolean;
  /** People with the outcome per denominator: "11", range "10 to 12". */
  readonly people: RangedText;
  /** Against the comparison: "4 fewer", range "3 to 5 fewer"; null for the comparison. */
  readonly change: RangedText | null;
  /** The absolute risk (the chance, for a wanted event): "11.2%", range "10.2 to 12.4%". */
  readonly risk: RangedText;
  /** The core's NNT text, its interval beneath: "NNTB 27", range "NNTB 21 to 40"; null for the comparison. */
  readonly nnt: RangedText | null;
}

export interface KeyNumberTable {
  readonly outcomeId: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /** The event is one people want: its column is headed "Chance", not "Risk". */
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  readonly rows: readonly KeyNumberRow[];
}

/**
 * A signed change in people as words: 4 → "4 fewer", −2 → "2 more", 0 → "no change". The
 * words say only how many people have the event; whether that helps is the event's direction.
 */
export function changeWords(difference: number): string {
  if (difference === 0) return 'no change';
  return difference > 0 ? `${difference} fewer` : `${-difference} more`;
}

/** The range of a change in people, from the option's range of people: "3 to 5 fewer", "2 fewer to 1 more". */
export function changeRangeWords(comparison: number, range: { readonly lower: number; readonly upper: number }): string {
  const most = comparison - range.lower;
  const least = comparison - range.upper;
  if (least >= 0 && most >= 0) return least === most ? changeWords(least) : `${least} to ${most} fewer`;
  if (least <= 0 && most <= 0) return least === most ? changeWords(least) : `${-most} to ${-least} more`;
  return `${most} fewer to ${-least} more`;
}

/** A risk as a percentage with at most one decimal: 0.1125 → "11.3%" (rounded half away from zero). */
export function riskPercent(risk: number): string {
  return formatPercent(risk, 1);
}

function riskText(option: OptionOutcomeResult): RangedText {
  const { estimate, lower, upper } = option.interventionRisk;
  if (option.isComparison || lower === null || upper === null) return { value: riskPercent(estimate), range: null };
  return { value: riskPercent(estimate), range: `${riskPercent(lower).replace('%', '')} to ${riskPercent(upper)}` };
}

/** The core's NNT text split into its estimate and its bracketed interval. */
export function splitNntText(text: string): RangedText {
  const open = text.indexOf(' (');
  if (open === -1 || !text.endsWith(')')) return { value: text, range: null };
  return { value: text.slice(0, open), range: text.slice(open + 2, -1) };
}

function row(option: OptionOutcomeResult): KeyNumberRow {
  const people = option.perPeople;
  const count = option.isComparison ? people.comparison : people.intervention;
  const range = option.isComparison ? null : people.interventionRange;
  return {
    optionId: option.optionId,
    name: option.name,
    isComparison: option.isComparison,
    people: { value: String(count), range: range === null ? null : `${range.lower} to ${range.upper}` },
    change: option.isComparison
      ? null
      : { value: changeWords(people.difference), range: range === null ? null : changeRangeWords(people.comparison, range) },
    risk: riskText(option),
    nnt: option.isComparison ? null : splitNntText(option.nnt.text),
  };
}

function table(outcome: OutcomeResult): KeyNumberTable {
  const ordered = [...outcome.options].sort((first, second) => Number(second.isComparison) - Number(first.isComparison));
  return {
    outcomeId: outcome.outcomeId,
    name: outcome.name,
    kind: outcome.kind,
    wanted: outcome.wanted,
    isHeadline: outcome.isHeadline,
    rows: ordered.map(row),
  };
}

/** One table per outcome, the headline first, then in the topic's order; the comparison first in each. */
export function keyNumberTables(result: TopicResult): KeyNumberTable[] {
  const tables = result.outcomes.map(table);
  return [...tables.filter((found) => found.isHeadline), ...tables.filter((found) => !found.isHeadline)];
}
