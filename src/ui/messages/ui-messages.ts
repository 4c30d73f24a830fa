/**
 * The words of the clinician's interface, grouped by the part of the screen that shows them.
 * Types only: a locale (`en.ts` beside this file) provides every one of them, and components
 * read them through the locale context (`state/locale-context.ts`), state classes through
 * their constructor. A function takes the values a sentence needs and returns it finished.
 */
import type { PatientLanguage } from '../../core/topic/topic-language.ts';
import type { ReadingLevel } from '../../core/wording/reading-scale.ts';

import type { Certainty, Importance, TopicDisclosures } from '../../core/topic/topic.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type { DraftMeasure } from '../draft/topic-draft.ts';
import type { IntervalWords } from '../../core/nnt-interval.ts';
import type { HandoutGapKind } from '../draft/handout-gaps.ts';
import type { TranslatableKind } from '../draft/translation-texts.ts';
import type { NoticeMessages } from './notice-messages.ts';

/** The page around the two columns. */
export interface AppFrameMessages {
  readonly skipLinks: string;
  readonly skipToTopic: string;
  readonly skipToResults: string;
  readonly topicHeading: string;
  readonly topicHint: string;
  readonly resultsHeading: string;
  readonly present: string;
  readonly footer: string;
}

/** The bar along the top. */
export interface AppBarMessages {
  readonly brand: string;
  readonly unsaved: string;
  /** In place of the file's name: the example shown at start, or a topic not saved to a file. */
  readonly exampleNotSaved: string;
  readonly notSavedYet: string;
  /** The window's title: an unsaved mark, the topic's decision (null when it has none), the app. */
  readonly windowTitle: (decision: string | null, unsaved: boolean) => string;
  readonly actions: string;
  readonly topics: string;
  readonly open: string;
  readonly save: string;
  readonly saveKeys: string;
  readonly undo: string;
  readonly redo: string;
  /** The action that makes a copy of the topic to write in Spanish, and what it says once done. */
  readonly copyInSpanish: string;
  readonly copyInSpanishHint: string;
  readonly copiedInSpanish: string;
}

/** The headline numbers pinned in a narrow window's header. */
export interface HeadlineMessages {
  readonly label: string;
  readonly empty: string;
  /** "Stroke, out of 100:" (the count already written as the locale writes numbers). */
  readonly outOf: (outcome: string, per: string) => string;
  readonly stale: string;
  readonly allResults: string;
}

/** The Topics panel. */
export interface StartMessages {
  readonly heading: string;
  readonly close: string;
  readonly yourTopics: string;
  readonly newTopic: string;
  /** The choice beside "New topic" of the language its patient wording is written in. */
  readonly newTopicLanguage: string;
  readonly openFile: string;
  readonly recent: string;
  readonly noRecent: string;
  readonly browserReopens: string;
  readonly examples: string;
  readonly examplesHint: string;
  readonly illustrative: string;
  /** "2 options · 3 outcomes · 10 years", the period already in words. */
  readonly demoFacts: (options: number, outcomes: number, period: string) => string;
  /** A demo's title without its "(illustrative example)" ending, which the panel marks apart. */
  readonly demoTitle: (title: string) => string;
}

/** The banners above the editor: unsaved work to restore, an illustrative example. */
export interface BannerMessages {
  readonly restoreLabel: string;
  /** "Unsaved work from 2 Dec 2026, 19:07": the date and time written as the interface's language writes them. */
  readonly restoreFrom: (savedAt: Date) => string;
  /** '“Title” was not saved to a file.' or for an empty title "(an untitled topic) …". */
  readonly restoreWhat: (title: string) => string;
  readonly restore: string;
  readonly discard: string;
  readonly illustrativeLabel: string;
  readonly illustrativeHeading: string;
  readonly illustrativeText: string;
  readonly illustrativeStart: string;
  /** The caution over a topic whose patient language is not English (the language by its name in the interface's words). */
  readonly languageLabel: (language: string) => string;
  readonly languageHeading: (language: string) => string;
  readonly languageText: (language: string) => string;
}

/** The message at the foot (or top) of the window. */
export interface ToastMessages {
  readonly dismiss: string;
  readonly dismissLabel: string;
}

/** The save dialog of the browser. */
export interface SaveDialogMessages {
  readonly heading: string;
  readonly fileName: string;
  readonly includePatient: string;
  readonly patientHint: string;
  readonly noPatientHint: string;
  readonly cancel: string;
  readonly saveFile: string;
}

/** The results panel's words about the patient wording itself: its reading level and its language's words loading. */
export interface PatientWordingMessages {
  readonly readingHeading: string;
  /** The patient wording's reading level on its language's scale, with the aim and its source. */
  readonly readingLevel: (level: ReadingLevel) => string;
  /** While the words of a topic's language load. */
  readonly wordsLoading: (language: PatientLanguage) => string;
  /** When they could not be loaded. */
  readonly wordsFailed: (language: PatientLanguage, detail: string) => string;
}

