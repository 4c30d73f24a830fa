import { amountOf } from './amount-of.ts';
import { changeDirection } from './change-sentence.ts';
import { frequencyBand } from './frequency-band.ts';
import { amountNumbers, comparisonCount, optionCount, optionRisk, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * A side effect's frequency band with the numbers beside it, in the topic's own
 * denominator: the option's count, the comparison's, and the change, so a band word
 * never hides a difference ("common" covers both 20 and 60 in 1000): "With the
 * tablet, muscle pain is common: about 3 in 100 people, against about 1 in 100 with
 * no tablet (2 more in 100)." The band follows the option's unrounded risk (EU SmPC
 * thresholds); the numbers are the drawn counts, and a count of 0 reads "fewer than
 * 1 in 1000", never "1 in X".
 *
 * @param context - a non-comparison option, a harm outcome and the catalogue
 * @returns the band sentence
 * @example bandSentence(context).numbers // => { count: 3, denominator: 100, from: 1, caused: 2 }
 */
export function bandSentence(context: OptionContext): WordingSentence {
  const { option, outcome, denominator, catalogue } = context;
  const risk = optionRisk(option);
  const band = frequencyBand(risk);
  const count = optionCount(option);
  const amount = amountOf(count, denominator, risk);
  const before = comparisonCount(option);
  const comparisonAmount = amountOf(before, denominator, option.comparisonRisk.estimate);
  const comparison = outcome.options.find((found) => found.isComparison)?.name ?? '';
  const direction = changeDirection(context);
  const change = Math.abs(option.wordsPeople.difference);
  const text = catalogue.band({
    ...optionValues(context),
    band,
    amount,
    denominator,
    comparison,
    comparisonAmount,
    direction,
    count: change,
  });
  const changeNumbers = direction === 'more' ? { caused: change } : direction === 'fewer' ? { avoided: change } : {};
  const numbers =
    band === 'not-known'
      ? {}
      : {
          ...amountNumbers(amount, count),
          denominator,
          ...(comparisonAmount.kind === 'about' ? { from: before } : {}),
          ...(comparisonAmount.kind === 'fewer-than-one' ? { lessThan: 1 } : {}),
          ...changeNumbers,
        };
  return optionSentence(context, 'band', text, numbers);
}
