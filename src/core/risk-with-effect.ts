import type { EffectMeasure } from './types.ts';

/**
 * The risk with an option at the patient's baseline, for one value of an effect
 * (Cochrane Handbook 5.1, §12.5.4; current edition §15.4.4):
 * - risk ratio: p·RR
 * - odds ratio: OR·p / (1 − p + OR·p)
 * - hazard ratio: 1 − (1 − p)^HR, under proportional hazards (Altman & Andersen 1999, BMJ 319:1492)
 * - relative risk reduction (percent): p·(1 − RRR/100)
 * - absolute risk reduction: p − ARR
 * The result is not range-checked: callers refuse values outside [0, 1].
 *
 * @example riskWithEffect('or', 0.73, 0.3) // => 0.23831 (to 5 dp)
 */
export function riskWithEffect(measure: EffectMeasure, value: number, baseline: number): number {
  switch (measure) {
    case 'rr':
      return baseline * value;
    case 'or':
      // OR·p / (1 − p + OR·p), written as 1 / (1 + (1 − p) / (OR·p)) so that every step is
      // monotone under rounding: a larger odds ratio never gives a smaller risk, even by one ulp.
      return 1 / (1 + (1 - baseline) / (value * baseline));
    case 'hr':
      return -Math.expm1(value * Math.log1p(-baseline));
    case 'rrr':
      return baseline * (1 - value / 100);
    case 'arr':
      return baseline - value;
  }
}
