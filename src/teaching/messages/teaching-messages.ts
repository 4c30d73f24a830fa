/**
 * The shape of the teaching view's words, apart from any language. Two parts, each in its
 * own language:
 * - {@link TeachingPatientSlideMessages}: what a patient would read on a slide, in the topic's
 *   language: the story steps' headings, the call-outs, the counts under the people, the
 *   certainty, and the figure cards that say one result four ways, with the topic's numbers
 *   written as that language writes them.
 * - {@link TeachingClinicianMessages}, in the clinician's interface language: the lesson's
 *   commentary for trainees ({@link TeachingLessonMessages}: the format demonstrations' headings
 *   and panel titles, what the research found, the prompts when a topic lists nothing to show)
 *   and the presenter's controls and teaching-set file messages ({@link TeachingPresenterMessages}).
 */
import type { TimeUnit } from '../../core/time-unit.ts';
import type { Certainty } from '../../core/topic/topic.ts';
import type { WordingMessages } from '../../core/wording/wording-catalogue.ts';
import type { LessonStepKind, StoryStepKind } from '../teaching-steps.ts';

/** A finding from the research and where it was published. */
export interface EvidenceWords {
  readonly finding: string;
  readonly source: string;
}

/** A period as the topic gives it: its length in years and the unit it was given in. */
export interface Period {
  readonly years: number;
  readonly unit: TimeUnit;
}

/** The people an option changes: avoided or got (an unwanted event), had or missed out on (a wanted one). */
export type ChangedGroup = 'prevented' | 'caused';

/** The topic's own slides: what a patient sees when the story of the numbers is told. */
export interface TeachingPatientSlideMessages {
  /** The name of each story step, as the slide's heading. */
  readonly stepNames: Readonly<Record<StoryStepKind, string>>;
  /** A number with at most two decimals and no trailing zeros, as the language writes it: "2.5", "2,5". */
  readonly decimal: (value: number) => string;
  /** A name as it starts a line or a title: "sin tratamiento" → "Sin tratamiento". */
  readonly capitalise: (text: string) => string;
  /** The core's sentence catalogue in this language, for the sentences a patient hears (the range, the certainty, the patient's words slide). */
  readonly wording: WordingMessages;
  readonly title: {
    readonly who: (population: string) => string;
    readonly period: (period: Period) => string;
    readonly comparing: (option: string, comparison: string) => string;
    readonly illustrative: string;
  };
  /** Short call-outs beside the people: a count in large type, then what it means. */
  readonly callouts: {
    readonly countIn: (count: number, denominator: number) => string;
    readonly have: (count: number, outcome: string, period: Period) => string;
    /** Those free of the outcome, after the count: the outcome is given for languages that must name it again. */
    readonly doNot: (count: number, outcome: string) => string;
    readonly haveWith: (count: number, outcome: string, option: string) => string;
    readonly without: (comparison: string) => string;
    readonly changedBecause: (group: ChangedGroup, wanted: boolean, count: number, outcome: string, option: string) => string;
    readonly anyway: (count: number, outcome: string) => string;
    readonly peopleLikeYou: (denominator: number, population: string) => string;
    readonly outlined: string;
  };
  /** Each count under an array, in words, for assistive technology and the slide export. */
  readonly chips: {
    readonly event: (count: number, outcome: string) => string;
    readonly changed: (group: ChangedGroup, wanted: boolean, count: number, outcome: string, option: string) => string;
    readonly free: (count: number, outcome: string) => string;
    readonly uncertain: (count: number, outcome: string) => string;
  };
  readonly panels: {
    /** A people array's text alternative: its title, then its counts in words. */
    readonly description: (title: string, labels: readonly string[]) => string;
  };
  readonly story: {
    readonly totalWithout: (count: number, denominator: number, comparison: string) => string;
    readonly noOneChanged: (group: ChangedGroup, wanted: boolean, denominator: number, outcome: string, option: string) => string;
    /** The people an option changes the other way: `count` is already "10 in 100", `because` the call-out. */
    readonly instead: (count: string, because: string) => string;
    readonly partOf: (heading: string, part: number, parts: number) => string;
    readonly certaintyLabel: string;
    /** The level of the range, from its percentage (95, 97.5). */
    readonly intervalLevel: (percent: number) => string;
    readonly certaintyNames: Readonly<Record<Certainty, string>>;
    readonly patientTopics: (outcome: string) => string;
  };
  /** The framing step's figure cards: one result said as a relative change, an absolute one and an NNT. */
  readonly framing: {
    readonly relativeLabel: string;
    readonly relativeValue: (percent: number, direction: 'lower' | 'higher', wanted: boolean) => string;
    readonly relativeDetail: (from: string, to: string, denominator: number) => string;
    readonly relativeNone: string;
    readonly absoluteLabel: string;
    readonly absoluteValue: (count: number, denominator: number, direction: 'fewer' | 'more') => string;
    readonly absoluteDetail: (
      larger: string,
      smaller: string,
      difference: string,
      denominator: number,
      direction: 'fewer' | 'more',
    ) => string;
    readonly absoluteNone: (denominator: number) => string;
    readonly nntLabel: string;
    readonly nntValue: (count: number, change: 'helps' | 'harms', wanted: boolean) => string;
    readonly nntDetail: (
      denominator: number,
      difference: string,
      quotient: string,
      count: number,
      rounding: 'up' | 'down',
    ) => string;
    readonly nntNone: string;
  };
}

