import { EFFECT_MEASURES } from './effect-measures.ts';
import type { EffectMeasure } from './effect-measures.ts';

/**
 * The risk with an option at the patient's baseline, for one value of an effect, by the
 * formula of the measure in the registry (`effect-measures.ts`, each formula with its source:
 * Cochrane Handbook 5.1 §12.5.4, current edition §15.4.4; Altman & Andersen 1999 for hazard
 * ratios). The result is not range-checked: callers refuse values outside [0, 1].
 *
 * @example riskWithEffect('or', 0.73, 0.3) // => 0.23831 (to 5 dp)
 */
export function riskWithEffect(measure: EffectMeasure, value: number, baseline: number): number {
  return EFFECT_MEASURES[measure].risk(value, baseline);
}

/**
 * The risk with an option when the effect was reported for the opposite event (the hazard
 * ratio for death when the outcome is "alive at 5 years"; the risk ratio of still having
 * symptoms when the outcome is "pain gone"). An odds ratio inverts exactly: the odds ratio of
 * the opposite event is 1/OR. Every other measure is applied to the complementary risk,
 * 1 − p, and the result turned back: q = 1 − f(1 − p). For a risk ratio or a hazard ratio
 * this is not the same as applying 1/ratio to p, which is why the result carries a warning.
 * Reference: Deeks 2002, Stat Med 21:1575–1600 (the risk ratio is not symmetric in the event
 * and its complement; the odds ratio is).
 *
 * @example riskWithOppositeEffect('rr', 0.5, 0.6) // => 0.8 (40% without the event, halved to 20%)
 */
export function riskWithOppositeEffect(measure: EffectMeasure, value: number, baseline: number): number {
  if (measure === 'or') return riskWithEffect('or', 1 / value, baseline);
  return 1 - riskWithEffect(measure, value, 1 - baseline);
}
