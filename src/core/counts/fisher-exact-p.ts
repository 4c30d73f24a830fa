import type { ArmCounts } from '../types.ts';
import { logFactorial } from './log-factorial.ts';
import { twoByTwoTable } from './two-by-two-table.ts';

/** Relative tolerance for ties between table probabilities, as in R's fisher.test. */
const TIE_TOLERANCE = 1e-7;
/** Below this log probability relative to the most likely table, a term is 0 in double precision. */
const NEGLIGIBLE_LOG = -750;
/**
 * A first look with log-factorials (`logFactorial`): an observed table this far below
 * the mode in log probability has p = 0 in double precision. The margin of 1250 beyond
 * NEGLIGIBLE_LOG covers the log-factorials' rounding, a few hundred at most for safe-integer totals.
 */
const SCREEN_LOG = -2000;
/** Terms more than e⁴⁰ (about 2 × 10¹⁷) times less likely than the observed table change no digit of p. */
const TAIL_MARGIN = 40;

/**
 * Fisher's exact test, two-sided: the probability, given the margins, of all tables no
 * more likely than the observed one (probability ≤ observed × (1 + 1e-7)), summed over
 * the hypergeometric distribution of the option arm's events.
 *
 * Probabilities are handled as logs relative to the most likely table (the mode), built
 * from the exact ratio of neighbouring hypergeometric terms, P(x + 1)/P(x) = (n₁ − x)(m₁ − x) /
 * ((x + 1)(n₂ − m₁ + x + 1)), so large totals neither overflow nor lose the precision
 * needed to detect ties. The distribution is unimodal, so the walk out from the mode stops
 * on each side once terms fall far below the observed one (or underflow); the work grows
 * with the square root of the totals, and a table hopelessly far out is recognised at once
 * from log-factorials. A table whose margins allow only itself gives p = 1,
 * as R's fisher.test does.
 */
export function fisherExactP(intervention: ArmCounts, comparison: ArmCounts): number | null {
  const table = twoByTwoTable(intervention, comparison);
  const optionTotal = intervention.total;
  const comparisonTotal = comparison.total;
  const eventTotal = table.optionEvents + table.comparisonEvents;
  const grandTotal = optionTotal + comparisonTotal;
  const lowest = Math.max(0, eventTotal - comparisonTotal);
  const highest = Math.min(optionTotal, eventTotal);
  if (lowest === highest) return 1;
  const observed = table.optionEvents;

  // ln P(x + 1) − ln P(x) for x option-arm events; the rounding of the products (about 1e−16
  // relative) is far inside the tie tolerance.
  const logStepUp = (events: number): number =>
    Math.log(((optionTotal - events) * (eventTotal - events)) / ((events + 1) * (comparisonTotal - eventTotal + events + 1)));
  // ln P(x + direction) − ln P(x).
  const logStep = (events: number, direction: 1 | -1): number => (direction === 1 ? logStepUp(events) : -logStepUp(events - 1));

  const modeGuess = Math.floor(((eventTotal + 1) * (optionTotal + 1)) / (grandTotal + 2));
  const mode = Math.min(highest, Math.max(lowest, modeGuess));
  const logFactorials = (events: number): number =>
    logFactorial(events) +
    logFactorial(optionTotal - events) +
    logFactorial(eventTotal - events) +
    logFactorial(comparisonTotal - eventTotal + events);
  if (logFactorials(mode) - logFactorials(observed) < SCREEN_LOG) return 0;

  const towardObserved: 1 | -1 = observed >= mode ? 1 : -1;
  const terms: number[] = [];

  // From the mode to the observed table.
  let events = mode;
  let logRelative = 0;
  while (events !== observed) {
    logRelative += logStep(events, towardObserved);
    events += towardObserved;
    // The observed table, and every table as unlikely, underflows: p is 0.
    if (logRelative < NEGLIGIBLE_LOG) return 0;
    terms.push(logRelative);
  }
  const observedLog = logRelative;
  const cutoff = Math.max(observedLog - TAIL_MARGIN, NEGLIGIBLE_LOG);

  // Beyond the observed table, then the other side of the mode, until terms are negligible.
  const farEnd = towardObserved === 1 ? highest : lowest;
  while (events !== farEnd && logRelative >= cutoff) {
    logRelative += logStep(events, towardObserved);
    events += towardObserved;
    terms.push(logRelative);
  }
  const otherEnd = towardObserved === 1 ? lowest : highest;
  events = mode;
  logRelative = 0;
  while (events !== otherEnd && logRelative >= cutoff) {
    logRelative += logStep(events, towardObserved === 1 ? -1 : 1);
    events -= towardObserved;
    terms.push(logRelative);
  }

  const threshold = observedLog + Math.log1p(TIE_TOLERANCE);
  let total = 1;
  let tail = threshold >= 0 ? 1 : 0;
  for (const term of terms) {
    const probability = Math.exp(term);
    total += probability;
    if (term <= threshold) tail += probability;
  }
  return Math.min(1, Math.max(0, tail / total));
}
