import { erfc } from './normal-tail.ts';

const HALF_LOG_PI = 0.5 * Math.log(Math.PI);
const TINY = 1e-300;
const RELATIVE_TOLERANCE = 1e-15;
const MAX_TERMS = 500;

/**
 * P(χ² > statistic) with 1 degree of freedom, the upper regularized gamma Q(½, statistic/2).
 * Small arguments use Q(½, x/2) = erfc(√(x/2)); larger ones the continued fraction for Q
 * (modified Lentz, as in Press et al., Numerical Recipes, §6.2), so tiny p-values keep
 * their precision instead of cancelling to 0.
 */
export function chiSquareUpperTail(statistic: number): number {
  if (!(statistic > 0)) return 1;
  if (statistic === Infinity) return 0;
  const halfStatistic = statistic / 2;
  const shape = 0.5;
  if (halfStatistic < shape + 1) {
    return Math.min(1, Math.max(0, erfc(Math.sqrt(halfStatistic))));
  }
  let denominatorTerm = halfStatistic + 1 - shape;
  let ratioTerm = 1 / TINY;
  let inverse = 1 / denominatorTerm;
  let fraction = inverse;
  for (let step = 1; step <= MAX_TERMS; step += 1) {
    const numeratorTerm = -step * (step - shape);
    denominatorTerm += 2;
    inverse = numeratorTerm * inverse + denominatorTerm;
    if (Math.abs(inverse) < TINY) inverse = TINY;
    ratioTerm = denominatorTerm + numeratorTerm / ratioTerm;
    if (Math.abs(ratioTerm) < TINY) ratioTerm = TINY;
    inverse = 1 / inverse;
    const change = inverse * ratioTerm;
    fraction *= change;
    if (Math.abs(change - 1) < RELATIVE_TOLERANCE) break;
  }
  const upper = Math.exp(-halfStatistic + shape * Math.log(halfStatistic) - HALF_LOG_PI) * fraction;
  return Math.min(1, Math.max(0, upper));
}
