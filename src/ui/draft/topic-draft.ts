/**
 * The editor's copy of a topic: the topic's shape with every number kept as the text
 * the person typed, so nothing typed is ever thrown away, even while it is not valid.
 * Effects are kept for every option (also one that is now the comparison), so that
 * switching the comparison back and forth loses nothing.
 */
import type { TimeUnit } from '../../core/time-unit.ts';
import type { Certainty, Importance, TopicDisclosures, TopicHandoutChoices, TopicTranslation } from '../../core/topic/topic.ts';
import type { EffectMeasure } from '../../core/types.ts';

/** The measures an effect can be entered in: the core's five, or a trial's own counts. */
export type DraftMeasure = EffectMeasure | 'counts';

export interface EffectDraft {
  readonly optionId: string;
  readonly measure: DraftMeasure;
  readonly estimate: string;
  readonly lower: string;
  readonly upper: string;
  /** The interval level, when a file gave one other than 95%; not edited in the app. */
  readonly level: number | null;
  /** The ratio or counts were reported for the opposite event ("still in pain" for "pain gone"). */
  readonly opposite: boolean;
  readonly interventionEvents: string;
  readonly interventionTotal: string;
  readonly comparisonEvents: string;
  readonly comparisonTotal: string;
  readonly source: string;
  /** The follow-up as typed, in `followUpUnit` (the name is the topic's field it becomes). */
  readonly followUpYears: string;
  readonly followUpUnit: TimeUnit;
  readonly certainty: Certainty;
  readonly importance: Importance;
}

export interface OptionDraft {
  readonly id: string;
  readonly name: string;
  readonly isComparison: boolean;
}

export interface OutcomeDraft {
  readonly id: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /** The event is one people want ("pain gone by day 3"); false: one they want to avoid. */
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  /** As typed: "15%", "1 in 5", "0.15"; empty when every effect is trial counts. */
  readonly baselineRisk: string;
  /** The baseline's period as typed, in `baselinePeriodUnit`. */
  readonly baselinePeriodYears: string;
  readonly baselinePeriodUnit: TimeUnit;
  readonly baselineSource: string;
  readonly effects: readonly EffectDraft[];
}

export interface TopicDraft {
  readonly title: string;
  readonly population: string;
  /** The topic's period as typed, in `periodUnit`. */
  readonly periodYears: string;
  readonly periodUnit: TimeUnit;
  readonly illustrative: boolean;
  readonly options: readonly OptionDraft[];
  readonly outcomes: readonly OutcomeDraft[];
  readonly evidenceSummary: string;
  readonly evidenceReviewed: string;
  readonly questions: readonly string[];
  readonly clinician: string;
  readonly patientName: string;
  readonly patientReference: string;
  /** How the handout and charts are made; kept in the topic's file. */
  readonly handout: TopicHandoutChoices;
  /** Who prepared the topic, funding, interests and the review-by date, as typed. */
  readonly about: TopicDisclosures;
  /** A screening test's consequences, as typed; all empty for a topic that is not about screening. */
  readonly screening: ScreeningDraft;
  /** The patient language's BCP 47 tag ("en" for a topic that names none). */
  readonly language: string;
  /** A copy made in another language: the texts as copied, to tell what is still to translate; null otherwise. */
  readonly translation: TopicTranslation | null;
}

/** The screening section as typed: the chances are risks as text ("3 in 1000", "0.3%"), empty when not given. */
export interface ScreeningDraft {
  readonly positiveLeadsTo: string;
  readonly missedCase: string;
  readonly overdiagnosis: string;
}

/** The screening section of a topic that has none. */
export const EMPTY_SCREENING: ScreeningDraft = { positiveLeadsTo: '', missedCase: '', overdiagnosis: '' };

/** A blank effect of one option, as a new outcome or option starts. */
export function blankEffect(optionId: string): EffectDraft {
  return {
    optionId,
    measure: 'rr',
    estimate: '',
    lower: '',
    upper: '',
    level: null,
    opposite: false,
    interventionEvents: '',
    interventionTotal: '',
    comparisonEvents: '',
    comparisonTotal: '',
    source: '',
    followUpYears: '',
    followUpUnit: 'years',
    certainty: 'moderate',
    importance: 'important',
  };
}
