/**
 * The words of the clinician's interface, grouped by the part of the screen that shows them.
 * Types only: a locale (`en.ts` beside this file) provides every one of them, and components
 * read them through the locale context (`state/locale-context.ts`), state classes through
 * their constructor. A function takes the values a sentence needs and returns it finished.
 */
import type { PatientLanguage } from '../../core/topic/topic-language.ts';
import type { TranslatableKind } from '../draft/translation-texts.ts';

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
  /** "Unsaved work from 2 Dec 2026, 19:07" (the date already written). */
  readonly restoreFrom: (savedAt: string) => string;
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
}

export interface UiMessages {
  readonly app: AppFrameMessages;
  readonly appBar: AppBarMessages;
  readonly headline: HeadlineMessages;
  readonly start: StartMessages;
  readonly banners: BannerMessages;
  readonly toast: ToastMessages;
  readonly saveDialog: SaveDialogMessages;
  readonly language: LanguageMessages;
  readonly translation: TranslationGapMessages;
}
