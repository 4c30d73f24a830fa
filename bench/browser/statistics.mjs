/**
 * Summaries of timing samples: median and quartiles by linear interpolation between
 * order statistics (Hyndman & Fan 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50:361, definition 7, the default of R and NumPy).
 */

/**
 * The `share` quantile (0 to 1) of `values`; null for no values.
 * @param {readonly number[]} values
 * @param {number} share
 * @returns {number | null}
 */
export function quantile(values, share) {
  if (values.length === 0) return null;
  const sorted = [...values].sort((first, second) => first - second);
  const position = (sorted.length - 1) * share;
  const below = Math.floor(position);
  const above = Math.min(below + 1, sorted.length - 1);
  const lower = /** @type {number} */ (sorted[below]);
  const upper = /** @type {number} */ (sorted[above]);
  return lower + (upper - lower) * (position - below);
}

/**
 * Median, quartiles and count of `values`, rounded to 0.01.
 * @param {readonly number[]} values
 * @returns {{ median: number | null, p25: number | null, p75: number | null, n: number }}
 */
export function summarise(values) {
  const round = (/** @type {number | null} */ value) => (value === null ? null : Math.round(value * 100) / 100);
  return {
    median: round(quantile(values, 0.5)),
    p25: round(quantile(values, 0.25)),
    p75: round(quantile(values, 0.75)),
    n: values.length,
  };
}
