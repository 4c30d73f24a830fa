/** The command line's words in English: see `cli-messages.ts` for what each one is. */
import { english } from '../../core/messages/en/index.ts';
import { duration } from '../../core/messages/en/wording.ts';
import { formatCount, formatDecimal, formatPercentSignificant, formatSignificant } from '../../core/messages/format-number.ts';
import { handoutRefusalMessagesEn } from '../../handout/messages/refusal-messages.ts';
import type {
  CliFileReasons,
  CliNumberWords,
  CliReportWords,
  CliSummaryWords,
  CliUsageMessages,
  CliWords,
} from './cli-messages.ts';

const usage: CliUsageMessages = {
  unknownCommand: (name: string) => `Unknown command "${name}". Use compute, chart or handout (see chancewise --help).`,
  noCommand: () => 'No command given. Use compute, chart or handout (see chancewise --help).',
  unknownFlag: (flag: string) => `Unknown option ${flag}. See chancewise --help for the options.`,
  repeatedFlag: (flag: string) => `The option ${flag} is given twice. Give it once.`,
  missingValue: (flag: string, example: string) => `The option ${flag} needs a value, for example ${flag} ${example}.`,
  flagTakesNoValue: (flag: string) => `The option ${flag} takes no value.`,
  extraArgument: (value: string) => `Unexpected argument "${value}". Give at most one topic file.`,
  twoEffects: (first: string, second: string) =>
    `Give one effect only: found ${first} and ${second}. Use one of --rr, --or, --hr, --rrr or --arr.`,
  noEffect: () => 'Give an effect (--rr, --or, --hr, --rrr or --arr) with --baseline, or --counts, or a topic file, or --demo.',
  baselineNeeded: (flag: string) => `${flag} needs the patient’s baseline risk: add --baseline, for example --baseline 15%.`,
  baselineWithCounts: () =>
    '--counts takes the risks from the trial itself, so --baseline is not taken with it. Use a topic file to apply trial counts to a patient.',
  effectWithCounts: (flag: string) => `${flag} cannot be combined with --counts. Give one or the other.`,
  notWithTopic: (flag: string) => `${flag} cannot be used with a topic file or --demo: the topic holds its own numbers.`,
  topicAndDemo: () => 'Give a topic file or --demo, not both.',
  overAndTo: () => 'Give both --over YEARS (the period the baseline covers) and --to YEARS (the period wanted), or neither.',
  periodsWithArr: () =>
    '--over and --to cannot be used with --arr: an absolute reduction belongs to one period. Convert it first.',
  levelWithoutInterval: () => '--level is the level of --ci; give --ci LOW,HIGH too, or leave --level out.',
  ciFormat: (value: string) => `--ci "${value}" is not an interval. Write LOW,HIGH, for example --ci 0.6,0.9.`,
  perValue: (value: string) =>
    `--per "${value}" is not allowed. Use --per 100, 1000, 10000, 100000 or 1000000 (pictures use 1000 above 1000).`,
  methodValue: (value: string) => `--method "${value}" is not allowed. Use --method newcombe or --method wald.`,
  methodWithoutCounts: () => '--method applies to --counts only.',
  paperValue: (value: string) => `--paper "${value}" is not allowed. Use --paper a4 or --paper letter.`,
  dateValue: (value: string) => `--date "${value}" is not a date. Write it as YYYY-MM-DD, for example 2026-12-01.`,
  chartNeedsBaseline: () =>
    'A chart needs the risks with and without the option: give --baseline with --arr, for example --baseline 15%.',
  outNeeded: (example: string) => `Give the output file with --out, for example --out ${example}.`,
  outExtension: (value: string, extension: string) => `--out "${value}" must end in ${extension}.`,
  fileUnreadable: (path: string, reason: string) => `Cannot read the topic file "${path}": ${reason}.`,
  fileUnwritable: (path: string, reason: string) => `Cannot write "${path}": ${reason}.`,
  topicInvalidUnnamed: () => 'invalid topic',
  topicInvalid: (first: string, count: number) =>
    count > 1 ? `${first} (and ${count - 1} more problem${count > 2 ? 's' : ''} in the topic)` : first,
  outcomeUnknown: (name: string, names: string) => `The topic has no outcome "${name}". Its outcomes are: ${names}.`,
  internal: (detail: string) => `Chancewise failed unexpectedly: ${detail}`,
  handoutNeedsTopic: () => 'A handout needs a topic: give a topic file or --demo.',
  clinicianTooLong: (length: number, limit: number) =>
    `--clinician is ${length} characters long; the handout allows up to ${limit}. Shorten it.`,
  outWithSeveral: (count: number) =>
    `--out names one file, but ${count} topic files were given: use --out-dir FOLDER to write one handout per file.`,
  outAndOutDir: () => 'Give --out FILE.pdf for one handout or --out-dir FOLDER for one per topic file, not both.',
  folderUnusable: (path: string, reason: string) => `Cannot make the folder "${path}": ${reason}.`,
};

const reasons: CliFileReasons = {
  noSuchFile: 'no such file',
  isFolder: 'it is a folder',
  folderMissing: 'the folder does not exist',
  permissionDenied: 'permission denied',
  fileInTheWay: 'a file of that name is in the way',
  folderInTheWay: 'a folder of that name is in the way',
  unreadable: 'unreadable',
  writeFailed: 'write failed',
};

/**
 * Risks and percentage points keep their meaning when written: one decimal from 1 up, two
 * significant figures below, so that 0.02 points is not "0" and −0.01 keeps its sign.
 */
const numbers: CliNumberWords = {
  count: formatCount,
  decimal: formatDecimal,
  percent: formatPercentSignificant,
  points: (value) => formatSignificant(value * 100).replace(/^-/, '−'),
  level: (level) => formatSignificant(level * 100, 1),
};

