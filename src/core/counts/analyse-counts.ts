import { DEFAULT_LEVEL } from '../check-effect.ts';
import type { ArmCounts, Notice } from '../types.ts';
import { checkArm } from './check-arm.ts';
import type { CountsAnalysis, CountsOptions } from './counts-types.ts';
import { cramersV } from './cramers-v.ts';
import { fisherExactP } from './fisher-exact-p.ts';
import { oddsRatio } from './odds-ratio.ts';
import { pearsonChiSquare } from './pearson-chi-square.ts';
import { phiCoefficient } from './phi-coefficient.ts';
import { riskDifference } from './risk-difference.ts';
import { riskRatio } from './risk-ratio.ts';
import { wilsonInterval } from './wilson-interval.ts';
import { yatesChiSquare } from './yates-chi-square.ts';
import { zForLevel } from './z-for-level.ts';

/**
 * Analyse a trial's two arms: each arm's risk (Wilson), risk ratio (Katz), odds ratio
 * (Woolf), risk difference as comparison − option (Newcombe or Wald), Pearson and Yates
 * chi-square, Fisher's exact p, phi and Cramér's V, with notices for corrected or
 * undefined ratios. Throws an InputError for an invalid arm or level.
 */
export function analyseCounts(intervention: ArmCounts, comparison: ArmCounts, options: CountsOptions = {}): CountsAnalysis {
  const level = options.level ?? DEFAULT_LEVEL;
  checkArm(intervention, 'intervention');
  checkArm(comparison, 'comparison');
  zForLevel(level);

  const relativeRisk = riskRatio(intervention, comparison, level);
  const odds = oddsRatio(intervention, comparison, level);
  const notices: Notice[] = [];
  if (relativeRisk === null || odds === null) {
    notices.push({ code: 'counts-ratios-undefined', values: {} });
  } else if (relativeRisk.corrected || odds.corrected) {
    notices.push({ code: 'counts-zero-cell-corrected', values: {} });
  }

  return {
    level,
    interventionRisk: wilsonInterval(intervention.events, intervention.total, level),
    comparisonRisk: wilsonInterval(comparison.events, comparison.total, level),
    relativeRisk,
    oddsRatio: odds,
    riskDifference: riskDifference(intervention, comparison, level, options.method ?? 'newcombe'),
    chiSquare: pearsonChiSquare(intervention, comparison),
    chiSquareYates: yatesChiSquare(intervention, comparison),
    fisherExactP: fisherExactP(intervention, comparison),
    phi: phiCoefficient(intervention, comparison),
    cramersV: cramersV(intervention, comparison),
    notices,
  };
}