/** The line above the results: whether they are up to date, and the people they count out of. */
export interface ResultsStatusMessages {
  readonly waiting: string;
  /** Said in bold before {@link staleRest}. */
  readonly stale: string;
  readonly staleRest: string;
  readonly fresh: string;
  readonly showOutOf: string;
  readonly automatic: string;
  /** A choice of how many people to count out of: "100 people" (the count as typed in code, no separator). */
  readonly people: (count: number) => string;
}

/** The results column around the outcomes. */
export interface ResultsPanelMessages {
  /** In bold, before {@link staleText}. */
  readonly staleHeading: string;
  readonly staleText: string;
  /** In bold, before {@link illustrativeText}. */
  readonly illustrative: string;
  readonly illustrativeText: string;
  /** "The pictures show <b>100</b> people like this, over <b>10 years</b>; the tables and words count per <b>10,000</b>, because …": the parts between the bold values. */
  readonly picturesShow: string;
  readonly peopleOver: string;
  readonly tablesCountPer: string;
  /** The end of that sentence, with the pictures' count written. */
  readonly becauseNoOne: (picturesCount: string) => string;
  /** "Out of <b>100</b> people like this, over <b>10 years</b>. Headline first.": the first and the last part. */
  readonly outOf: string;
  readonly headlineFirst: string;
  readonly outline: string;
  /** The note beneath the results, after what the ranges are ({@link IntervalMessages.rangesNote}). */
  readonly footnote: (rangesNote: string) => string;
  readonly warningsHeading: string;
}

/** The levels of the ranges, for the note beneath the results and the editor's interval. */
export interface IntervalMessages {
  /** "95%", the level as a percentage already written. */
  readonly oneLevel: (level: string) => string;
  /** Several levels, lowest first, each already written ("90%", "95%"). */
  readonly severalLevels: (levels: readonly string[]) => string;
}

/** One outcome's results: its kind, its chart's buttons, its sentences. */
export interface OutcomeResultMessages {
  readonly benefit: string;
  readonly harm: string;
  /** Added after the kind when the outcome is the headline one. */
  readonly headline: string;
  readonly exportLabel: (outcome: string) => string;
  readonly saveSvg: string;
  readonly savePng: string;
  readonly inWords: string;
  readonly forClinician: string;
}

/** The key numbers' table of one outcome. */
export interface KeyNumberMessages {
  /** "Key numbers for stroke, out of 100 people" (the count already written). */
  readonly caption: (outcome: string, outOf: string) => string;
  readonly option: string;
  readonly peopleWithIt: string;
  readonly outOf: (count: string) => string;
  readonly change: string;
  /** The column of the absolute risk, or of the chance for a wanted event. */
  readonly risk: (wanted: boolean) => string;
  readonly nnt: string;
  readonly comparison: string;
  /** Beneath the option's name: "ranges: 95% interval". */
  readonly ranges: (level: string) => string;
  readonly notApplicable: string;
  /** Read out before a range: ", 95% interval ". */
  readonly rangeIntro: (level: string) => string;
}

/** The change in people and the ranges in the key numbers, the counts already written. */
export interface PeopleChangeMessages {
  readonly noChange: string;
  /** A change that rounds to no one but is not exactly 0. */
  readonly underOne: string;
  readonly fewer: (size: string) => string;
  readonly more: (size: string) => string;
  readonly fewerRange: (from: string, to: string) => string;
  readonly moreRange: (from: string, to: string) => string;
  readonly fewerToMore: (fewer: string, more: string) => string;
  /** A range of people or of a risk: "10 to 12". */
  readonly range: (lower: string, upper: string) => string;
  /** The words joining an NNT interval's parts (Altman 1998): "∞" and "to". */
  readonly nntInterval: IntervalWords;
  /** The NNT cell when the options make no difference. */
  readonly noNnt: string;
}

/** The handout's card in the results. */
export interface HandoutCardMessages {
  readonly heading: string;
  readonly summary: (illustrative: boolean) => string;
  readonly paper: string;
  readonly a4: string;
  readonly letter: string;
  readonly includeNnt: string;
  readonly making: string;
  readonly make: string;
  readonly print: string;
  readonly warningsLabel: string;
  readonly warningsIntro: string;
  readonly staleNote: string;
}

/** The editor's list of outcomes. */
export interface OutcomeListMessages {
  readonly heading: string;
  /** "3 of 8". */
  readonly count: (count: number, most: number) => string;
  readonly addBenefit: string;
  readonly addHarm: string;
  readonly full: (most: number) => string;
}

