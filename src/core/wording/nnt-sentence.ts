import { nntIntervalLimits } from '../nnt-interval.ts';
import { numberNeededLimits } from '../number-needed.ts';
import { optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/** Whether a difference's interval reaches or crosses no difference (one limit at or on the other side of 0). */
function crossesNoEffect(lower: number | null, upper: number | null): boolean {
  return lower !== null && upper !== null && lower <= 0 && upper >= 0;
}

/**
 * The number needed to treat for the clinician view, labelled NNTB or NNTH after
 * Altman (1998), with its interval in Altman's form, the period and the reference
 * class: "NNTB 25 (NNTB 13 to 100): treating 25 people like you with the tablet for
 * 10 years prevents a stroke in one of them." An interval that crosses no effect is
 * printed too ("NNTB 10 (NNTB 4 to ∞ to NNTH 20)"), and said in words. When the
 * option makes no difference there is no NNT, and the sentence says so (never "infinity").
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns an `nnt` or `nnt-none` sentence, for the clinician
 * @example nntSentence(context).numbers // => { nnt: 25, years: 10, nntLimit1: 13, nntLimit2: 100 }
 */
export function nntSentence(context: OptionContext): WordingSentence {
  const { option, catalogue } = context;
  const { rounded, label } = option.nnt;
  const values = optionValues(context);
  if (rounded === null || label === null || !Number.isFinite(rounded)) {
    return optionSentence(context, 'nnt-none', catalogue.nntNone(values), {}, 'clinician');
  }
  const nnt = nntValues(context, label, rounded);
  const text = catalogue.nnt({ ...values, ...nnt });
  return optionSentence(context, 'nnt', text, nntNumbers(nnt), 'clinician');
}

/** The values of an NNT sentence for an option that has one. */
export function nntValues(context: OptionContext, label: 'NNTB' | 'NNTH', rounded: number) {
  const { option, outcome, years, unit } = context;
  const difference = option.absoluteReduction;
  const interval = numberNeededLimits(difference, { wanted: outcome.wanted });
  const crosses = crossesNoEffect(difference.lower, difference.upper);
  return { label, count: rounded, group: context.group(rounded), years, unit, interval, crossesNoEffect: crosses };
}

/** The numbers an NNT sentence writes: the NNT, the period and the interval's limits. */
export function nntNumbers(nnt: ReturnType<typeof nntValues>): Record<string, number> {
  const limits = nnt.interval === null ? [] : nntIntervalLimits(nnt.interval);
  const limitNumbers = Object.fromEntries(limits.map((limit, index) => [`nntLimit${index + 1}`, limit]));
  return { nnt: nnt.count, years: nnt.years, ...limitNumbers };
}
