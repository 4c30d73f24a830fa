/**
 * The assumptions behind an outcome's numbers, as short plain lines printed where
 * the patient reads those numbers: a starting chance given for another period and
 * worked out for the sheet's (the core's `baseline-period-converted` notice), and an
 * effect applied beyond the follow-up of its trials (the core's one follow-up rule,
 * `period-beyond-followup` in `computeEffect`, which the editor's check list shows too).
 */
import type { Notice } from '../core/types.ts';
import { isTimeUnit, yearsFrom } from '../core/time-unit.ts';
import type { OutcomeResult } from '../core/topic/topic-result.ts';
import type { HandoutMessages } from './messages/handout-messages.ts';

/** An amount and its unit in a notice's values as words ("10 years"), or null when they are missing. */
function spanOf(
  values: Notice['values'],
  amountKey: string,
  unitKey: string,
  duration: HandoutMessages['duration'],
): string | null {
  const amount = values[amountKey];
  const unit = values[unitKey] ?? 'years';
  return typeof amount === 'number' && isTimeUnit(unit) ? duration({ years: yearsFrom(amount, unit), unit }) : null;
}

/**
 * One line per assumption the outcome's numbers rest on: the baseline conversion, then
 * each option whose effect is applied beyond its trials' follow-up.
 *
 * @param outcome - the computed outcome
 * @param messages - the handout catalogue
 * @example assumptionLines(screeningDeath, handoutMessagesEn)[1] // => 'The research on screening lasted 12 years; …'
 */
export function assumptionLines(outcome: OutcomeResult, messages: HandoutMessages): string[] {
  const lines: string[] = [];
  const conversion = outcome.baselineConversion ?? null;
  if (conversion !== null) {
    const from = spanOf(conversion.values, 'from', 'fromUnit', messages.duration);
    const to = spanOf(conversion.values, 'to', 'toUnit', messages.duration);
    if (from !== null && to !== null) lines.push(messages.baselineConverted(outcome.name, from, to));
  }
  for (const option of outcome.options) {
    const beyond = option.notices.find((found) => found.code === 'period-beyond-followup');
    if (beyond === undefined) continue;
    const followUp = spanOf(beyond.values, 'followup', 'followupUnit', messages.duration);
    const period = spanOf(beyond.values, 'period', 'periodUnit', messages.duration);
    if (followUp !== null && period !== null) lines.push(messages.beyondFollowUp(option.name, followUp, period));
  }
  return lines;
}
