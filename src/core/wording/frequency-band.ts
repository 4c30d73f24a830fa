import { decimalAtLeast } from './decimal-at-least.ts';
import type { FrequencyBand } from './wording-catalogue.ts';

/** Lower bounds of the bands, inclusive, as exact decimals (EU SmPC guideline, CIOMS III). */
export const FREQUENCY_BAND_LOWER_BOUNDS: readonly { readonly band: FrequencyBand; readonly atLeast: string }[] = [
  { band: 'very-common', atLeast: '0.1' },
  { band: 'common', atLeast: '0.01' },
  { band: 'uncommon', atLeast: '0.001' },
  { band: 'rare', atLeast: '0.0001' },
];

/**
 * The EU SmPC / CIOMS III frequency band of a risk: very common ≥ 1/10, common
 * ≥ 1/100, uncommon ≥ 1/1000, rare ≥ 1/10000, very rare below, and not known
 * when no estimate exists. Lower bounds are inclusive and compared as exact
 * decimals, so 0.1 is very common and 0.0999 is common.
 *
 * @param risk - a proportion from 0 to 1, or null when it cannot be estimated
 * @returns the band
 * @example frequencyBand(0.03) // => 'common'
 */
export function frequencyBand(risk: number | null): FrequencyBand {
  if (risk === null || !Number.isFinite(risk)) return 'not-known';
  const found = FREQUENCY_BAND_LOWER_BOUNDS.find((bound) => decimalAtLeast(risk, bound.atLeast));
  return found === undefined ? 'very-rare' : found.band;
}
