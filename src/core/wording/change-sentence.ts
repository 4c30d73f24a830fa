import { amountOf } from './amount-of.ts';
import { amountNumbers, optionCount, optionRisk, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { ChangeDirection } from './wording-catalogue.ts';
import type { WordingSentence } from './wording-sentence.ts';

/** Whether the drawn counts show fewer, more or the same people with the outcome. */
export function changeDirection(context: OptionContext): ChangeDirection {
  const { prevented, caused } = context.option.groups;
  if (prevented > 0) return 'fewer';
  if (caused > 0) return 'more';
  return 'same';
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
  const { option, denominator, catalogue } = context;
  const direction = changeDirection(context);
  const count = direction === 'fewer' ? option.groups.prevented : direction === 'more' ? option.groups.caused : 0;
  const withOutcome = optionCount(option);
  const either = amountOf(withOutcome, denominator, optionRisk(option));
  const text = catalogue.change({ ...optionValues(context), direction, count, either, denominator });
  const numbers: Record<string, number> =
    direction === 'fewer'
      ? { avoided: count, denominator }
      : direction === 'more'
        ? { caused: count, denominator }
        : { ...amountNumbers(either, withOutcome), denominator };
  return optionSentence(context, 'change', text, numbers);
}
