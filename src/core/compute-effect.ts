import { DEFAULT_LEVEL, checkEffect, checkLevel } from './check-effect.ts';
import { analyseCounts } from './counts/index.ts';
import type { CountsAnalysis } from './counts/index.ts';
import { convertRiskPeriod } from './convert-period.ts';
import { effectAtBaseline } from './effect-at-baseline.ts';
import type { EffectAtBaseline } from './effect-at-baseline.ts';
import { numberNeeded } from './number-needed.ts';
import {
  chooseDenominator,
  chooseWordsDenominator,
  peopleCounts,
  showsSameCount,
  pictureDenominatorFor,
  roundingShift,
} from './people-counts.ts';
import type { RiskPair } from './people-counts.ts';
import { fail } from './problems.ts';
import type { EffectResult } from './topic/topic-result.ts';
import { amountIn } from './time-unit.ts';
import type { TimeUnit } from './time-unit.ts';
import type { CountsEffect, Denominator, Effect, Estimate, Notice, PeopleCounts, WordsDenominator } from './types.ts';

/** Everything needed to compute one option's effect on one outcome. */
export interface EffectQuery {
  /** The patient's baseline risk (0 < p < 1); null for an absolute reduction alone or for trial counts alone. */
  readonly baseline: number | null;
  readonly effect: Effect;
  /** The period the baseline covers and the period wanted, in years, with the units they were given in. */
  readonly periods?: {
    readonly baselineYears: number;
    readonly targetYears: number;
    readonly baselineUnit?: TimeUnit;
    readonly targetUnit?: TimeUnit;
  } | null;
  /** The period over which the effect was measured, in years, and the unit it was given in. */
  readonly followUpYears?: number | null;
  readonly followUpUnit?: TimeUnit;
  /** The period the result is for, when known, for the follow-up warning. */
  readonly resultYears?: number | null;
  readonly resultUnit?: TimeUnit;
  /**
   * A fixed denominator for the words (the pictures use 1000 above 1000); otherwise the rules
   * of `chooseDenominator` and `chooseWordsDenominator`.
   */
  readonly per?: WordsDenominator | null;
  readonly method?: 'newcombe' | 'wald';
  /** Where problems are reported ("effect", "outcomes.0.effects.1.effect"). */
  readonly field?: string;
  /** The event is one people want ("pain gone by day 3"): more of it helps. Default false. */
  readonly wanted?: boolean;
}

/** One effect's numbers, and for trial counts the trial's own statistics. */
export interface EffectComputation extends EffectResult {
  readonly counts: CountsAnalysis | null;
  /** The baseline after any period conversion, or null. */
  readonly baselineUsed: number | null;
  /** The people counts at the words' denominator (10,000 and up for rare outcomes), or null. */
  readonly wordsPeople: PeopleCounts<WordsDenominator> | null;
}

/** The two denominators of a set of risk pairs, chosen or forced, with the notices that explain them. */
export interface DenominatorChoice {
  readonly picture: Denominator;
  readonly words: WordsDenominator;
  readonly notices: readonly Notice[];
}

/**
 * Choose the pictures' and the words' denominators for a set of risk pairs (one topic, or one
 * effect), or take the forced one, and say what the choice achieved: raised to show a difference,
 * a difference still below one in a million, or rounding that moves a difference by half a
 * person or more at the denominator used.
 */
export function chooseDenominators(pairs: readonly RiskPair[], per: WordsDenominator | null): DenominatorChoice {
  const chosen = per === null ? chooseDenominator(pairs) : pictureDenominatorFor(per);
  const words = per ?? chooseWordsDenominator(pairs, chosen);
  // Words counted per 10,000 or more go with the larger picture, 1000.
  const picture: Denominator = words > 100 ? 1000 : chosen;
  const notices: Notice[] = [];
  if (per === null && words > 100) notices.push(notice('denominator-raised', { denominator: words, picture }));
  const tiny = pairs.some(
    (pair) => pair.comparison !== pair.intervention && Math.abs(pair.comparison - pair.intervention) * 1000000 < 0.5,
  );
  if (tiny && words === 1000000) notices.push(notice('difference-below-one-in-a-million'));
  const hidden = pairs.some((pair) => pair.comparison !== pair.intervention && showsSameCount(pair, words));
  if (hidden && words < 1000000) notices.push(notice('rounding-hides-difference', { denominator: words }));
  const moved = pairs.reduce((largest, pair) => Math.max(largest, roundingShift(pair, words)), 0);
  if (moved >= 0.5 - 1e-9)
    notices.push(notice('rounding-moves-difference', { denominator: words, people: Number(moved.toFixed(2)) }));
  return { picture, words, notices };
}

const notice = (code: string, values: Notice['values'] = {}): Notice => ({ code, values });
const point = (estimate: number): Estimate => ({ estimate, lower: null, upper: null });

function convertedBaseline(query: EffectQuery, notices: Notice[]): number | null {
  const { baseline, periods } = query;
  if (baseline === null || periods === null || periods === undefined) return baseline;
  if (periods.baselineYears === periods.targetYears) return baseline;
  const converted = convertRiskPeriod(baseline, periods.baselineYears, periods.targetYears, `${query.field ?? 'effect'}.period`);
  const fromUnit = periods.baselineUnit ?? 'years';
  const toUnit = periods.targetUnit ?? 'years';
  notices.push(
    notice('baseline-period-converted', {
      risk: baseline,
      from: amountIn(periods.baselineYears, fromUnit),
      fromUnit,
      to: amountIn(periods.targetYears, toUnit),
      toUnit,
      converted,
    }),
  );
  return converted;
}

