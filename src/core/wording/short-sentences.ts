import { certaintyCase } from './certainty-sentence.ts';
import { changeCase } from './change-sentence.ts';
import { nntNumbers, nntValues } from './nnt-sentence.ts';
import { optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import { optionRange, rangeNumbers } from './range-sentence.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * The short form of an option's change and its range, for a page whose pictures carry the
 * frames as captions: one sentence led by the option's name, the outcome said as "it":
 * "Extra water each day: about 16 in 100 avoid it because of the option (somewhere between
 * 8 and 22 in 100)." The same facts as the change and range sentences, the names said once.
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns a `short-effect` sentence; its numbers are the change's, and the range's prefixed `range`
 * @example shortEffectSentence(context).numbers // => { avoided: 16, denominator: 100, rangeLow: 8, rangeHigh: 22 }
 */
export function shortEffectSentence(context: OptionContext): WordingSentence {
  const { numbers, ...change } = changeCase(context);
  const range = optionRange(context);
  const text = context.catalogue.shortEffect({ ...optionValues(context), ...change, denominator: context.denominator, range });
  const ranged = range === null ? {} : rangeNumbers(range);
  const prefixed = Object.fromEntries(
    Object.entries(ranged).map(([role, value]) => [`range${role.charAt(0).toUpperCase()}${role.slice(1)}`, value]),
  );
  return optionSentence(context, range === null ? 'short-effect-unknown' : 'short-effect', text, { ...numbers, ...prefixed });
}

/**
 * The short form of the GRADE informative statement (Santesso et al. 2020), with the same
 * certainty words as the full one and the option as "it": "It probably reduces the chance."
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns a `short-certainty` sentence, or null when the result has no certainty
 */
export function shortCertaintySentence(context: OptionContext): WordingSentence | null {
  const chosen = certaintyCase(context);
  if (chosen === null) return null;
  return optionSentence(context, 'short-certainty', context.catalogue.shortCertainty(chosen), {});
}

/**
 * The short form of the number needed to treat, with the same label and interval (Altman 1998)
 * and the outcome as "it"; null when the option has no NNT (the change already says "little or
 * no difference").
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns a clinician `short-nnt` sentence, or null
 */
export function shortNntSentence(context: OptionContext): WordingSentence | null {
  const { rounded, label } = context.option.nnt;
  if (rounded === null || label === null || !Number.isFinite(rounded)) return null;
  const nnt = nntValues(context, label, rounded);
  const text = context.catalogue.shortNnt({ ...nnt, wanted: context.outcome.wanted });
  return optionSentence(context, 'short-nnt', text, nntNumbers(nnt), 'clinician');
}
