import { optionSentence, optionValues, peopleOf } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { RangeCase } from './wording-catalogue.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * The plain case of an option's range, as people who avoid or get the outcome:
 * the comparison count minus each end of the option's own range of people.
 *
 * @param comparison - people with the outcome without the option
 * @param range - the option's range of people with the outcome
 * @returns the range case
 * @example rangeCase(15, { lower: 9, upper: 13 }) // => { variant: 'avoid', low: 2, high: 6 }
 */
export function rangeCase(comparison: number, range: { readonly lower: number; readonly upper: number }): RangeCase {
  const fewest = comparison - Math.max(range.lower, range.upper);
  const most = comparison - Math.min(range.lower, range.upper);
  if (fewest === 0 && most === 0) return { variant: 'no-change' };
  if (fewest >= 0)
    return fewest === most
      ? { variant: 'narrow', direction: 'fewer', count: most }
      : { variant: 'avoid', low: fewest, high: most };
  if (most <= 0) {
    return fewest === most
      ? { variant: 'narrow', direction: 'more', count: Math.abs(fewest) }
      : { variant: 'get', low: Math.abs(most), high: Math.abs(fewest) };
  }
  return { variant: 'either', fewer: most, more: Math.abs(fewest) };
}

export const rangeNumbers = (found: RangeCase): Record<string, number> => {
  switch (found.variant) {
    case 'avoid':
    case 'get':
      return { low: found.low, high: found.high };
    case 'narrow':
      return { count: found.count };
    case 'either':
      return { fewer: found.fewer, more: found.more };
    case 'no-change':
      return {};
    case 'below-one':
      return { lessThan: 1 };
  }
};

/**
 * Uncertainty in numbers: the option's interval as people of the same
 * denominator ("between 2 and 6 in 100 avoid a stroke"), or, when no interval
 * was given, a sentence saying the precision is not known.
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns a `range` or `range-unknown` sentence
 * @example rangeSentence(context).numbers // => { low: 2, high: 6, denominator: 100 }
 */
export function rangeSentence(context: OptionContext): WordingSentence {
  const { denominator, catalogue } = context;
  const values = optionValues(context);
  const found = optionRange(context);
  if (found === null) return optionSentence(context, 'range-unknown', catalogue.rangeUnknown(values), {});
  const text = catalogue.range({ ...values, range: found, denominator });
  return optionSentence(context, 'range', text, { ...rangeNumbers(found), denominator });
}

/**
 * The plain case of the option's range at the words' denominator, or null when no interval was
 * given. Counts that show no change over a range that is not exactly no change are `below-one`.
 */
export function optionRange(context: OptionContext): RangeCase | null {
  const { option } = context;
  const people = peopleOf(option);
  if (people.interventionRange === null) return null;
  const counted = rangeCase(people.comparison, people.interventionRange);
  const limits = option.interventionRisk;
  const base = option.comparisonRisk.estimate;
  const hidden =
    limits !== null && limits.lower !== null && limits.upper !== null && (limits.lower !== base || limits.upper !== base);
  return counted.variant === 'no-change' && hidden ? { variant: 'below-one' } : counted;
}
