/**
 * The words the command line prints, typed here without a language: its usage messages, the
 * summaries `compute` writes, the lines `chart` and `handout` report, the help text, and the
 * core's catalogue for the problems and warnings it passes on. `src/cli/messages/en.ts` is
 * the English; `main` receives one `CliWords` and hands it to every command.
 */
import type { Catalogue } from '../../core/messages/describe.ts';
import type { InfleszBand } from '../../core/wording/readability-es.ts';
import type { PeriodValues } from '../../core/wording/wording-catalogue.ts';
import type { Paper } from '../../handout/paper-size.ts';
import type { HandoutRefusalMessages } from '../../handout/messages/refusal-messages.ts';

/** Problems with how the command line was used: one line on stderr, exit status 2. */
export interface CliUsageMessages {
  readonly unknownCommand: (name: string) => string;
  readonly noCommand: () => string;
  readonly unknownFlag: (flag: string) => string;
  readonly repeatedFlag: (flag: string) => string;
  readonly missingValue: (flag: string, example: string) => string;
  readonly flagTakesNoValue: (flag: string) => string;
  readonly extraArgument: (value: string) => string;
  readonly twoEffects: (first: string, second: string) => string;
  readonly noEffect: () => string;
  readonly baselineNeeded: (flag: string) => string;
  readonly baselineWithCounts: () => string;
  readonly effectWithCounts: (flag: string) => string;
  readonly notWithTopic: (flag: string) => string;
  readonly topicAndDemo: () => string;
  readonly overAndTo: () => string;
  readonly periodsWithArr: () => string;
  readonly levelWithoutInterval: () => string;
  readonly ciFormat: (value: string) => string;
  readonly perValue: (value: string) => string;
  readonly methodValue: (value: string) => string;
  readonly methodWithoutCounts: () => string;
  readonly paperValue: (value: string) => string;
  readonly dateValue: (value: string) => string;
  readonly chartNeedsBaseline: () => string;
  readonly outNeeded: (example: string) => string;
  readonly outExtension: (value: string, extension: string) => string;
  readonly fileUnreadable: (path: string, reason: string) => string;
  readonly fileUnwritable: (path: string, reason: string) => string;
  /** A topic that fails validation without a first problem to name (never expected). */
  readonly topicInvalidUnnamed: () => string;
  readonly topicInvalid: (first: string, count: number) => string;
  readonly outcomeUnknown: (name: string, names: string) => string;
  readonly internal: (detail: string) => string;
  readonly handoutNeedsTopic: () => string;
  readonly clinicianTooLong: (length: number, limit: number) => string;
  readonly outWithSeveral: (count: number) => string;
  readonly outAndOutDir: () => string;
  readonly folderUnusable: (path: string, reason: string) => string;
}

/** Why a file could not be read or written, after "Cannot read …: " (an unknown system code is printed as it is). */
export interface CliFileReasons {
  readonly noSuchFile: string;
  readonly isFolder: string;
  readonly folderMissing: string;
  readonly permissionDenied: string;
  readonly fileInTheWay: string;
  readonly folderInTheWay: string;
  readonly unreadable: string;
  readonly writeFailed: string;
}

/** How the summaries write numbers. */
export interface CliNumberWords {
  /** A count of people: "1,000". */
  readonly count: (value: number) => string;
  /** A ratio or statistic to a number of decimals: "0.667". */
  readonly decimal: (value: number, digits: number) => string;
  /** A risk as a percentage, one decimal from 1 up and two significant figures below: "15%", "0.02%". */
  readonly percent: (value: number) => string;
  /** A difference of risks in percentage points, with a true minus sign: "−0.01". */
  readonly points: (value: number) => string;
  /** An interval's level as a percentage, without the sign: "95". */
  readonly level: (level: number) => string;
}

/** The readable summaries of `chancewise compute`. */
export interface CliSummaryWords {
  /** The row labels; `wanted` says the event is one people want (a chance, not a risk). */
  readonly riskWithout: (wanted: boolean) => string;
  readonly riskWith: (wanted: boolean) => string;
  readonly riskRatio: string;
  readonly absoluteReduction: string;
  readonly absoluteGain: string;
  readonly intervals: string;
  readonly numberNeeded: string;
  readonly outOf: (denominator: string) => string;
  readonly oddsRatio: string;
  readonly chiSquare: string;
  readonly chiSquareYates: string;
  readonly fisherExact: string;
  readonly cramersV: string;
  /** An estimate with its interval: "15% (12% to 18%)". */
  readonly withRange: (estimate: string, lower: string, upper: string) => string;
  /** The reduction's value; `increase` when it is negative. */
  readonly reductionValue: (points: string, increase: boolean) => string;
  /** The gain's value; `fewer` when it is negative. */
  readonly gainValue: (points: string, fewer: boolean) => string;
  readonly intervalsValue: (level: string) => string;
  /** People with and without the option, and the change as people. */
  readonly outOfValue: (without: string, withOption: string, change: string) => string;
  readonly fewer: (count: string) => string;
  readonly more: (count: string) => string;
  readonly noDifference: string;
  /** A difference too small for one whole person of the words' denominator. */
  readonly belowOne: (denominator: number, formatted: string, direction: 'fewer' | 'more') => string;
  readonly chiSquareValue: (statistic: string, p: string) => string;
  readonly warningsHeading: string;
  /** The line under a topic's title. */
  readonly topicScope: (population: string, duration: string, per: string) => string;
  readonly duration: (period: PeriodValues) => string;
  readonly illustrative: string;
  readonly outcomeHeading: (name: string, kind: 'benefit' | 'harm', wanted: boolean, headline: boolean) => string;
  readonly comparisonLine: (option: string, count: string, denominator: string, percent: string) => string;
  readonly optionHeading: (option: string) => string;
}

/** The lines `chart` and `handout` print once a file is written. */
export interface CliReportWords {
  readonly chartWritten: (path: string, arrays: number, people: number) => string;
  /** A warning on the handout just made, for stderr; the handout is still written. */
  readonly handoutWarning: (sentence: string) => string;
  readonly handoutWritten: (path: string, paper: string, grade: string) => string;
  /**
   * The same line for a Spanish handout: its reading ease on the INFLESZ scale (Szigriszt-Pazos
   * perspicuity, bands of Barrio-Cantalejo et al. 2008), its band and the aim.
   */
  readonly handoutWrittenSpanish: (path: string, paper: string, ease: string, band: string, target: number) => string;
  /** The INFLESZ bands' names, in the clinician's language. */
  readonly infleszBands: Readonly<Record<InfleszBand, string>>;
  readonly batchWritten: (written: number, total: number, folder: string) => string;
  readonly paperName: Readonly<Record<Paper, string>>;
}

/** Everything the command line prints, in one language. */
export interface CliWords {
  readonly usage: CliUsageMessages;
  readonly reasons: CliFileReasons;
  readonly numbers: CliNumberWords;
  readonly summary: CliSummaryWords;
  readonly reports: CliReportWords;
  /** The text of `chancewise --help`. */
  readonly help: string;
  /** The core's sentences for problems and warnings, and the words of the NNT. */
  readonly catalogue: Catalogue;
  /** Why a handout was not made (it does not fit on its page), in the clinician's words. */
  readonly handoutRefusal: HandoutRefusalMessages;
}
