/**
 * The shape of the printed handout's wording (headings, captions, the caution, the footer,
 * the page count) and the values its sentences take. Types only: each language is a
 * sibling module (`en.ts`, `es.ts`).
 */
import type { TimeUnit } from '../../core/time-unit.ts';
import type { Certainty } from '../../core/topic/topic.ts';
import type { PersonGroup } from '../../core/types.ts';
import type { Amount, ChangeDirection, FrequencyBand } from '../../core/wording/wording-catalogue.ts';

/** The parts of a handout the clinician can shorten when it does not fit. */
export type HandoutPart = 'header' | 'options' | 'outcomes' | 'screening' | 'evidence' | 'questions';

/** Values shared by sentences about the whole sheet. */
export interface SheetValues {
  /** The pictures' denominator (100 or 1000). */
  readonly denominator: number;
  /** The words' and table's denominator: the pictures', or 10,000 up to a million for a rare outcome. */
  readonly wordsDenominator: number;
  readonly years: number;
  /** The unit the topic's period was given in. */
  readonly unit: TimeUnit;
}

/** What the values prompt is built from: the headline benefit and the main side effects' names. */
export interface PromptValues {
  readonly benefit: string;
  /** The benefit is an event people want ("a pain-free throat"). */
  readonly wanted: boolean;
  /** The main side effects, most added people first; empty when the topic has none. */
  readonly harms: readonly string[];
}

/** The change an option makes in a table cell, as people of the row's denominator. */
export interface CellChange {
  readonly direction: ChangeDirection;
  readonly count: number;
  /** When the counts show no change: the direction of a difference smaller than one person, or null when it is exactly 0. */
  readonly hidden: 'fewer' | 'more' | null;
}

/** Whether the other benefit rows are events the options aim to make less likely, more likely, or both. */
export type BenefitAim = 'lower' | 'raise' | 'both';

/** The shape every language's handout wording provides. */
export interface HandoutMessages {
  /** BCP 47 tag written into the PDF, for screen readers. */
  readonly language: string;
  readonly documentSubject: string;
  readonly paperName: Readonly<Record<'a4' | 'letter', string>>;
  readonly illustrativeBadge: string;
  readonly numbersFor: (values: SheetValues) => string;
  readonly keyIntro: (values: SheetValues) => string;
  /** What each group of figures means for an event to avoid, in words that suit any outcome. */
  readonly keyGroups: Readonly<Record<PersonGroup, string>>;
  /** The same for an event people want: never "avoid" or "risk". */
  readonly wantedKeyGroups: Readonly<Record<PersonGroup, string>>;
  readonly sentencesHeading: string;
  readonly tableBenefitRows: (aim: BenefitAim) => string;
  readonly tableHarmRows: string;
  /** A benefit's cell: people out of the denominator. */
  readonly tableCell: (amount: Amount, denominator: number) => string;
  /** A side effect's cell: its frequency band with the number beside the word. */
  readonly bandCell: (band: FrequencyBand, amount: Amount, denominator: number) => string;
  /** Under an option's number in the table: the change it makes ("40 more"). */
  readonly tableChange: (change: CellChange) => string;
  readonly certaintyShort: Readonly<Record<Certainty, string>>;
  /** Over a side effect's pictures: the chart's heading said to be about a side effect. */
  readonly sideEffectHeading: (heading: string) => string;
  /** Before an outcome's sentences: its name, and whether it is a side effect. */
  readonly outcomeLabel: (outcome: string, kind: 'benefit' | 'harm') => string;
  /** After the sentences with ranges: the level of the interval they are, for one range or `count` of them. */
  readonly rangeLevel: (level: number, count: number) => string;
  /** Under the enlarged block of 100 of a picture of 1000. */
  readonly closeUpLabel: string;
  readonly noSideEffects: string;
  /** Under the table when a rare side effect's row counts out of more people, so its band word and number agree. */
  readonly rareRowsNote: string;
  readonly evidenceHeading: string;
  readonly evidenceSummary: (summary: string) => string;
  readonly evidenceReviewed: (reviewed: string) => string;
  readonly baselineSource: (outcome: string, source: string) => string;
  /** The starting chance was given over another period and worked out for the sheet's: "…over 10 years, worked out for 15 years…". */
  readonly baselineConverted: (outcome: string, from: string, to: string) => string;
  /** An effect applied beyond its trials' follow-up: "The research on screening lasted 12 years; …". */
  readonly beyondFollowUp: (option: string, followUp: string, period: string) => string;
  readonly mattersHeading: string;
  /** The values prompt, built from the topic's benefit and main side effects. */
  readonly mattersPrompt: (values: PromptValues) => string;
  readonly questionsHeading: string;
  readonly defaultQuestions: readonly string[];
  readonly cautionHeading: string;
  readonly caution: (values: SheetValues) => string;
  readonly preparedBy: (name: string) => string;
  readonly preparedByBlank: string;
  readonly printed: (date: string) => string;
  readonly appVersion: (version: string) => string;
  readonly pageOfPages: string;
  /** Between the parts of a footer line. */
  readonly footerSeparator: string;
  /** A date written YYYY-MM-DD in words; any other text is returned as typed. */
  readonly formatDate: (text: string) => string;
  /** A length of time in its unit, for the assumption lines: "10 years", "3 days". */
  readonly duration: (values: { readonly years: number; readonly unit: TimeUnit }) => string;
  /** A capital first letter, for option names used as column headings. */
  readonly capitalise: (text: string) => string;
  /** The "About this sheet" line and the sources of the effects. */
  readonly about: AboutSheetMessages;
  /** The screening section ("If you have the test:"). */
  readonly screening: ScreeningMessages;
}

/** The disclosures of a topic as the "About this sheet" line takes them: null when not given. */
export interface AboutSheetValues {
  readonly preparedBy: string | null;
  readonly funding: string | null;
  readonly interests: string | null;
  /** The review-by date, already in words. */
  readonly reviewBy: string | null;
}

/** One source of effects and what it is the source of (options or outcomes); none listed: all of them. */
export interface EffectSourceGroup {
  /** Empty when no source was given. */
  readonly source: string;
  readonly of: readonly string[];
}

/** Words of the sheet's disclosures. */
export interface AboutSheetMessages {
  readonly line: (values: AboutSheetValues) => string;
  /** The sources of the effects in one sentence; null when the topic has no effects. */
  readonly effectSources: (groups: readonly EffectSourceGroup[]) => string | null;
}

/** Words of the screening section. */
export interface ScreeningMessages {
  readonly heading: string;
  readonly positive: (leadsTo: string) => string;
  readonly missedCase: (amount: Amount, denominator: number) => string;
  readonly overdiagnosis: (amount: Amount, denominator: number) => string;
}
