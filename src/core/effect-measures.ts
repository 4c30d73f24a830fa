/**
 * The one registry of effect measures. Each measure is described once: how its values are
 * typed, which values it allows, the formula that applies it to a baseline risk, an example
 * and the source of the formula. The type `EffectMeasure`, the topic file's schema, the
 * editor's choices and examples, the command line's flags and the names in every catalogue
 * are derived from it (a catalogue is a `Record<EffectMeasure, …>`, so a missing name fails
 * the type-check). To add a measure, add an entry here and its names in the catalogues.
 */
import type { ProblemCode } from './problems.ts';

/** How a value of the measure is typed: a plain ratio, a percentage, or a risk difference. */
export type MeasureInput = 'ratio' | 'percent' | 'difference';

export interface MeasureSpec {
  readonly input: MeasureInput;
  /** The command-line flag that gives the measure. */
  readonly flag: string;
  /** A typical estimate and interval, as a clinician would type them (arr in percentage points). */
  readonly example: { readonly estimate: string; readonly lower: string; readonly upper: string };
  /** True for a value the measure allows; otherwise `problem` says what is wrong. */
  readonly allows: (value: number) => boolean;
  readonly problem: ProblemCode;
  /** The risk with the option at baseline risk `p` for one value of the measure (not range-checked). */
  readonly risk: (value: number, p: number) => number;
  /** Where the formula comes from. */
  readonly source: string;
}

const positive = (value: number): boolean => value > 0;

export const EFFECT_MEASURES = {
  rr: {
    input: 'ratio',
    flag: '--rr',
    example: { estimate: '0.75', lower: '0.6', upper: '0.9' },
    allows: positive,
    problem: 'ratio-not-positive',
    risk: (value, p) => p * value,
    source: 'Cochrane Handbook 5.1 §12.5.4: p·RR',
  },
  or: {
    input: 'ratio',
    flag: '--or',
    example: { estimate: '0.73', lower: '0.6', upper: '0.9' },
    allows: positive,
    problem: 'ratio-not-positive',
    // OR·p / (1 − p + OR·p), written as 1 / (1 + (1 − p) / (OR·p)) so that every step is
    // monotone under rounding: a larger odds ratio never gives a smaller risk, even by one ulp.
    risk: (value, p) => 1 / (1 + (1 - p) / (value * p)),
    source: 'Cochrane Handbook 5.1 §12.5.4.3: OR·p / (1 − p + OR·p)',
  },
  hr: {
    input: 'ratio',
    flag: '--hr',
    example: { estimate: '0.8', lower: '0.6', upper: '0.9' },
    allows: positive,
    problem: 'ratio-not-positive',
    risk: (value, p) => -Math.expm1(value * Math.log1p(-p)),
    source: 'Altman & Andersen 1999, BMJ 319:1492: 1 − (1 − p)^HR, under proportional hazards',
  },
  rrr: {
    input: 'percent',
    flag: '--rrr',
    example: { estimate: '25', lower: '10', upper: '40' },
    allows: (value) => value < 100,
    problem: 'rrr-out-of-range',
    risk: (value, p) => p * (1 - value / 100),
    source: 'Cochrane Handbook 5.1 §12.5.4: p·(1 − RRR)',
  },
  arr: {
    input: 'difference',
    flag: '--arr',
    example: { estimate: '3', lower: '1', upper: '5' },
    allows: (value) => value > -1 && value < 1,
    problem: 'arr-out-of-range',
    risk: (value, p) => p - value,
    source: 'Cochrane Handbook 5.1 §12.5.4: p − ARR',
  },
} as const satisfies Readonly<Record<string, MeasureSpec>>;

/** The kinds of effect a clinician can enter for an option. */
export type EffectMeasure = keyof typeof EFFECT_MEASURES;

/** Every measure, in the order the editor and the messages list them. */
export const MEASURES = Object.keys(EFFECT_MEASURES) as [EffectMeasure, ...EffectMeasure[]];

/** True for the name of a measure. */
export function isEffectMeasure(value: unknown): value is EffectMeasure {
  return typeof value === 'string' && Object.hasOwn(EFFECT_MEASURES, value);
}
