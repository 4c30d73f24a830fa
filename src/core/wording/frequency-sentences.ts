import { amountOf } from './amount-of.ts';
import { amountNumbers, optionCount, optionRisk, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * Natural frequencies for one option, in both frames, on the topic's one
 * denominator and period: "No statin: about 15 in 100 people like you will have a
 * stroke in the next 10 years." then "About 85 will not." The counts are the icon
 * array's: with the outcome `event + caused`, without it the rest.
 *
 * @param context - the option, outcome and catalogue
 * @returns the event-frame sentence, then the free-frame sentence
 * @example frequencySentences(context).map((found) => found.kind) // => ['event-frame', 'free-frame']
 */
export function frequencySentences(context: OptionContext): readonly [WordingSentence, WordingSentence] {
  const { option, denominator, years, unit, catalogue } = context;
  const withOutcome = optionCount(option);
  const withoutOutcome = denominator - withOutcome;
  const risk = optionRisk(option);
  const eventAmount = amountOf(withOutcome, denominator, risk);
  const freeAmount = amountOf(withoutOutcome, denominator, risk === null ? null : 1 - risk);
  const event = catalogue.eventFrame({
    ...optionValues(context),
    amount: eventAmount,
    denominator,
    group: context.group(denominator),
    years,
    unit,
  });
  const free = catalogue.freeFrame({ amount: freeAmount, denominator });
  return [
    optionSentence(context, 'event-frame', event, { ...amountNumbers(eventAmount, withOutcome), denominator, years }),
    optionSentence(context, 'free-frame', free, { ...amountNumbers(freeAmount, withoutOutcome), denominator }),
  ];
}