/** The lesson's commentary for trainees: the format demonstrations and their evidence. */
export interface TeachingLessonMessages {
  /** The name of each format demonstration, as the slide's heading. */
  readonly stepNames: Readonly<Record<LessonStepKind, string>>;
  /** The titles of the demonstrations' people arrays: each names a format. */
  readonly panels: {
    readonly denominatorCaption: (denominator: number) => string;
    readonly grouped: string;
    readonly scattered: string;
    readonly totalsOnly: string;
    readonly withChange: string;
  };
  /** What a slide says when the topic lists nothing for its step, and the prompt to trainees. */
  readonly missing: {
    readonly noBenefit: string;
    readonly noHarm: string;
    readonly noHarmPrompt: string;
  };
  /** What the research found about each format, with its source (kept as published). */
  readonly evidence: Readonly<Record<'framing' | 'denominator' | 'arrangement' | 'incremental', EvidenceWords>>;
}

/** The view's controls, the presenter's messages and the teaching-set file messages. */
export interface TeachingPresenterMessages {
  readonly view: {
    readonly label: string;
    readonly progress: (step: number, steps: number) => string;
    readonly progressLabel: (step: number, steps: number, topic: number, topics: number) => string;
    readonly topicOf: (topic: number, topics: number) => string;
    readonly previous: string;
    readonly next: string;
    readonly leave: string;
    readonly savePng: string;
    readonly saveSvg: string;
    readonly saveSlideGroup: string;
    readonly setGroup: string;
    readonly menu: string;
    readonly cannotPresent: (detail: string) => string;
    readonly openSet: string;
    readonly saveSet: string;
    readonly example: string;
    readonly controls: string;
    readonly keysHint: string;
    readonly illustrative: string;
    readonly illustrativeLong: string;
    readonly opened: (title: string, count: number) => string;
    readonly saved: (name: string) => string;
    readonly exported: (name: string) => string;
    readonly exportFailed: (detail: string) => string;
    readonly notOpened: (message: string) => string;
    readonly dismiss: string;
  };
  readonly file: {
    readonly notJson: (name: string, detail: string) => string;
    readonly empty: (name: string) => string;
    readonly notASet: (name: string, format: string) => string;
    readonly isATopic: (name: string) => string;
    readonly newerVersion: (name: string, version: string, supported: number) => string;
    readonly damaged: (name: string, path: string, expected: string, received: string) => string;
    readonly emptyList: (name: string, path: string, what: 'topic' | 'step') => string;
    readonly topicProblem: (name: string, item: number, path: string, detail: string) => string;
    readonly topicNotComputed: (name: string, item: number, path: string, detail: string) => string;
    readonly unknownOption: (name: string, path: string, value: string, known: string) => string;
    readonly comparisonOption: (name: string, path: string, value: string) => string;
    readonly unknownHarm: (name: string, path: string, value: string, known: string) => string;
    readonly noHarms: string;
    readonly harmsAre: (ids: string) => string;
    readonly pathInBrowser: (name: string, item: number, path: string) => string;
    readonly pathUnusable: (name: string, item: number, path: string) => string;
    readonly pathUnreadable: (name: string, item: number, path: string, detail: string) => string;
    readonly setSuffix: string;
  };
}

/** The words in the clinician's interface language: the lesson's commentary and the presenter's. */
export type TeachingClinicianMessages = TeachingLessonMessages & TeachingPresenterMessages;

/**
 * What the teaching code takes: the patient's slide words, in the topic's language, beside the
 * clinician's words, so that a slide builder reads `messages.patient.callouts` and
 * `messages.clinician.evidence` and never mixes the two up.
 */
export interface TeachingMessages {
  readonly patient: TeachingPatientSlideMessages;
  readonly clinician: TeachingClinicianMessages;
}
