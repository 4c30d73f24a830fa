import { amountOf } from './amount-of.ts';
import { amountNumbers, optionCount, optionRisk, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { Amount, ChangeDirection } from './wording-catalogue.ts';
import type { WordingSentence } from './wording-sentence.ts';

/** Whether the counts of the words show fewer, more or the same people with the outcome. */
export function changeDirection(context: OptionContext): ChangeDirection {
  const { difference } = context.option.wordsPeople;
  if (difference > 0) return 'fewer';
  if (difference < 0) return 'more';
  return 'same';
}

/** For counts that show no change: the direction of a difference that rounding hid, or null when it is exactly 0. */
function hiddenDirection(context: OptionContext): 'fewer' | 'more' | null {
  const exact = context.option.absoluteReduction.estimate;
  if (exact === 0) return null;
  return exact > 0 ? 'fewer' : 'more';
}

/**
 * The change an option makes, as people of the same denominator, from the icon
 * array's `prevented` and `caused` groups: "With statin, about 4 of those 100
 * people avoid a stroke.", "About 2 in 100 get muscle pain because of statin.",
 * or a plain "makes little or no difference" sentence when the counts are equal.
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns the change sentence
 * @example changeSentence(context).numbers // => { avoided: 4, denominator: 100 }
 */
export function changeSentence(context: OptionContext): WordingSentence {
  const { numbers, ...change } = changeCase(context);
  const text = context.catalogue.change({ ...optionValues(context), ...change, denominator: context.denominator });
  return optionSentence(context, 'change', text, numbers);
}

/** The change an option makes, as the catalogue's values, with the numbers its sentence writes. */
export function changeCase(context: OptionContext): {
  readonly direction: ChangeDirection;
  readonly count: number;
  readonly either: Amount;
  readonly hidden: 'fewer' | 'more' | null;
  readonly numbers: Record<string, number>;
} {
  const { option, denominator } = context;
  const direction = changeDirection(context);
  const count = Math.abs(option.wordsPeople.difference);
  const withOutcome = optionCount(option);
  const either = amountOf(withOutcome, denominator, optionRisk(option));
  const hidden = direction === 'same' ? hiddenDirection(context) : null;
  const numbers: Record<string, number> =
    direction === 'fewer'
      ? { avoided: count, denominator }
      : direction === 'more'
        ? { caused: count, denominator }
        : { ...amountNumbers(either, withOutcome), denominator, ...(hidden === null ? {} : { lessThan: 1 }) };
  return { direction, count, either, hidden, numbers };
}
