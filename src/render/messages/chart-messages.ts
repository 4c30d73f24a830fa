/**
 * The shape of the people charts' wording (titles, group labels, range sentences) and the
 * values its sentences take. Types only: each language is a sibling module (`en.ts`, `es.ts`).
 */
import type { TimeUnit } from '../../core/time-unit.ts';
import type { PersonGroup } from '../../core/types.ts';

/** Which arm an array shows: the comparison (no option) or an option. */
export type ArmRole = 'comparison' | 'option';

export interface TitleValues {
  readonly denominator: number;
  readonly option: string;
  readonly periodYears: number | null;
  /** The unit the period was given in (default years). */
  readonly periodUnit?: TimeUnit;
}

export interface LabelValues {
  readonly count: number;
  /** The outcome as used in a sentence: "a stroke", "muscle pain". */
  readonly outcome: string;
  /** The option's name as written in the topic. */
  readonly option: string;
  readonly role: ArmRole;
}

export interface RangeValues {
  readonly lower: number;
  readonly upper: number;
  readonly denominator: number;
  readonly outcome: string;
  readonly option: string;
  /** The interval's level (0.95 for a 95% interval), or null when it is not known. */
  readonly level: number | null;
}

/** A range whose ends show as the same number of people: less than one person wide. */
export interface NarrowRangeValues extends RangeValues {
  /** The same range counted per more people, when that shows its ends apart; else null. */
  readonly words: { readonly lower: number; readonly upper: number; readonly denominator: number } | null;
}

/** A difference too small to show as a whole person in the pictures (see `hidden-difference.ts`). */
export interface BelowOneValues {
  readonly outcome: string;
  readonly option: string;
  /** The pictures' denominator. */
  readonly denominator: number;
  readonly direction: 'fewer' | 'more';
  /** The difference per `wordsDenominator`; 0 below one in a million. */
  readonly count: number;
  /** Null below one in a million. */
  readonly wordsDenominator: number | null;
}

/** Group labels, one per group of people in an array. */
export type LabelWords = Readonly<Record<PersonGroup, (values: LabelValues) => string>>;

/** The shape every language's chart wording provides. */
export interface ChartMessages {
  readonly heading: (outcome: string, periodYears: number | null, periodUnit?: TimeUnit) => string;
  readonly illustrative: string;
  readonly optionTitle: (values: TitleValues) => string;
  readonly comparisonTitle: (values: TitleValues) => string;
  readonly pairComparisonName: string;
  readonly pairOptionName: string;
  readonly pairTitle: (values: TitleValues, role: ArmRole) => string;
  readonly causeName: (option: string, bare: boolean) => string;
  readonly defaultOutcome: string;
  /** Group labels of an event people want to avoid ("a stroke"). */
  readonly labels: LabelWords;
  /**
   * Group labels of an event people want ("pain gone by day 3"): `caused` people gain it
   * because of the option, `prevented` people miss out on it. Never "avoid" or "risk".
   */
  readonly wantedLabels: LabelWords;
  /** Only when the exact difference is 0. */
  readonly noDifference: (outcome: string, option: string) => string;
  /** A difference that is not 0 but shows as no whole person in the pictures. */
  readonly belowOnePerson: (values: BelowOneValues) => string;
  readonly range: (values: RangeValues) => string;
  readonly narrowRange: (values: NarrowRangeValues) => string;
  readonly rangeOutline: (outcome: string, option: string) => string;
  readonly summary: (title: string, labels: readonly string[]) => string;
}
