import { writeFileSync } from 'node:fs';
import { computeEffect } from '../core/compute-effect.ts';
import { changeOf } from '../core/direction.ts';
import type { TopicResult } from '../core/topic/topic-result.ts';
import { outcomeChart, pairChart } from '../render/chart-model.ts';
import type { ChartModel } from '../render/chart-model.ts';
import { chartSvgFile } from '../render/export/chart-svg-file.ts';
import { svgTextDocument } from '../render/svg/svg-text-document.ts';
import type { CommandOutput } from './command-output.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { computeTopicOrFail, refuseEffectFlags } from './compute-command.ts';
import { EFFECT_FLAGS, effectQueryFromFlags, parsePer } from './effect-flags.ts';
import { parseArgs, valueOf } from './parse-args.ts';
import { topicFromArgs } from './topic-input.ts';
import { UsageError } from './usage-error.ts';

const CHART_FLAGS = {
  ...EFFECT_FLAGS,
  '--demo': { takesValue: false },
  '--out': { takesValue: true, example: 'chart.svg' },
  '--outcome': { takesValue: true, example: '"a stroke"' },
  '--show-range': { takesValue: false },
};

/** The outcome a topic chart shows: the one named by --outcome (name or id), or the headline. */
export function chosenOutcome(result: TopicResult, wanted: string | undefined, words: CliWords): string {
  if (wanted === undefined) {
    const headline = result.outcomes.find((outcome) => outcome.isHeadline) ?? result.outcomes[0];
    if (headline === undefined) throw new Error('a valid topic has at least one outcome');
    return headline.outcomeId;
  }
  const key = wanted.trim().toLowerCase();
  const found = result.outcomes.find((outcome) => outcome.outcomeId === wanted || outcome.name.trim().toLowerCase() === key);
  if (found === undefined) {
    throw new UsageError(words.usage.outcomeUnknown(wanted, result.outcomes.map((outcome) => `"${outcome.name}"`).join(', ')));
  }
  return found.outcomeId;
}

/** Check --out: given, and ending in the expected extension. */
export function outputPath(value: string | undefined, extension: string, example: string, words: CliWords): string {
  if (value === undefined) throw new UsageError(words.usage.outNeeded(example));
  if (!value.toLowerCase().endsWith(extension)) throw new UsageError(words.usage.outExtension(value, extension));
  return value;
}

/** Write a file, turning a failure into a one-line message in `words`. */
export function writeOutput(path: string, contents: string | Uint8Array, words: CliWords): void {
  try {
    writeFileSync(path, contents);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason =
      code === 'ENOENT'
        ? words.reasons.folderMissing
        : code === 'EACCES'
          ? words.reasons.permissionDenied
          : (code ?? words.reasons.writeFailed);
    throw new UsageError(words.usage.fileUnwritable(path, reason));
  }
}

function chartModel(args: ReturnType<typeof parseArgs>, words: CliWords): ChartModel {
  const wanted = valueOf(args, '--outcome');
  const topic = topicFromArgs(args, words);
  if (topic !== null) {
    refuseEffectFlags(args, words);
    const result = computeTopicOrFail(topic, parsePer(args, words), words);
    return outcomeChart(result, chosenOutcome(result, wanted, words));
  }
  const query = effectQueryFromFlags(args, words);
  const result = computeEffect(query);
  if (result.perPeople === null) throw new UsageError(words.usage.chartNeedsBaseline());
  const periodYears = query.periods?.targetYears ?? null;
  const eventWanted = query.wanted === true;
  const kind = changeOf(result.perPeople.difference, eventWanted) === 'harms' ? 'harm' : 'benefit';
  const comparison = result.comparisonRisk?.estimate ?? result.baselineUsed;
  const intervention = result.interventionRisk?.estimate ?? null;
  if (comparison === null || intervention === null) throw new UsageError(words.usage.chartNeedsBaseline());
  return pairChart({
    perPeople: result.perPeople,
    risks: { comparison, intervention },
    level: result.level,
    wordsPeople: result.wordsPeople,
    periodYears,
    ...(query.periods?.targetUnit === undefined ? {} : { periodUnit: query.periods.targetUnit }),
    kind,
    wanted: eventWanted,
    ...(wanted === undefined ? {} : { outcomeName: wanted }),
  });
}

/** `chancewise chart`: an SVG of the people charts for a topic's outcome or a bare effect, the file the app saves. */
export function runChart(args: readonly string[], words: CliWords): CommandOutput {
  const parsed = parseArgs(args, CHART_FLAGS, words);
  const out = outputPath(valueOf(parsed, '--out'), '.svg', 'chart.svg', words);
  const model = chartModel(parsed, words);
  const svg = chartSvgFile(model, svgTextDocument(), { showRange: parsed.flags.has('--show-range') });
  writeOutput(out, svg, words);
  const people = model.arrays.length * model.denominator;
  return { stdout: `${words.reports.chartWritten(out, model.arrays.length, people)}\n` };
}
