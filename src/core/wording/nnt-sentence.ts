import { optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * The number needed to treat for the clinician view, labelled NNTB or NNTH after
 * Altman (1998), with the period and the reference class: "NNTB 17: treating 17
 * people like you with statin for 10 years prevents a stroke in one of them."
 * When the option makes no difference there is no NNT, and the sentence says so
 * (never "infinity").
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns an `nnt` or `nnt-none` sentence, for the clinician
 * @example nntSentence(context).numbers // => { nnt: 17, years: 10 }
 */
export function nntSentence(context: OptionContext): WordingSentence {
  const { option, years, unit, catalogue } = context;
  const { rounded, label } = option.nnt;
  const values = optionValues(context);
  if (rounded === null || label === null || !Number.isFinite(rounded)) {
    return optionSentence(context, 'nnt-none', catalogue.nntNone(values), {}, 'clinician');
  }
  const text = catalogue.nnt({ ...values, label, count: rounded, group: context.group(rounded), years, unit });
  return optionSentence(context, 'nnt', text, { nnt: rounded, years }, 'clinician');
}
