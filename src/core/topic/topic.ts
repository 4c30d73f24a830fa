import type { TimeUnit } from '../time-unit.ts';
import type { Effect, WordsDenominator } from '../types.ts';

/** GRADE certainty of the evidence for one result (Balshem et al. 2011). */
export type Certainty = 'high' | 'moderate' | 'low' | 'very-low';

/** Whether the clinician judged the effect important, or little or no difference (Santesso et al. 2020). */
export type Importance = 'important' | 'trivial';

/** A risk as entered: a proportion, or text as clinicians write it ("20%", "1 in 5"). */
export type RiskInput = number | string;

/** One option of a decision (a treatment, a test, doing nothing). */
export interface TopicOption {
  readonly id: string;
  readonly name: string;
  /** Exactly one option of a topic is the comparison its effects are measured against. */
  readonly isComparison: boolean;
}

/** The effect of one option on one outcome, with where it came from. */
export interface OptionEffect {
  readonly optionId: string;
  readonly effect: Effect;
  readonly source: string;
  /** The period, in years, over which the effect was measured; null when not stated. */
  readonly followUpYears: number | null;
  /** The unit the follow-up was given in (default years); `followUpYears` holds it converted. */
  readonly followUpUnit?: TimeUnit;
  readonly certainty: Certainty;
  readonly importance: Importance;
}

/** The patient's risk of an outcome without any of the options. */
export interface Baseline {
  /** Null only when every effect is given as trial counts (the trial's comparison arm is then used). */
  readonly risk: RiskInput | null;
  readonly periodYears: number;
  /** The unit the period was given in (default years); `periodYears` holds it converted. */
  readonly periodUnit?: TimeUnit;
  readonly source: string;
}

/** One outcome: a benefit the options aim at, or a harm they may cause. */
export interface TopicOutcome {
  readonly id: string;
  /** Short name, used in sentences: "a stroke", "muscle pain". */
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /**
   * The event is one people want ("pain gone by day 3", "stopped smoking"): absent or false
   * means an event to avoid. Separate from `kind`, which says whether the options aim at the
   * outcome (benefit) or it is a side effect (harm); helping follows from both directions.
   */
  readonly wanted?: boolean;
  readonly isHeadline: boolean;
  readonly baseline: Baseline;
  /** One entry per option that is not the comparison. */
  readonly effects: readonly OptionEffect[];
}

/** How the topic's handout and charts are made, kept with the topic so they come back with its file. */
export interface TopicHandoutChoices {
  /** Print the number-needed-to-treat sentences (the clinician opts in). */
  readonly showNnt: boolean;
  /** Count per this many people, or null to let the core choose. */
  readonly per: WordsDenominator | null;
  /** Outline the people who depend on the range of the interval. */
  readonly outline: boolean;
  readonly paper: 'a4' | 'letter';
}

/** The choices of a topic that has none stored: no NNT, the core's denominator, no outline, A4. */
export const DEFAULT_HANDOUT_CHOICES: TopicHandoutChoices = { showNnt: false, per: null, outline: false, paper: 'a4' };

/**
 * Who made the topic and on what terms, printed in the handout's "About this sheet" line
 * (version 5 files). Each is free text; an empty one is printed as "not stated".
 */
export interface TopicDisclosures {
  /** Who prepared the topic's numbers and words: a person, team or organisation. */
  readonly preparedBy: string;
  /** Who paid for the work. */
  readonly funding: string;
  /** Interests (conflicts of interest) of those who prepared it, or "none". */
  readonly interests: string;
  /** The date by which the topic is to be checked again, YYYY-MM-DD. */
  readonly reviewBy: string;
}

/** The disclosures of a topic that has none stored: every one not stated. */
export const EMPTY_DISCLOSURES: TopicDisclosures = { preparedBy: '', funding: '', interests: '', reviewBy: '' };

/**
 * What having a screening test leads to (version 5 files): what a positive result leads to,
 * and the chances, among people who have the test, of a missed case (a normal result although
 * the condition is there: false reassurance) and of overdiagnosis (a condition found that would
 * never have caused harm). Chances are risks as entered ("3 in 1000", "0.3%"); null: not given.
 */
export interface TopicScreening {
  readonly positiveLeadsTo: string;
  readonly missedCase: RiskInput | null;
  readonly overdiagnosis: RiskInput | null;
}

/** A decision topic: everything needed to compute, draw, word and print one decision. */
export interface Topic {
  /** The decision in one line: "Taking a statin to lower the chance of a heart attack or stroke". */
  readonly title: string;
  /** Who the numbers are for, in plain words: "people aged 60 to 69 with a 15% ten-year risk". */
  readonly population: string;
  /** The one period, in years, that every number of the topic covers. */
  readonly periodYears: number;
  /** The unit the period was given in, and is worded in (default years). */
  readonly periodUnit?: TimeUnit;
  readonly options: readonly TopicOption[];
  readonly outcomes: readonly TopicOutcome[];
  /** Invented scenario for demonstration and teaching; shown as illustrative wherever it appears. */
  readonly illustrative: boolean;
  /** Where the evidence comes from overall and when it was reviewed (for the handout). */
  readonly evidence: { readonly summary: string; readonly reviewed: string };
  /** Optional free-text prompts and questions for the handout. */
  readonly questions: readonly string[];
  /** Optional: clinician or practice shown on the handout. */
  readonly clinician: string;
  /** Patient-identifying details: never written to a file unless the user asks for it. */
  readonly patient?: { readonly name: string; readonly reference: string } | null;
  /** The handout's choices (version 4 files); absent: {@link DEFAULT_HANDOUT_CHOICES}. */
  readonly handout?: TopicHandoutChoices;
  /** Who prepared the topic, funding, interests and review date (version 5 files); absent: none stated. */
  readonly about?: TopicDisclosures;
  /** A screening test's consequences (version 5 files); absent: not a screening topic. */
  readonly screening?: TopicScreening;
  /**
   * The language a patient reads the topic in, as a BCP 47 tag ("es", "es-MX"); absent means
   * English (version 6 files). The typed names are in this language too.
   */
  readonly language?: string;
  /** A copy made in another language: what it was copied from, to tell texts still to translate (version 6 files). */
  readonly translation?: TopicTranslation;
}

/**
 * The marks of a topic copied into another language: the language it came from, and each typed
 * text as it was when copied, keyed by the editor's field key ("options.treated.name": options
 * and outcomes by id, questions by place). A text that still equals its source is still to translate.
 */
export interface TopicTranslation {
  readonly from: string;
  readonly sourceTexts: Readonly<Record<string, string>>;
}

/** Limits shared by the editor, the validator and the handout. */
export const TOPIC_LIMITS = {
  minOptions: 2,
  maxOptions: 4,
  minOutcomes: 1,
  maxOutcomes: 8,
  titleLength: 120,
  populationLength: 160,
  optionNameLength: 40,
  outcomeNameLength: 60,
  sourceLength: 200,
  evidenceSummaryLength: 300,
  questionLength: 140,
  maxQuestions: 5,
  clinicianLength: 80,
  disclosureLength: 120,
  screeningTextLength: 200,
  maxPeriodYears: 100,
} as const;
