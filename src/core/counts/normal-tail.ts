/**
 * The standard normal distribution's upper tail and its inverse, in double precision,
 * through the complementary error function: Q(z) = P(Z > z) = ½·erfc(z/√2).
 *
 * erfc(x) for 0 ≤ x < 2 comes from the series of positive terms
 * erf(x) = (2/√π)·e^(−x²)·Σ 2ⁿx^(2n+1)/(1·3·…·(2n+1)) (Abramowitz & Stegun 1964, 7.1.6),
 * and for x ≥ 2 from the continued fraction
 * erfc(x) = (e^(−x²)/√π)·1/(x + ½/(x + 1/(x + (3/2)/(x + …)))) (7.1.14), evaluated with the
 * modified Lentz method (Press et al., Numerical Recipes, §5.2), which keeps the relative
 * precision of tiny tails.
 */

const SQRT_PI = Math.sqrt(Math.PI);
const SQRT_TWO_PI = Math.sqrt(2 * Math.PI);
const SERIES_BELOW = 2;
const RELATIVE_TOLERANCE = 1e-16;
const TINY = 1e-300;
const MAX_TERMS = 500;

function erfSeries(x: number): number {
  const square = x * x;
  let term = x;
  let sum = x;
  for (let n = 0; n < MAX_TERMS; n += 1) {
    term *= (2 * square) / (2 * n + 3);
    sum += term;
    if (term < sum * RELATIVE_TOLERANCE) break;
  }
  return (2 / SQRT_PI) * Math.exp(-square) * sum;
}

function erfcContinuedFraction(x: number): number {
  let fraction = x;
  let ratioTerm = x;
  let inverse = 0;
  for (let n = 1; n <= MAX_TERMS; n += 1) {
    const numerator = n / 2;
    inverse = x + numerator * inverse;
    if (Math.abs(inverse) < TINY) inverse = TINY;
    ratioTerm = x + numerator / ratioTerm;
    if (Math.abs(ratioTerm) < TINY) ratioTerm = TINY;
    inverse = 1 / inverse;
    const change = ratioTerm * inverse;
    fraction *= change;
    if (Math.abs(change - 1) < RELATIVE_TOLERANCE) break;
  }
  return Math.exp(-x * x) / (SQRT_PI * fraction);
}

/** The complementary error function erfc(x) = 1 − erf(x). */
export function erfc(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x < 0) return 2 - erfc(-x);
  if (x === Infinity) return 0;
  return x < SERIES_BELOW ? 1 - erfSeries(x) : erfcContinuedFraction(x);
}

/** P(Z > z) for a standard normal Z. */
export function normalUpperTail(z: number): number {
  return erfc(z / Math.SQRT2) / 2;
}

/**
 * The z with P(Z > z) = `tail`, for 0 < tail ≤ ½ (so z ≥ 0). A start from Abramowitz &
 * Stegun 26.2.23 (error below 4.5 × 10⁻⁴) is refined by Halley's method on the tail
 * itself, which converges to double precision in two or three steps.
 */
export function normalUpperQuantile(tail: number): number {
  if (!(tail > 0 && tail <= 0.5)) throw new RangeError(`a normal upper tail must be in (0, 0.5], not ${tail}`);
  const t = Math.sqrt(-2 * Math.log(tail));
  let z = t - (2.515517 + 0.802853 * t + 0.010328 * t * t) / (1 + 1.432788 * t + 0.189269 * t * t + 0.001308 * t * t * t);
  for (let step = 0; step < 4; step += 1) {
    // Φ(z) − p, written through the tails: (1 − Q(z)) − (1 − tail) = tail − Q(z).
    const excess = tail - normalUpperTail(z);
    const newton = excess * SQRT_TWO_PI * Math.exp((z * z) / 2);
    const next = z - newton / (1 + (z * newton) / 2);
    if (Math.abs(next - z) <= 1e-15 * Math.abs(next)) return next;
    z = next;
  }
  return z;
}
