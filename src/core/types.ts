/**
 * Shared value types of the calculation core. Every later layer (charts, wording,
 * handout, app, command line) reads these; none of them holds prose.
 */
import type { NntInterval } from './nnt-interval.ts';

/** An estimate with an optional interval; bounds are `null` when no interval exists. */
export interface Estimate {
  readonly estimate: number;
  readonly lower: number | null;
  readonly upper: number | null;
}

import type { EffectMeasure } from './effect-measures.ts';

/** The kinds of effect a clinician can enter for an option, from the registry in `effect-measures.ts`. */
export type { EffectMeasure };

/** One arm of a trial: events out of a total. */
export interface ArmCounts {
  readonly events: number;
  readonly total: number;
}

/**
 * A relative or absolute effect as entered.
 * - `rr`, `or`, `hr`: ratios (> 0).
 * - `rrr`: relative risk reduction in percent (< 100; 25 means 25%).
 * - `arr`: absolute risk reduction as a proportion (may be negative: an increase).
 * `lower`/`upper` are the limits of an interval at `level` (default 0.95), in the same units.
 */
export interface EnteredEffect {
  readonly measure: EffectMeasure;
  readonly estimate: number;
  readonly lower?: number | null;
  readonly upper?: number | null;
  readonly level?: number;
  /** The ratio was reported for the opposite event ("still in pain" for "pain gone"); see `riskWithOppositeEffect`. */
  readonly opposite?: boolean;
}

/** A trial's own counts: the option (intervention) arm and the comparison arm. */
export interface CountsEffect {
  readonly measure: 'counts';
  readonly intervention: ArmCounts;
  readonly comparison: ArmCounts;
  readonly level?: number;
  /** The counts are of the opposite event; each arm's events become total − events. */
  readonly opposite?: boolean;
}

export type Effect = EnteredEffect | CountsEffect;

/** Denominators a picture (icon array) may use. */
export type Denominator = 100 | 1000;

/**
 * Denominators the words and tables may use: the picture's, or a larger one when a rare
 * outcome's difference would round to no whole person out of 1000.
 */
export type WordsDenominator = 100 | 1000 | 10000 | 100000 | 1000000;

/** Every words denominator, smallest first. */
export const WORDS_DENOMINATORS: readonly WordsDenominator[] = [100, 1000, 10000, 100000, 1000000];

/** NNT as reported: `label` is NNTB (benefit) or NNTH (harm), after Altman (1998). */
export interface NumberNeeded {
  readonly estimate: number | null;
  readonly rounded: number | null;
  readonly label: 'NNTB' | 'NNTH' | null;
  /** The English text, kept as the JSON's `nnt.text`; screens word the parts themselves. */
  readonly text: string;
  /** The interval as parts (Altman 1998), for any language's words; null when the effect has none. */
  readonly interval: NntInterval | null;
}

/** Rounded people counts for one option against its comparison, per `denominator`. */
export interface PeopleCounts<D extends number = Denominator> {
  readonly denominator: D;
  readonly comparison: number;
  readonly intervention: number;
  /** comparison − intervention, signed: positive means fewer people have the outcome with the option. */
  readonly difference: number;
  /** The option's risk interval as people, when an interval exists. */
  readonly interventionRange: { readonly lower: number; readonly upper: number } | null;
}

/** The four groups of an icon array. The comparison arm has only `event` and `free`. */
export type PersonGroup = 'event' | 'prevented' | 'caused' | 'free';

export interface PeopleGroups {
  readonly denominator: Denominator;
  readonly event: number;
  readonly prevented: number;
  readonly caused: number;
  readonly free: number;
}

/** A warning as a code plus values; its sentence comes from the message catalogue. */
export interface Notice {
  readonly code: string;
  readonly values: Readonly<Record<string, string | number>>;
}
