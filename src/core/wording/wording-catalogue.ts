/**
 * The shape of the wording catalogue: the named values each sentence template
 * receives. Code that computes chooses the case (which amount, which direction);
 * a language's catalogue turns it into words. A second language implements
 * `WordingMessages` in its own folder without touching the code that computes.
 */
import type { NntInterval } from '../nnt-interval.ts';
import type { TimeUnit } from '../time-unit.ts';
import type { Certainty, Importance } from '../topic/topic.ts';

/**
 * How many people out of the denominator, as a case the words can follow:
 * `none` (the risk is exactly 0), `fewer-than-one` (above 0 but rounds to 0),
 * `about` (a rounded count), `nearly-all` (rounds to everyone but is not certain),
 * `all` (the risk is exactly 1).
 */
export type Amount =
  | { readonly kind: 'none' }
  | { readonly kind: 'fewer-than-one' }
  | { readonly kind: 'about'; readonly count: number }
  | { readonly kind: 'nearly-all' }
  | { readonly kind: 'all' };

/** EU SmPC / CIOMS III frequency bands, plus `not-known` when no estimate exists. */
export type FrequencyBand = 'very-common' | 'common' | 'uncommon' | 'rare' | 'very-rare' | 'not-known';

/** Whether an option leaves fewer, more or the same number of people with the outcome. */
export type ChangeDirection = 'fewer' | 'more' | 'same';

/** The range of an option's effect, as people, in one of its plain cases. */
export type RangeCase =
  | { readonly variant: 'avoid' | 'get'; readonly low: number; readonly high: number }
  | { readonly variant: 'narrow'; readonly direction: 'fewer' | 'more'; readonly count: number }
  | { readonly variant: 'either'; readonly fewer: number; readonly more: number }
  | { readonly variant: 'no-change' }
  /** The whole range is smaller than one person in the denominator, but not exactly no change. */
  | { readonly variant: 'below-one' };

/** Values every option sentence shares. */
export interface OptionValues {
  readonly option: string;
  readonly outcome: string;
  /**
   * The event is one people want ("pain gone"): the words must not call it a risk, nor say
   * that an option "causes" it or that people "avoid" it. `fewer` / `more` stay the event's
   * direction; whether that helps follows from `wanted` (see `core/direction.ts`).
   */
  readonly wanted: boolean;
}

/** A period as the clinician gave it: its length in years and the unit to word it in. */
export interface PeriodValues {
  readonly years: number;
  readonly unit: TimeUnit;
}

/** The templates of every patient-facing and clinician-facing wording sentence. */
/** A number needed to treat, as both its sentence forms take it. */
export interface NntValues {
  readonly label: 'NNTB' | 'NNTH';
  readonly count: number;
  readonly group: string;
  /**
   * The interval's case and limits, for the catalogue to write in its words ("NNTB 13 to 100",
   * "NNTB 4 a ∞ a NNTH 20"), or null when the effect has no interval.
   */
  readonly interval: NntInterval | null;
  /** The interval reaches or crosses no difference. */
  readonly crossesNoEffect: boolean;
}

export interface WordingMessages {
  /** What a new topic's comparison is called until the clinician names it: "no treatment". */
  readonly newComparison: string;
  /** The reference class for `count` people: "people like you", "person like you". */
  readonly group: (count: number) => string;
  /** Who the numbers are for, from the clinician's own description. */
  readonly population: (values: { readonly population: string; readonly group: string }) => string;
  /** How many have the outcome with an option over the period. */
  readonly eventFrame: (
    values: OptionValues & {
      readonly amount: Amount;
      readonly denominator: number;
      readonly group: string;
    } & PeriodValues,
  ) => string;
  /** How many do not have it (the other frame of the same numbers). */
  readonly freeFrame: (values: { readonly amount: Amount; readonly denominator: number }) => string;
  /** The change an option makes, as people of the same denominator. */
  readonly change: (
    values: OptionValues & {
      readonly direction: ChangeDirection;
      /** People who avoid or get the outcome because of the option (0 when `same`). */
      readonly count: number;
      /** How many have the outcome either way, used when `same`. */
      readonly either: Amount;
      /**
       * When `same`: the direction of a difference too small to show as one person in the
       * denominator, or null when the difference is exactly 0 (only then "no difference").
       */
      readonly hidden: 'fewer' | 'more' | null;
      readonly denominator: number;
    },
  ) => string;
  /** The uncertainty range of the change, as people. */
  readonly range: (values: OptionValues & { readonly range: RangeCase; readonly denominator: number }) => string;
  /** No interval was given, so the precision is not known. */
  readonly rangeUnknown: (values: OptionValues) => string;
  /** A GRADE informative statement (Santesso et al. 2020). */
  readonly certainty: (
    values: OptionValues & {
      readonly certainty: Certainty;
      readonly importance: Importance;
      readonly direction: 'reduce' | 'increase';
    },
  ) => string;
  /**
   * The short form, for a page where the frames are captions under the pictures: the change an
   * option makes and its range in one sentence, led by the option's name and naming the outcome
   * only as "it". `range` is null when no interval was given.
   */
  readonly shortEffect: (
    values: OptionValues & {
      readonly direction: ChangeDirection;
      readonly count: number;
      readonly either: Amount;
      readonly hidden: 'fewer' | 'more' | null;
      readonly denominator: number;
      readonly range: RangeCase | null;
    },
  ) => string;
  /** The short form of the GRADE informative statement: the same certainty words, the option as "it". */
  readonly shortCertainty: (values: {
    readonly certainty: Certainty;
    readonly importance: Importance;
    readonly direction: 'reduce' | 'increase';
  }) => string;
  /** The short form of the number needed to treat: the same label and interval, without the names. */
  readonly shortNnt: (values: { readonly wanted: boolean } & NntValues & PeriodValues) => string;
  /** A frequency band word with the numbers with and without the option, and the change, beside it. */
  readonly band: (
    values: OptionValues & {
      readonly band: FrequencyBand;
      readonly amount: Amount;
      readonly denominator: number;
      /** The comparison option's name and its people with the outcome. */
      readonly comparison: string;
      readonly comparisonAmount: Amount;
      readonly direction: ChangeDirection;
      /** People more or fewer with the option (0 when `same`). */
      readonly count: number;
    },
  ) => string;
  /** Number needed to treat, for benefit (NNTB) or harm (NNTH), with its interval in Altman's (1998) form. */
  readonly nnt: (values: OptionValues & NntValues & PeriodValues) => string;
  /** No number needed to treat exists because the option makes no difference. */
  readonly nntNone: (values: OptionValues) => string;
  /** A relative change, always with the absolute numbers it comes from. */
  readonly relative: (
    values: OptionValues & {
      readonly from: number;
      readonly to: number;
      readonly denominator: number;
      readonly direction: 'reduction' | 'increase';
      readonly percent: number;
    },
  ) => string;
}
