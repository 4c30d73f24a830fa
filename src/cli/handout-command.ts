import packageJson from '../../package.json' with { type: 'json' };
import { readCalendarDate } from '../core/calendar-date.ts';
import { TOPIC_LIMITS, type Topic } from '../core/topic/topic.ts';
import { topicLanguage } from '../core/topic/topic-language.ts';
import type { ReadingLevel } from '../core/wording/reading-scale.ts';
import { buildHandout } from '../handout/build-handout.ts';
import { handoutWordsFor } from '../handout/handout-words.ts';
import { loadHandoutFonts } from '../handout/node-fonts.ts';
import type { Paper } from '../handout/paper-size.ts';
import { outputPath, writeOutput } from './chart-command.ts';
import type { CommandOutput } from './command-output.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { computeTopicOrFail } from './compute-command.ts';
import { handoutChoices } from './handout-choices.ts';
import { parsePer } from './effect-flags.ts';
import { type MadeHandout, runHandoutBatch } from './handout-batch.ts';
import { type ParsedArgs, parseArgs, valueOf } from './parse-args.ts';
import { demoFiles, topicFromArgs } from './topic-input.ts';
import { UsageError } from './usage-error.ts';
import { warningSentences } from './warning-sentences.ts';

const HANDOUT_FLAGS = {
  '--demo': { takesValue: false },
  '--out': { takesValue: true, example: 'handout.pdf' },
  '--out-dir': { takesValue: true, example: 'handouts' },
  '--paper': { takesValue: true, example: 'a4' },
  '--date': { takesValue: true, example: '2026-12-01' },
  '--show-nnt': { takesValue: false },
  '--no-nnt': { takesValue: false },
  '--clinician': { takesValue: true, example: '"Dr A. Patel, Riverside Surgery"' },
  '--per': { takesValue: true, example: '100' },
};

/** Read --paper: a4 (the default) or letter. */
export function parsePaper(value: string | undefined, words: CliWords): Paper {
  if (value === undefined) return 'a4';
  const key = value.trim().toLowerCase();
  if (key === 'a4' || key === 'letter') return key;
  throw new UsageError(words.usage.paperValue(value));
}

/** Read --date: a real calendar date written YYYY-MM-DD, 1970 to 2037 (the dates a PDF file from jsPDF can carry). */
export function parseDate(value: string, words: CliWords): string {
  const reading = readCalendarDate(value);
  if (reading.kind === 'date' && reading.year >= 1970 && reading.year <= 2037) return value.trim();
  throw new UsageError(words.usage.dateValue(value));
}

/** Today's date on this computer's clock, YYYY-MM-DD. */
function today(): string {
  const now = new Date();
  const two = (value: number) => String(value).padStart(2, '0');
  return `${now.getFullYear()}-${two(now.getMonth() + 1)}-${two(now.getDate())}`;
}

/**
 * The handout flags of a call, read once and applied to every topic of it; each flag given
 * overrides the choice the topic's file keeps (`topic.handout`, version 4 files).
 */
function handoutOf(parsed: ParsedArgs, words: CliWords): (topic: Topic) => MadeHandout {
  const paperFlag = valueOf(parsed, '--paper');
  const paper = paperFlag === undefined ? null : parsePaper(paperFlag, words);
  const showNnt = parsed.flags.has('--show-nnt') ? true : parsed.flags.has('--no-nnt') ? false : null;
  const dateFlag = valueOf(parsed, '--date');
  const date = dateFlag === undefined ? today() : parseDate(dateFlag, words);
  const clinician = (valueOf(parsed, '--clinician') ?? '').trim();
  if (clinician.length > TOPIC_LIMITS.clinicianLength) {
    throw new UsageError(words.usage.clinicianTooLong(clinician.length, TOPIC_LIMITS.clinicianLength));
  }
  const per = parsePer(parsed, words);
  const fonts = loadHandoutFonts();
  return (topic) => {
    const choices = handoutChoices({ paper, showNnt, per }, topic.handout);
    const result = computeTopicOrFail(topic, choices.per, words);
    const built = buildHandout(
      result,
      topic,
      {
        paper: choices.paper,
        date,
        appVersion: packageJson.version,
        showNnt: choices.showNnt,
        clinician,
        words: handoutWordsFor(topicLanguage(topic)),
        refusal: words.handoutRefusal,
      },
      fonts,
    );
    if (!built.ok) throw new UsageError(built.message);
    const paperName = words.reports.paperName[choices.paper];
    return {
      pdf: built.pdf,
      report: (path) => writtenLine(path, paperName, built.readingScale, built.readability.grade, words),
      warnings: warningSentences(built.readingWarnings, words.catalogue).map(words.reports.handoutWarning),
    };
  };
}

/** The line reporting a handout written, with its reading level on the scale of its language. */
function writtenLine(path: string, paper: string, level: ReadingLevel, grade: number | null, words: CliWords): string {
  if (level.scale === 'inflesz') {
    const band = level.band === null ? '–' : words.reports.infleszBands[level.band];
    return words.reports.handoutWrittenSpanish(path, paper, level.score === null ? '–' : String(level.score), band, level.target);
  }
  // The English line keeps the unrounded grade's one decimal, as it always has.
  return words.reports.handoutWritten(path, paper, grade === null ? '–' : grade.toFixed(1));
}

/** The topic files of a batch call (`--out-dir`): the files given, or the first demo topic. */
function batchInputs(parsed: ParsedArgs, words: CliWords): string[] {
  const demo = parsed.flags.has('--demo');
  if (demo && parsed.positionals.length > 0) throw new UsageError(words.usage.topicAndDemo());
  const first = demo ? demoFiles()[0] : undefined;
  const inputs = first === undefined ? [...parsed.positionals] : [first];
  if (inputs.length === 0) throw new UsageError(words.usage.handoutNeedsTopic());
  return inputs;
}

/**
 * `chancewise handout`: the one-page patient handout of a topic, as a PDF (`--out`), or of
 * each of several topic files into a folder (`--out-dir`, see handout-batch.ts).
 */
export function runHandout(args: readonly string[], words: CliWords): CommandOutput {
  const parsed = parseArgs(args, HANDOUT_FLAGS, words);
  const folder = valueOf(parsed, '--out-dir');
  if (folder !== undefined) {
    if (parsed.flags.has('--out')) throw new UsageError(words.usage.outAndOutDir());
    const inputs = batchInputs(parsed, words);
    return runHandoutBatch(inputs, folder, handoutOf(parsed, words), words);
  }
  if (parsed.positionals.length > 1) throw new UsageError(words.usage.outWithSeveral(parsed.positionals.length));
  const out = outputPath(valueOf(parsed, '--out'), '.pdf', 'handout.pdf', words);
  const make = handoutOf(parsed, words);
  const topic = topicFromArgs(parsed, words);
  if (topic === null) throw new UsageError(words.usage.handoutNeedsTopic());
  const made = make(topic);
  writeOutput(out, made.pdf, words);
  return { stdout: `${made.report(out)}\n`, stderr: made.warnings.map((line) => `${line}\n`).join('') };
}