/** The decision card: the topic's title, who the numbers are for, and the period. */
export interface TopicBasicsMessages {
  readonly heading: string;
  readonly title: string;
  readonly titleHint: string;
  readonly population: string;
  readonly populationHint: string;
  readonly period: string;
  readonly periodHint: string;
}

/** The lists above the editor: what to fix, what the results need, and what the handout still lacks. */
export interface ProblemSummaryMessages {
  readonly toFix: (count: number) => string;
  readonly toFixKept: string;
  readonly needed: (count: number) => string;
  readonly neededNote: string;
  readonly gaps: (count: number) => string;
  readonly gapsNote: string;
  /** What each entry the handout lacks is called in the list. */
  readonly gapNames: Readonly<Record<HandoutGapKind, string>>;
}

/** The editor's preview of the patient sentences that carry the typed names. */
export interface NamePreviewMessages {
  readonly heading: string;
  /** Says which language the sentences are in and why they are shown. */
  readonly hint: (language: PatientLanguage) => string;
  /** While the results are not computed yet. */
  readonly waiting: string;
}

/** The editor's options. */
export interface OptionsEditorMessages {
  readonly heading: string;
  readonly count: (count: number, most: number) => string;
  readonly hint: (least: number, most: number) => string;
  readonly nameLabel: (number: number) => string;
  readonly comparison: string;
  /** An option with no name yet, in the buttons' names: "option 2". */
  readonly unnamed: (number: number) => string;
  readonly moveUp: (option: string) => string;
  readonly moveDown: (option: string) => string;
  readonly removeLabel: (option: string) => string;
  readonly remove: string;
  readonly add: string;
  readonly full: (most: number) => string;
}

/** One outcome in the editor. */
export interface OutcomeEditorMessages {
  /** An outcome with no name yet: "Outcome 2". */
  readonly unnamed: (number: number) => string;
  readonly benefit: string;
  readonly harm: string;
  readonly headlineTag: string;
  readonly removeLabel: (outcome: string) => string;
  readonly remove: string;
  readonly name: string;
  readonly nameHint: string;
  readonly kindLegend: string;
  readonly kindBenefit: string;
  readonly kindHarm: string;
  readonly headline: string;
  readonly wantedLegend: string;
  readonly unwanted: string;
  readonly unwantedExample: string;
  readonly wanted: string;
  readonly wantedExample: string;
  readonly wantedHint: string;
}

/** An outcome's baseline; a wanted event's is a chance, not a risk. */
export interface BaselineMessages {
  readonly title: (wanted: boolean) => string;
  readonly risk: (wanted: boolean) => string;
  readonly over: string;
  /** How to write it, and with trial counts only that an empty one means the comparison arm's. */
  readonly hint: (wanted: boolean, countsOnly: boolean) => string;
  readonly source: (wanted: boolean) => string;
  readonly sourcePlaceholder: string;
}

/** The effect of one option on one outcome. */
export interface EffectEditorMessages {
  /** Before the option's name, in bold: "Effect of". */
  readonly legend: string;
  /** An option with no name yet: "option 2". */
  readonly unnamedOption: (number: number) => string;
  /** The outcome named in the opposite-event choice: quoted, or "this outcome". */
  readonly quotedOutcome: (outcome: string) => string;
  readonly thisOutcome: string;
  readonly measures: Readonly<Record<DraftMeasure, string>>;
  readonly measureHint: (measure: DraftMeasure, wanted: boolean) => string;
  readonly certainties: Readonly<Record<Certainty, string>>;
  readonly importance: Readonly<Record<Importance, string>>;
  readonly enteredAs: string;
  readonly estimate: string;
  /** "95% interval", the level already written. */
  readonly interval: (level: string) => string;
  readonly optional: string;
  readonly lower: (interval: string) => string;
  readonly upper: (interval: string) => string;
  readonly to: string;
  readonly followUp: string;
  readonly followUpHint: string;
  readonly certainty: string;
  readonly importanceLabel: string;
  readonly source: string;
  readonly sourcePlaceholder: string;
}

/** The choice that an effect is given for the opposite event. */
export interface OppositeEventMessages {
  readonly label: (counts: boolean, outcome: string) => string;
  readonly hint: (measure: DraftMeasure) => string;
}

/** A trial's own counts, one row per arm. */
export interface TrialArmMessages {
  readonly withOption: (option: string) => string;
  readonly comparisonArm: string;
  /** The hidden labels of the two boxes, from the row's title. */
  readonly eventsLabel: (arm: string) => string;
  readonly totalLabel: (arm: string) => string;
  readonly eventsPlaceholder: string;
  readonly totalPlaceholder: string;
  readonly of: string;
  readonly hadOutcome: string;
}

/** A period: an amount and its unit. */
export interface PeriodFieldMessages {
  readonly unitLabel: (field: string) => string;
  readonly units: Readonly<Record<TimeUnit, string>>;
  /** A period in words, the amount already written: "10 years", "1 week" (`one` when the amount is exactly 1). */
  readonly amount: (amount: string, unit: TimeUnit, one: boolean) => string;
}

