import type { Denominator, Estimate, Notice, NumberNeeded, PeopleCounts, PeopleGroups, WordsDenominator } from '../types.ts';
import type { TimeUnit } from '../time-unit.ts';
import type { Certainty, Importance } from './topic.ts';

/** The computed numbers of one option against the comparison, for one outcome. */
export interface EffectResult {
  /** Null only for an absolute reduction entered without a baseline. */
  readonly comparisonRisk: Estimate | null;
  readonly interventionRisk: Estimate | null;
  /** The risk ratio implied at this baseline, whatever measure was entered. */
  readonly relativeRisk: Estimate | null;
  /**
   * comparison − option risk; negative means the option increases the outcome. Whether that
   * helps depends on the event's direction: use `changeOf` in `core/direction.ts`.
   */
  readonly absoluteReduction: Estimate;
  readonly nnt: NumberNeeded;
  /** The level of the intervals (0.95 unless the effect gives another); null for the comparison itself. */
  readonly level: number | null;
  readonly perPeople: PeopleCounts | null;
  readonly notices: readonly Notice[];
}

/** One option's results for one outcome, inside a topic. */
export interface OptionOutcomeResult extends EffectResult {
  readonly optionId: string;
  readonly name: string;
  readonly isComparison: boolean;
  readonly comparisonRisk: Estimate;
  readonly interventionRisk: Estimate;
  readonly perPeople: PeopleCounts;
  /** The people counts at the topic's words denominator (`TopicResult.wordsDenominator`). */
  readonly wordsPeople: PeopleCounts<WordsDenominator>;
  /** The four icon-array groups from the rounded people counts. */
  readonly groups: PeopleGroups;
  /** GRADE certainty and importance, for the wording; null for the comparison. */
  readonly certainty: Certainty | null;
  readonly importance: Importance | null;
  readonly source: string;
}

export interface OutcomeResult {
  readonly outcomeId: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /** The event is one people want: more of it helps (see `core/direction.ts`). */
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  /** The baseline risk over the topic's period (after any period conversion). */
  readonly baselineRisk: number;
  readonly baselineSource: string;
  /**
   * How the baseline was converted to the topic's period (a `baseline-period-converted`
   * notice), so the conversion can be shown beside the outcome; null or absent when it was not.
   */
  readonly baselineConversion?: Notice | null;
  readonly options: readonly OptionOutcomeResult[];
}

/** A whole topic, computed in one call. */
export interface TopicResult {
  readonly title: string;
  readonly population: string;
  readonly periodYears: number;
  /** The unit the topic's period was given in, for the wording. */
  readonly periodUnit: TimeUnit;
  /** The pictures' denominator: 100 or 1000. */
  readonly denominator: Denominator;
  /**
   * The words' and tables' denominator: the pictures', or 10,000 up to 1,000,000 when a rare
   * outcome's difference would round to no whole person out of 1000.
   */
  readonly wordsDenominator: WordsDenominator;
  readonly illustrative: boolean;
  readonly outcomes: readonly OutcomeResult[];
  readonly notices: readonly Notice[];
}
