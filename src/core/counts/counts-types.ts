/**
 * Value types of the trial-counts statistics: estimates with intervals, test
 * results and the full analysis of two arms.
 */
import type { Estimate, Notice } from '../types.ts';

/** An estimate whose interval always exists, with lower ≤ estimate ≤ upper. */
export interface IntervalEstimate extends Estimate {
  readonly lower: number;
  readonly upper: number;
}

/** A risk ratio or odds ratio; `corrected` is true when 0.5 was added to every cell. */
export interface RatioEstimate extends IntervalEstimate {
  readonly corrected: boolean;
}

/** A test statistic with its two-sided p-value. */
export interface TestResult {
  readonly statistic: number;
  readonly p: number;
}

/** The interval method for the risk difference: Newcombe's hybrid score (method 10) or Wald (method 1). */
export type DifferenceMethod = 'newcombe' | 'wald';

/** Options of `analyseCounts`. */
export interface CountsOptions {
  /** Interval level, 0.5 < level ≤ 0.999; 0.95 when absent. */
  readonly level?: number;
  /** Risk-difference interval method; 'newcombe' when absent. */
  readonly method?: DifferenceMethod;
}

/** The four cells of a trial's 2×2 table: option arm first, events before non-events. */
export interface TwoByTwoTable {
  readonly optionEvents: number;
  readonly optionNonEvents: number;
  readonly comparisonEvents: number;
  readonly comparisonNonEvents: number;
}

/** Everything the core reports about two trial arms. */
export interface CountsAnalysis {
  /** The level of every interval below. */
  readonly level: number;
  /** The option arm's risk with its Wilson interval. */
  readonly interventionRisk: IntervalEstimate;
  /** The comparison arm's risk with its Wilson interval. */
  readonly comparisonRisk: IntervalEstimate;
  /** Option risk / comparison risk (Katz log interval); null when undefined. */
  readonly relativeRisk: RatioEstimate | null;
  /** Option odds / comparison odds (Woolf logit interval); null when undefined. */
  readonly oddsRatio: RatioEstimate | null;
  /** Comparison risk − option risk: positive means the option reduces the outcome. */
  readonly riskDifference: IntervalEstimate;
  /** Pearson chi-square with 1 degree of freedom; null with a zero margin. */
  readonly chiSquare: TestResult | null;
  /** Yates-corrected chi-square (correction capped at |O − E|); null with a zero margin. */
  readonly chiSquareYates: TestResult | null;
  /** Fisher's exact test, two-sided p. */
  readonly fisherExactP: number | null;
  /** Phi coefficient, positive when events go with the option arm; null with a zero margin. */
  readonly phi: number | null;
  /** Cramér's V (|phi| for a 2×2 table); null with a zero margin. */
  readonly cramersV: number | null;
  readonly notices: readonly Notice[];
}
