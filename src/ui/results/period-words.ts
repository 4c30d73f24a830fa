/**
 * A period as the results line and the list of examples show it, in the unit it was given
 * in: "10 years", "6 months", "3 days", "1 week".
 */
import { formatDecimal } from '../../core/messages/format-number.ts';
import { amountIn } from '../../core/time-unit.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import { uiMessagesEn } from '../messages/en.ts';
import type { PeriodFieldMessages } from '../messages/ui-messages.ts';

/**
 * A period stored in years, as an amount of its unit with at most two decimals (English unless
 * given the interface's words).
 *
 * @example periodWords(3 / 365.25, 'days') // => "3 days"
 */
export function periodWords(years: number, unit: TimeUnit, words: PeriodFieldMessages = uiMessagesEn.period): string {
  const amount = amountIn(years, unit);
  return words.amount(formatDecimal(amount, 2), unit, amount === 1);
}
