import { fail } from './problems.ts';

/**
 * Convert a risk over one period to another period, assuming a constant hazard:
 * p₂ = 1 − (1 − p₁)^(t₂/t₁). Computed as −expm1(ratio · log1p(−p₁)) for accuracy at small risks.
 * Reference: Fleurence & Hollenbeak 2007, PharmacoEconomics 25:3–6 (rates and probabilities).
 *
 * @throws InputError `period-not-positive`
 * @example convertRiskPeriod(0.04, 5, 20) // => 0.1507 (to 4 dp)
 */
export function convertRiskPeriod(risk: number, fromYears: number, toYears: number, field = 'period'): number {
  if (!(fromYears > 0) || !Number.isFinite(fromYears)) fail('period-not-positive', field, { input: String(fromYears) });
  if (!(toYears > 0) || !Number.isFinite(toYears)) fail('period-not-positive', field, { input: String(toYears) });
  if (risk >= 1) return 1;
  return -Math.expm1((toYears / fromYears) * Math.log1p(-risk));
}
