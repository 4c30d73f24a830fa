/**
 * The table of every outcome side by side, benefits then side effects, each cell
 * straight under its option's picture: the people with the outcome, and for each
 * option the change beside it. A side effect's cells carry its EU SmPC frequency
 * band, and the band word never stands alone: the numbers with and without each
 * option and the change are in the same row ("common" covers both 20 and 60 in 1000).
 */
import type { Certainty } from '../core/topic/topic.ts';
import { peopleFor } from '../core/people-counts.ts';
import type { WordsDenominator } from '../core/types.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import { amountOf } from '../core/wording/amount-of.ts';
import { frequencyBand } from '../core/wording/frequency-band.ts';
import { optionRisk } from '../core/wording/option-context.ts';
import { bandOfCount, rowDenominator } from './band-denominator.ts';
import type { BenefitAim, HandoutMessages } from './messages/handout-messages.ts';
import { printedOutcomes } from './outcome-sections.ts';

/** One cell of the outcomes table: the people count, the change the option makes, and how sure the research is. */
export interface TableCell {
  readonly value: string;
  /** "40 more", "6 fewer", "no change"; null for the comparison. */
  readonly change: string | null;
  readonly note: string | null;
}

export interface TableRow {
  readonly outcomeId: string;
  readonly outcome: string;
  /** The outcome the pictures lead with. */
  readonly isHeadline: boolean;
  /** The people every cell of the row is out of: the topic's words denominator, or more for a rare side effect. */
  readonly denominator: WordsDenominator;
  /** One cell per option, in the order of the pictures (comparison first). */
  readonly cells: readonly TableCell[];
}

/** A run of rows under a sub-heading. */
export interface TableSection {
  readonly heading: string | null;
  readonly rows: readonly TableRow[];
}

/** The table of every outcome, its columns lined up under the pictures. */
export interface OutcomeTable {
  readonly sections: readonly TableSection[];
  /** Said under the table when no side effect was entered; null otherwise. */
  readonly noSideEffects: string | null;
  /** Said under the table when a row counts out of more people than the sheet's words; null otherwise. */
  readonly rareNote: string | null;
}

/** The change an option makes, as people of the row's denominator: positive is fewer with the outcome. */
function rowChange(option: OptionOutcomeResult, denominator: WordsDenominator): number {
  if (denominator === option.wordsPeople.denominator) return option.wordsPeople.difference;
  return peopleFor(option.comparisonRisk.estimate, denominator) - peopleFor(optionRisk(option) ?? 0, denominator);
}

/**
 * A cell: the option's count at the row's denominator (the words' one, as in the sentences);
 * for a side effect, its frequency band with the number beside the word, the row written per
 * as many people as it takes for the word and the number to agree; for every option but the
 * comparison, the change beside it.
 */
function tableCell(
  option: OptionOutcomeResult,
  kind: 'benefit' | 'harm',
  denominator: WordsDenominator,
  messages: HandoutMessages,
): TableCell {
  const risk = optionRisk(option);
  const count =
    denominator === option.wordsPeople.denominator ? option.wordsPeople.intervention : peopleFor(risk ?? 0, denominator);
  const amount = amountOf(count, denominator, risk);
  const certainty: Certainty | null = option.isComparison ? null : option.certainty;
  const band = frequencyBand(risk);
  // Only a risk within rounding of a band's edge, even per million, reads otherwise: then the word follows the number.
  const written = risk === null || risk === 0 ? band : (bandOfCount(count, denominator) ?? band);
  const value = kind === 'harm' ? messages.bandCell(written, amount, denominator) : messages.tableCell(amount, denominator);
  const difference = rowChange(option, denominator);
  const exact = option.absoluteReduction.estimate;
  const change = option.isComparison
    ? null
    : messages.tableChange({
        direction: difference > 0 ? 'fewer' : difference < 0 ? 'more' : 'same',
        count: Math.abs(difference),
        hidden: difference === 0 && exact !== 0 ? (exact > 0 ? 'fewer' : 'more') : null,
      });
  return { value, change, note: certainty === null ? null : messages.certaintyShort[certainty] };
}

/** An outcome's options in the order of the pictures: the comparison, then the others as in the chart. */
function cellsInOrder(outcome: OutcomeResult, optionIds: readonly string[]): OptionOutcomeResult[] {
  return optionIds.map((optionId) => {
    const found = outcome.options.find((option) => option.optionId === optionId);
    if (found === undefined) throw new RangeError(`a handout requires every outcome to have option ${optionId}`);
    return found;
  });
}

/** What the options aim to do to these benefit outcomes: lower events to avoid, raise wanted ones. */
function benefitAim(benefits: readonly OutcomeResult[]): BenefitAim {
  const wanted = benefits.filter((outcome) => outcome.wanted).length;
  if (wanted === 0) return 'lower';
  return wanted === benefits.length ? 'raise' : 'both';
}

/**
 * Every outcome, benefits then side effects, each under its sub-heading.
 *
 * @param result - the computed topic
 * @param optionIds - the options in the pictures' order (comparison first)
 * @param messages - the handout catalogue
 */
export function outcomeTable(result: TopicResult, optionIds: readonly string[], messages: HandoutMessages): OutcomeTable {
  const rowOf = (outcome: OutcomeResult): TableRow => {
    const options = cellsInOrder(outcome, optionIds);
    const denominator =
      outcome.kind === 'harm' ? rowDenominator(options.map(optionRisk), result.wordsDenominator) : result.wordsDenominator;
    return {
      outcomeId: outcome.outcomeId,
      outcome: messages.capitalise(outcome.name.trim()),
      isHeadline: outcome.isHeadline,
      denominator,
      cells: options.map((option) => tableCell(option, outcome.kind, denominator, messages)),
    };
  };
  const printed = printedOutcomes(result);
  const benefits = printed.filter((outcome) => outcome.kind === 'benefit');
  const sections: TableSection[] = [
    { heading: messages.tableBenefitRows(benefitAim(benefits)), rows: benefits.map(rowOf) },
    { heading: messages.tableHarmRows, rows: printed.filter((outcome) => outcome.kind === 'harm').map(rowOf) },
  ].filter((section) => section.rows.length > 0);
  const raised = sections.some((section) => section.rows.some((row) => row.denominator !== result.wordsDenominator));
  return {
    sections,
    noSideEffects: result.outcomes.some((outcome) => outcome.kind === 'harm') ? null : messages.noSideEffects,
    rareNote: raised ? messages.rareRowsNote : null,
  };
}