function countsAtBaseline(baseline: number, analysis: CountsAnalysis, field: string): EffectAtBaseline {
  const ratio = analysis.relativeRisk;
  if (ratio !== null) {
    const interval = ratio.lower === null || ratio.upper === null ? null : { lower: ratio.lower, upper: ratio.upper };
    return effectAtBaseline(
      baseline,
      { measure: 'rr', estimate: ratio.estimate, interval, level: analysis.level, opposite: false },
      field,
    );
  }
  const difference = analysis.riskDifference;
  const interval =
    difference.lower === null || difference.upper === null ? null : { lower: difference.lower, upper: difference.upper };
  return effectAtBaseline(
    baseline,
    { measure: 'arr', estimate: difference.estimate, interval, level: analysis.level, opposite: false },
    field,
  );
}

/** Counts of the opposite event, turned into counts of the outcome: events become total − events. */
function countsOfOutcome(effect: CountsEffect): CountsEffect {
  if (effect.opposite !== true) return effect;
  const flip = (arm: CountsEffect['comparison']) => ({ events: arm.total - arm.events, total: arm.total });
  return { ...effect, intervention: flip(effect.intervention), comparison: flip(effect.comparison), opposite: false };
}

function fromCounts(query: EffectQuery, entered: CountsEffect, baseline: number | null, notices: Notice[]) {
  const level = checkLevel(entered.level ?? DEFAULT_LEVEL, `${query.field ?? 'effect'}.level`);
  const effect = countsOfOutcome(entered);
  const analysis = analyseCounts(effect.intervention, effect.comparison, { level, method: query.method ?? 'newcombe' });
  notices.push(...analysis.notices);
  if (baseline === null) {
    return {
      analysis,
      comparisonRisk: analysis.comparisonRisk,
      applied: {
        interventionRisk: analysis.interventionRisk,
        relativeRisk: analysis.relativeRisk,
        absoluteReduction: analysis.riskDifference,
      },
    };
  }
  return { analysis, comparisonRisk: point(baseline), applied: countsAtBaseline(baseline, analysis, query.field ?? 'effect') };
}

/**
 * Compute one option's effect: the risks with and without it, the implied risk ratio, the
 * absolute reduction, the NNT, and the people counts, with warnings as notices.
 *
 * @throws InputError for any invalid input (see the problem codes)
 * @example computeEffect({ baseline: 0.3, effect: { measure: 'rr', estimate: 0.92 } }).nnt.rounded // => 42
 */
export function computeEffect(query: EffectQuery): EffectComputation {
  const field = query.field ?? 'effect';
  const notices: Notice[] = [];
  const baseline = convertedBaseline(query, notices);
  const { effect } = query;
  let comparisonRisk: Estimate | null;
  let interventionRisk: Estimate | null;
  let relativeRisk: Estimate | null;
  let absoluteReduction: Estimate;
  let counts: CountsAnalysis | null = null;
  let hasInterval: boolean;
  let level: number;
  if (effect.measure === 'counts') {
    const computed = fromCounts(query, effect, baseline, notices);
    counts = computed.analysis;
    level = computed.analysis.level;
    comparisonRisk = computed.comparisonRisk;
    ({ interventionRisk, relativeRisk, absoluteReduction } = computed.applied);
    hasInterval = baseline !== null && absoluteReduction.lower !== null;
  } else {
    const checked = checkEffect(effect, field);
    level = checked.level;
    hasInterval = checked.interval !== null && baseline !== null;
    if (baseline === null) {
      if (checked.measure !== 'arr') fail('baseline-missing', `${field}.baseline`);
      const bounds = checked.interval;
      comparisonRisk = null;
      interventionRisk = null;
      relativeRisk = null;
      absoluteReduction = { estimate: checked.estimate, lower: bounds?.lower ?? null, upper: bounds?.upper ?? null };
    } else {
      comparisonRisk = point(baseline);
      ({ interventionRisk, relativeRisk, absoluteReduction } = effectAtBaseline(baseline, checked, field));
    }
    if (checked.measure === 'hr') notices.push(notice('hr-proportional-hazards'));
    if (checked.opposite && baseline !== null) {
      notices.push(
        notice(checked.measure === 'or' ? 'opposite-odds-ratio-inverted' : 'opposite-ratio-applied', {
          measure: checked.measure,
        }),
      );
    }
  }
  if (hasInterval) notices.push(notice('interval-ignores-baseline-uncertainty'));
  const resultYears = query.resultYears ?? query.periods?.targetYears ?? null;
  const followUp = query.followUpYears ?? null;
  if (followUp !== null && resultYears !== null && resultYears > followUp) {
    const periodUnit = query.resultUnit ?? query.periods?.targetUnit ?? 'years';
    const followupUnit = query.followUpUnit ?? 'years';
    notices.push(
      notice('period-beyond-followup', {
        period: amountIn(resultYears, periodUnit),
        periodUnit,
        followup: amountIn(followUp, followupUnit),
        followupUnit,
      }),
    );
  }
  let perPeople = null;
  let wordsPeople = null;
  if (comparisonRisk !== null && interventionRisk !== null) {
    const choice = chooseDenominators(
      [{ comparison: comparisonRisk.estimate, intervention: interventionRisk.estimate }],
      query.per ?? null,
    );
    notices.push(...choice.notices);
    perPeople = peopleCounts(comparisonRisk.estimate, interventionRisk, choice.picture);
    wordsPeople = peopleCounts(comparisonRisk.estimate, interventionRisk, choice.words);
  }
  return {
    comparisonRisk,
    interventionRisk,
    relativeRisk,
    absoluteReduction,
    nnt: numberNeeded(absoluteReduction, { wanted: query.wanted === true }),
    level,
    perPeople,
    notices,
    counts,
    baselineUsed: baseline,
    wordsPeople,
  };
}
