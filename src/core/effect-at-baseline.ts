import type { CheckedEffect } from './check-effect.ts';
import { fail } from './problems.ts';
import { riskWithEffect, riskWithOppositeEffect } from './risk-with-effect.ts';
import type { Estimate } from './types.ts';

/** The option's risk, the implied risk ratio and the absolute reduction at one baseline. */
export interface EffectAtBaseline {
  readonly interventionRisk: Estimate;
  readonly relativeRisk: Estimate;
  readonly absoluteReduction: Estimate;
}

const RISK_TOLERANCE = 1e-12;

function riskOrFail(effect: CheckedEffect, value: number, baseline: number, field: string, isLimit: boolean): number {
  const risk = effect.opposite
    ? riskWithOppositeEffect(effect.measure, value, baseline)
    : riskWithEffect(effect.measure, value, baseline);
  const outside = risk < -RISK_TOLERANCE || risk > 1 + RISK_TOLERANCE;
  if (outside && isLimit) fail('limit-risk-outside', field, { measure: effect.measure, limit: value, baseline, risk });
  if (outside && effect.measure === 'rr' && !effect.opposite) fail('rr-risk-above-one', field, { ratio: value, baseline, risk });
  if (outside) fail('risk-outside', field, { measure: effect.measure, value, baseline, risk });
  const clamped = Math.min(1, Math.max(0, risk));
  // A ratio that makes the outcome certain or impossible (1e-320 as an odds ratio, say) is a typo.
  const ratio = effect.measure !== 'arr';
  if (ratio && baseline > 0 && baseline < 1 && (clamped === 0 || clamped === 1)) {
    fail('risk-certain', field, { measure: effect.measure, value, baseline, risk: clamped });
  }
  return clamped;
}

function sorted(estimate: number, first: number | null, second: number | null): Estimate {
  if (first === null || second === null) return { estimate, lower: null, upper: null };
  return { estimate, lower: Math.min(first, second, estimate), upper: Math.max(first, second, estimate) };
}

function ratioTo(risk: number | null, baseline: number): number | null {
  return risk === null ? null : risk / baseline;
}

function reductionFrom(risk: number | null, baseline: number): number | null {
  return risk === null ? null : baseline - risk;
}

/**
 * Apply an entered effect to a baseline risk (Cochrane Handbook 5.1 §12.5.4.5): the
 * estimate and each interval limit go through the same formula, and the ends are sorted
 * so that lower ≤ upper. The interval leaves out any uncertainty in the baseline itself.
 *
 * @throws InputError `rr-risk-above-one`, `risk-outside`, `limit-risk-outside`
 * @example effectAtBaseline(0.3, checked('rr', 0.92), 'effect').absoluteReduction.estimate // => 0.024
 */
export function effectAtBaseline(baseline: number, effect: CheckedEffect, field: string): EffectAtBaseline {
  const risk = riskOrFail(effect, effect.estimate, baseline, `${field}.estimate`, false);
  const limits = effect.interval;
  const lowRisk = limits === null ? null : riskOrFail(effect, limits.lower, baseline, `${field}.lower`, true);
  const highRisk = limits === null ? null : riskOrFail(effect, limits.upper, baseline, `${field}.upper`, true);
  const relativeEstimate = effect.measure === 'rr' && !effect.opposite ? effect.estimate : risk / baseline;
  return {
    interventionRisk: sorted(risk, lowRisk, highRisk),
    relativeRisk: sorted(relativeEstimate, ratioTo(lowRisk, baseline), ratioTo(highRisk, baseline)),
    absoluteReduction: sorted(baseline - risk, reductionFrom(lowRisk, baseline), reductionFrom(highRisk, baseline)),
  };
}
