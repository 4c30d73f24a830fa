/** The largest n whose n! is a finite double (170! ≈ 7.3 × 10³⁰⁶). */
const EXACT_UP_TO = 170;

/**
 * ln(n!) for a whole n ≥ 0: the logarithm of the product itself up to 170!, and above that
 * Stirling's series ln n! = n·ln n − n + ½·ln(2πn) + 1/(12n) − 1/(360n³) + 1/(1260n⁵) − 1/(1680n⁷)
 * (Abramowitz & Stegun 1964, 6.1.41), whose next term is below 10⁻²⁰ there.
 */
export function logFactorial(n: number): number {
  if (!(Number.isInteger(n) && n >= 0)) throw new RangeError(`a factorial needs a whole number of 0 or more, not ${n}`);
  if (n <= EXACT_UP_TO) {
    let product = 1;
    for (let k = 2; k <= n; k += 1) product *= k;
    return Math.log(product);
  }
  const inverse = 1 / n;
  const inverseSquare = inverse * inverse;
  const series = inverse * (1 / 12 - inverseSquare * (1 / 360 - inverseSquare * (1 / 1260 - inverseSquare / 1680)));
  return n * Math.log(n) - n + 0.5 * Math.log(2 * Math.PI * n) + series;
}
