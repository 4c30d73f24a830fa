import { erfc } from './normal-tail.ts';

/**
 * P(χ² > statistic) with 1 degree of freedom: the upper regularized gamma Q(½, statistic/2),
 * which equals erfc(√(statistic/2)) (Abramowitz & Stegun 1964, 6.5.17 and 7.1.2), so tiny
 * p-values keep the relative precision of the error function's continued fraction
 * instead of cancelling to 0.
 */
export function chiSquareUpperTail(statistic: number): number {
  if (!(statistic > 0)) return 1;
  if (statistic === Infinity) return 0;
  return Math.min(1, Math.max(0, erfc(Math.sqrt(statistic / 2))));
}
