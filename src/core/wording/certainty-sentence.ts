import { changeDirection } from './change-sentence.ts';
import { optionSentence, optionValues } from './option-context.ts';
import type { OptionContext } from './option-context.ts';
import type { Certainty, Importance } from '../topic/topic.ts';
import type { WordingSentence } from './wording-sentence.ts';

/**
 * A GRADE informative statement (Santesso et al. 2020, GRADE guidelines 26),
 * chosen by certainty (high "reduces", moderate "probably reduces", low "may
 * reduce", very low "the evidence is very uncertain") and by importance
 * (`trivial` reads "results in little or no difference"). The direction comes
 * from the drawn counts; when they show no change the statement is the
 * little-or-no-difference one whatever the importance, so text and picture agree.
 *
 * @param context - a non-comparison option, its outcome and the catalogue
 * @returns the certainty sentence, or null when the result has no certainty
 * @example certaintySentence(context)?.text // => 'Statin probably reduces the chance of a stroke.'
 */
export function certaintySentence(context: OptionContext): WordingSentence | null {
  const chosen = certaintyCase(context);
  if (chosen === null) return null;
  return optionSentence(context, 'certainty', context.catalogue.certainty({ ...optionValues(context), ...chosen }), {});
}

/** The GRADE statement's certainty, importance and direction for the option, or null when it has no certainty. */
export function certaintyCase(context: OptionContext): {
  readonly certainty: Certainty;
  readonly importance: Importance;
  readonly direction: 'reduce' | 'increase';
} | null {
  const { option } = context;
  if (option.certainty === null) return null;
  // The direction of the exact difference, so that a difference too small for whole people is
  // not called "little or no difference" unless the clinician judged it trivial.
  const exact = option.absoluteReduction.estimate;
  const counted = changeDirection(context);
  const direction = counted === 'same' && exact !== 0 ? (exact > 0 ? 'fewer' : 'more') : counted;
  return {
    certainty: option.certainty,
    importance: direction === 'same' ? 'trivial' : (option.importance ?? 'important'),
    direction: direction === 'more' ? 'increase' : 'reduce',
  };
}
