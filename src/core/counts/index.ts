/** Statistics of a trial's two arms of counts: the option (intervention) arm and the comparison arm. */
export { analyseCounts } from './analyse-counts.ts';
export { checkArm } from './check-arm.ts';
export { chiSquareUpperTail } from './chi-square-upper-tail.ts';
export type {
  CountsAnalysis,
  CountsOptions,
  DifferenceMethod,
  IntervalEstimate,
  RatioEstimate,
  TestResult,
  TwoByTwoTable,
} from './counts-types.ts';
export { cramersV } from './cramers-v.ts';
export { fisherExactP } from './fisher-exact-p.ts';
export { newcombeDifference } from './newcombe-difference.ts';
export { oddsRatio } from './odds-ratio.ts';
export { pearsonChiSquare } from './pearson-chi-square.ts';
export { phiCoefficient } from './phi-coefficient.ts';
export { riskDifference } from './risk-difference.ts';
export { riskRatio } from './risk-ratio.ts';
export { twoByTwoTable } from './two-by-two-table.ts';
export { waldDifference } from './wald-difference.ts';
export { wilsonInterval } from './wilson-interval.ts';
export { yatesChiSquare } from './yates-chi-square.ts';
export { LEVEL_ABOVE, LEVEL_MAX, zForLevel } from './z-for-level.ts';
