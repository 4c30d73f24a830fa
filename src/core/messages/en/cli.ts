/** English sentences for command-line usage problems. */
export const cliMessages = {
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
  topicInvalid: (first: string, count: number) =>
    count > 1 ? `${first} (and ${count - 1} more problem${count > 2 ? 's' : ''} in the topic)` : first,
  outcomeUnknown: (name: string, names: string) => `The topic has no outcome "${name}". Its outcomes are: ${names}.`,
  internal: (detail: string) => `Chancewise failed unexpectedly: ${detail}`,
  handoutNeedsTopic: () => 'A handout needs a topic: give a topic file or --demo.',
  clinicianTooLong: (length: number, limit: number) =>
    `--clinician is ${length} characters long; the handout allows up to ${limit}. Shorten it.`,
  /** A warning on the handout just made, for stderr; the handout is still written. */
  handoutWarning: (sentence: string) => `Warning: ${sentence}`,
  handoutWritten: (path: string, paper: string, grade: string) =>
    `Wrote ${path}: 1 page, ${paper}, reading grade ${grade} (Flesch–Kincaid).`,
  /**
   * The same line for a Spanish handout: its reading ease on the INFLESZ scale (Szigriszt-Pazos
   * perspicuity, bands of Barrio-Cantalejo et al. 2008), its band and the aim.
   */
  handoutWrittenSpanish: (path: string, paper: string, ease: string, band: string, target: number) =>
    `Wrote ${path}: 1 page, ${paper}, in Spanish, reading ease ${ease} on the INFLESZ scale (${band}; the aim is ${target} or more).`,
  /** The INFLESZ bands, in English for the clinician. */
  infleszBands: {
    'very-difficult': 'very difficult',
    'somewhat-difficult': 'somewhat difficult',
    normal: 'normal',
    'fairly-easy': 'fairly easy',
    'very-easy': 'very easy',
  },
  outWithSeveral: (count: number) =>
    `--out names one file, but ${count} topic files were given: use --out-dir FOLDER to write one handout per file.`,
  outAndOutDir: () => 'Give --out FILE.pdf for one handout or --out-dir FOLDER for one per topic file, not both.',
  folderUnusable: (path: string, reason: string) => `Cannot make the folder "${path}": ${reason}.`,
  batchWritten: (written: number, total: number, folder: string) =>
    `Wrote ${written} of ${total} handout${total === 1 ? '' : 's'} to ${folder}.`,
} as const;
