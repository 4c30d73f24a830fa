import type { TwoByTwoTable } from './counts-types.ts';

/** The cells the ratios are computed from, and whether they were corrected. */
export interface RatioCells {
  readonly table: TwoByTwoTable;
  readonly corrected: boolean;
}

/**
 * The cells for the risk ratio and odds ratio: the table itself, or with 0.5 added to
 * every cell when any cell is 0 (Haldane–Anscombe). Null when neither arm has an event
 * or both arms are all events, where no ratio can be estimated.
 */
export function ratioCells(table: TwoByTwoTable): RatioCells | null {
  const noEvents = table.optionEvents === 0 && table.comparisonEvents === 0;
  const allEvents = table.optionNonEvents === 0 && table.comparisonNonEvents === 0;
  if (noEvents || allEvents) return null;
  const anyZero =
    table.optionEvents === 0 || table.optionNonEvents === 0 || table.comparisonEvents === 0 || table.comparisonNonEvents === 0;
  if (!anyZero) return { table, corrected: false };
  return {
    table: {
      optionEvents: table.optionEvents + 0.5,
      optionNonEvents: table.optionNonEvents + 0.5,
      comparisonEvents: table.comparisonEvents + 0.5,
      comparisonNonEvents: table.comparisonNonEvents + 0.5,
    },
    corrected: true,
  };
}
