import { comparisonCount, optionCount, optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/** A percentage to a whole number, half away from zero, after trimming float noise to 12 digits. */
function wholePercent(value: number): number {
  const trimmed = Number(Math.abs(value).toPrecision(12));
  return Math.sign(value) * Math.floor(trimmed + 0.5);
}

/**
 * A relative change for the clinician view, never alone: the same sentence gives
 * the absolute numbers it applies to (Akl et al. 2011; Gigerenzer & Edwards
 * 2003): "With statin, the chance of a stroke goes from 15 in 100 to 11 in 100: a
 * relative reduction of 25%." The percentage is the result's risk ratio; the
 * counts are the drawn ones. Null when either count is 0, the counts are equal,
 * no risk ratio exists, the percentage rounds to 0, or the ratio and the counts
 * point different ways.
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns the relative sentence for the clinician, or null
 * @example relativeSentence(context)?.numbers // => { from: 15, to: 11, denominator: 100, percent: 25 }
 */
export function relativeSentence(context: OptionContext): WordingSentence | null {
  const { option, denominator, catalogue } = context;
  const from = comparisonCount(option);
  const to = optionCount(option);
  const ratio = option.relativeRisk?.estimate ?? null;
  if (ratio === null || !Number.isFinite(ratio) || from === 0 || to === 0 || from === to) return null;
  const percent = Math.abs(wholePercent((1 - ratio) * 100));
  if (percent === 0 || ratio < 1 !== to < from) return null;
  const direction = ratio < 1 ? 'reduction' : 'increase';
  const text = catalogue.relative({ ...optionValues(context), from, to, denominator, direction, percent });
  return optionSentence(context, 'relative', text, { from, to, denominator, percent }, 'clinician');
}