/** A field's problems and its length. */
export interface FieldMessages {
  readonly needed: string;
  readonly problem: string;
  readonly characters: (length: number, limit: number) => string;
}

/** Evidence, questions and patient. */
export interface HandoutDetailsMessages {
  readonly heading: string;
  readonly hint: string;
  readonly evidenceSummary: string;
  readonly evidenceReviewed: string;
  readonly evidenceReviewedHint: string;
  readonly clinician: string;
  readonly questions: (most: number) => string;
  readonly question: (number: number) => string;
  readonly removeQuestion: (number: number) => string;
  readonly remove: string;
  readonly addQuestion: string;
  readonly illustrative: string;
  readonly patient: string;
  readonly patientHint: string;
  readonly patientName: string;
  readonly patientReference: string;
}

/** Who prepared the topic and on what terms. */
export interface AboutTopicMessages {
  readonly heading: string;
  readonly hint: string;
  readonly fields: Readonly<Record<keyof TopicDisclosures, { readonly label: string; readonly hint: string }>>;
  readonly reviewByPlaceholder: string;
}

/** A screening test's consequences. */
export interface ScreeningMessages {
  readonly heading: string;
  readonly hint: string;
  readonly positiveLeadsTo: string;
  readonly positiveLeadsToHint: string;
  readonly missedCase: string;
  readonly missedCaseHint: string;
  readonly overdiagnosis: string;
  readonly overdiagnosisHint: string;
  readonly outOf: string;
}

/** The teaching view's slide, as the presenter's assistive technology reads it (the slide's own text follows the topic). */
export interface TeachingSlideViewMessages {
  readonly evidenceLabel: string;
}

/** The editor's choice of the language the patient reads (the interface itself stays in its own language). */
export interface LanguageMessages {
  readonly label: string;
  readonly hint: string;
  /** Each language by its own name, as a speaker of it looks for it. */
  readonly names: Readonly<Record<PatientLanguage, string>>;
  /** A tag Chancewise cannot write, shown as the field's value until another is chosen. */
  readonly notWritten: (tag: string) => string;
}

/** The texts of a copy still to translate, listed under "Still to fill in". */
export interface TranslationGapMessages {
  /** What each kind of typed text is called in the list ("Option name"). */
  readonly kinds: Readonly<Record<TranslatableKind, string>>;
  /** The patient languages by their names in the interface's language ("Spanish"). */
  readonly languageNames: Readonly<Record<PatientLanguage, string>>;
  /** 'Option name “Daily tablet” is still in English: write it in Spanish.' (the names already in words). */
  readonly stillIn: (what: string, text: string, from: string, to: string) => string;
  /** Said once above the list while any text is still to translate. */
  readonly note: (from: string) => string;
  /** The button beside a text that reads the same in the new language (a medicine's name): it leaves the list. */
  readonly keep: string;
  /** The same button's name for a screen reader: 'Keep “Ibuprofen” as it is in Spanish'. */
  readonly keepLabel: (text: string, to: string) => string;
}

export interface UiMessages {
  readonly app: AppFrameMessages;
  readonly appBar: AppBarMessages;
  readonly headline: HeadlineMessages;
  readonly start: StartMessages;
  readonly banners: BannerMessages;
  readonly toast: ToastMessages;
  readonly saveDialog: SaveDialogMessages;
  readonly resultsStatus: ResultsStatusMessages;
  readonly results: ResultsPanelMessages;
  readonly intervals: IntervalMessages;
  readonly outcomeResult: OutcomeResultMessages;
  readonly keyNumbers: KeyNumberMessages;
  readonly peopleChange: PeopleChangeMessages;
  readonly handoutCard: HandoutCardMessages;
  readonly outcomes: OutcomeListMessages;
  readonly options: OptionsEditorMessages;
  readonly outcome: OutcomeEditorMessages;
  readonly baseline: BaselineMessages;
  readonly effect: EffectEditorMessages;
  readonly opposite: OppositeEventMessages;
  readonly trialArms: TrialArmMessages;
  readonly period: PeriodFieldMessages;
  readonly field: FieldMessages;
  readonly handoutDetails: HandoutDetailsMessages;
  readonly aboutTopic: AboutTopicMessages;
  readonly screening: ScreeningMessages;
  readonly teachingSlide: TeachingSlideViewMessages;
  readonly patientWording: PatientWordingMessages;
  readonly language: LanguageMessages;
  readonly namePreview: NamePreviewMessages;
  readonly basics: TopicBasicsMessages;
  readonly problemSummary: ProblemSummaryMessages;
  readonly translation: TranslationGapMessages;
  readonly notices: NoticeMessages;
}
