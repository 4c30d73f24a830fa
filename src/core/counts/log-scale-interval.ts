import type { RatioEstimate } from './counts-types.ts';

/** A ratio and its interval from a log-scale estimate and standard error: exp(log ratio ± z·SE). */
export function logScaleInterval(logRatio: number, standardError: number, z: number, corrected: boolean): RatioEstimate {
  const estimate = Math.exp(logRatio);
  const lower = Math.exp(logRatio - z * standardError);
  const upper = Math.exp(logRatio + z * standardError);
  return { estimate, lower: Math.min(lower, estimate), upper: Math.max(upper, estimate), corrected };
}
