import { amountOf } from './amount-of.ts';
import { frequencyBand } from './frequency-band.ts';
import { amountNumbers, optionCount, optionRisk, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * A side effect's frequency band with its number beside it, in the topic's own
 * denominator: "With statin, muscle pain is common: about 3 in 100 people." The
 * band follows the option's unrounded risk (EU SmPC thresholds); the number is the
 * drawn count, and a count of 0 reads "fewer than 1 in 1000", never "1 in X".
 *
 * @param context - a non-comparison option, a harm outcome and the catalogue
 * @returns the band sentence
 * @example bandSentence(context).numbers // => { count: 3, denominator: 100 }
 */
export function bandSentence(context: OptionContext): WordingSentence {
  const { option, denominator, catalogue } = context;
  const risk = optionRisk(option);
  const band = frequencyBand(risk);
  const count = optionCount(option);
  const amount = amountOf(count, denominator, risk);
  const text = catalogue.band({ ...optionValues(context), band, amount, denominator });
  const numbers = band === 'not-known' ? {} : { ...amountNumbers(amount, count), denominator };
  return optionSentence(context, 'band', text, numbers);
}