const summary: CliSummaryWords = {
  // A wanted event is a chance, not a risk; the measure keeps its name ("risk ratio").
  riskWithout: (wanted) => `${wanted ? 'Chance' : 'Risk'} without the option`,
  riskWith: (wanted) => `${wanted ? 'Chance' : 'Risk'} with the option`,
  riskRatio: 'Risk ratio',
  absoluteReduction: 'Absolute reduction',
  absoluteGain: 'Absolute gain',
  intervals: 'Intervals',
  numberNeeded: 'Number needed to treat',
  outOf: (denominator) => `Out of ${denominator} people`,
  oddsRatio: 'Odds ratio',
  chiSquare: 'Chi-square',
  chiSquareYates: 'Chi-square (Yates)',
  fisherExact: "Fisher's exact p",
  cramersV: "Cramér's V",
  withRange: (estimate, lower, upper) => `${estimate} (${lower} to ${upper})`,
  reductionValue: (points, increase) => `${points} percentage points${increase ? ', negative: an increase' : ''}`,
  gainValue: (points, fewer) => `${points} percentage points${fewer ? ', negative: fewer people have it' : ''}`,
  intervalsValue: (level) => `${level}% intervals (in brackets)`,
  outOfValue: (without, withOption, change) => `${without} without, ${withOption} with the option (${change})`,
  fewer: (count) => `${count} fewer`,
  more: (count) => `${count} more`,
  noDifference: 'no difference',
  belowOne: (denominator, formatted, direction) =>
    denominator === 1000000
      ? `fewer than 1 in a million ${direction}`
      : `fewer than 1 in ${formatted} ${direction}: too small to show as whole people`,
  chiSquareValue: (statistic, p) => `${statistic}, p = ${p}`,
  warningsHeading: 'Warnings:',
  topicScope: (population, period, per) => `For ${population}, over ${period}, per ${per} people.`,
  duration,
  illustrative: 'Illustrative example: invented numbers, not for real decisions.',
  outcomeHeading: (name, kind, wanted, headline) =>
    `${name} (${kind}${wanted ? ', an event people want' : ''}${headline ? ', headline' : ''})`,
  comparisonLine: (option, count, denominator, percent) => `${option} (comparison): ${count} in ${denominator} (${percent})`,
  optionHeading: (option) => `${option}:`,
};

const reports: CliReportWords = {
  chartWritten: (path, arrays, people) => `Wrote ${path}: ${arrays} arrays, ${people} people.`,
  handoutWarning: (sentence) => `Warning: ${sentence}`,
  handoutWritten: (path, paper, grade) => `Wrote ${path}: 1 page, ${paper}, reading grade ${grade} (Flesch–Kincaid).`,
  handoutWrittenSpanish: (path, paper, ease, band, target) =>
    `Wrote ${path}: 1 page, ${paper}, in Spanish, reading ease ${ease} on the INFLESZ scale (${band}; the aim is ${target} or more).`,
  infleszBands: {
    'very-difficult': 'very difficult',
    'somewhat-difficult': 'somewhat difficult',
    normal: 'normal',
    'fairly-easy': 'fairly easy',
    'very-easy': 'very easy',
  },
  batchWritten: (written, total, folder) => `Wrote ${written} of ${total} handout${total === 1 ? '' : 's'} to ${folder}.`,
  paperName: { a4: 'A4', letter: 'US Letter' },
};

/** The text of `chancewise --help`. */
const help = `chancewise: absolute risks, NNT and icon arrays for a treatment decision

Usage:
  chancewise compute --baseline RISK (--rr X | --or X | --hr X | --rrr PERCENT | --arr RISK)
                     [--ci LOW,HIGH] [--level 0.95] [--over YEARS --to YEARS] [--followup YEARS]
                     [--wanted] [--opposite] [--per 100|1000] [--json]
  chancewise compute --counts EVENTS/TOTAL,EVENTS/TOTAL [--level 0.95] [--method newcombe|wald]
                     [--wanted] [--opposite] [--per 100|1000] [--json]
  chancewise compute (TOPIC-FILE | --demo) [--per 100|1000] [--json]
  chancewise chart (TOPIC-FILE | --demo | effect flags of compute) --out FILE.svg
                     [--per 100|1000] [--outcome NAME] [--show-range]
  chancewise handout (TOPIC-FILE | --demo) --out FILE.pdf [--paper a4|letter] [--date YYYY-MM-DD]
                     [--show-nnt | --no-nnt] [--clinician TEXT] [--per 100|1000]
  chancewise handout TOPIC-FILE... --out-dir FOLDER [the other handout flags, for every file]

Risks: 0.2, 20%, 20/100, 1 in 5 or 200 per 1000. --rrr and its --ci are in percent.
--counts gives the option arm first, then the comparison arm.
--over is the period the baseline covers, --to the period wanted (constant hazard).
--wanted: the event is one people want (pain gone, stopped smoking); more of it is a benefit.
--opposite: the effect (or the counts) is for the opposite event, e.g. "still in pain" for
  "pain gone"; an odds ratio is inverted, other measures are applied to 1 − the risk.
handout: a topic file's own choices (paper, NNT, --per) are used unless a flag says otherwise.
--out-dir writes one PDF per topic file, named after it (-2, -3 when names repeat), and goes on
  past a bad file: each gets its line on stderr.
Exit status: 0 done, 2 input to fix (one line on stderr), 1 other failure (with --out-dir: a file
  that could not be written).
`;

/** Everything the command line prints, in English, with the core's English catalogue. */
export const cliWordsEn: CliWords = {
  usage,
  reasons,
  numbers,
  summary,
  reports,
  help,
  catalogue: english,
  handoutRefusal: handoutRefusalMessagesEn,
};
