import type { EffectComputation } from '../core/compute-effect.ts';
import { benefitOf, changeOf } from '../core/direction.ts';
import { numberNeeded } from '../core/number-needed.ts';
import type { EffectResult, TopicResult } from '../core/topic/topic-result.ts';
import type { Estimate, Notice, PeopleCounts } from '../core/types.ts';
import type { CliWords } from './messages/cli-messages.ts';
import { cliWordsEn } from './messages/en.ts';
import { warningSentences } from './warning-sentences.ts';

function withRange(value: Estimate, show: (number: number) => string, words: CliWords): string {
  if (value.lower === null || value.upper === null) return show(value.estimate);
  return words.summary.withRange(show(value.estimate), show(value.lower), show(value.upper));
}

/** One labelled row; rows of one summary share a width so their values line up. */
const row = (label: string, value: string, width: number): string => `${`${label}:`.padEnd(width)} ${value}`;

/** The width of a summary's labels with their colon: the longest label it may print. */
const widthOf = (labels: readonly string[]): number => Math.max(...labels.map((label) => label.length)) + 1;

/** The labels of the rows of one effect, for the width they share. */
function effectLabels(words: CliWords, wanted: boolean, denominator: number | null): string[] {
  const { summary } = words;
  const labels = [
    summary.riskWithout(wanted),
    summary.riskWith(wanted),
    summary.riskRatio,
    summary.intervals,
    summary.numberNeeded,
  ];
  labels.push(wanted ? summary.absoluteGain : summary.absoluteReduction);
  if (denominator !== null) labels.push(summary.outOf(words.numbers.count(denominator)));
  return labels;
}

/**
 * The absolute difference as its row reads: for an event to avoid, the reduction (comparison −
 * option); for an event people want, the gain (option − comparison). Either way the label says
 * which, and a negative value says what it means.
 */
function differenceRow(result: EffectResult, wanted: boolean, width: number, words: CliWords): string {
  const reduction = result.absoluteReduction;
  const points = words.numbers.points;
  if (!wanted) {
    const value = words.summary.reductionValue(withRange(reduction, points, words), reduction.estimate < 0);
    return row(words.summary.absoluteReduction, value, width);
  }
  const gain = benefitOf(reduction, true);
  const value = words.summary.gainValue(withRange(gain, points, words), changeOf(reduction.estimate, true) === 'harms');
  return row(words.summary.absoluteGain, value, width);
}

/** The change as people: "5 fewer", "20 more", or why no whole person shows it. */
function changeText(people: PeopleCounts<number>, exact: number, words: CliWords): string {
  const { count } = words.numbers;
  if (people.difference > 0) return words.summary.fewer(count(people.difference));
  if (people.difference < 0) return words.summary.more(count(-people.difference));
  // "No difference" only when the difference is exactly 0, never when rounding hid it.
  if (exact === 0) return words.summary.noDifference;
  return words.summary.belowOne(people.denominator, count(people.denominator), exact > 0 ? 'fewer' : 'more');
}

function effectLines(
  result: EffectResult,
  people: PeopleCounts<number> | null,
  indent: string,
  wanted: boolean,
  words: CliWords,
): string[] {
  const { summary, numbers } = words;
  const lines: string[] = [];
  const width = widthOf(effectLabels(words, wanted, people?.denominator ?? null));
  const ratio = (value: number) => numbers.decimal(value, 3);
  if (result.comparisonRisk !== null)
    lines.push(row(summary.riskWithout(wanted), withRange(result.comparisonRisk, numbers.percent, words), width));
  if (result.interventionRisk !== null)
    lines.push(row(summary.riskWith(wanted), withRange(result.interventionRisk, numbers.percent, words), width));
  if (result.relativeRisk !== null) lines.push(row(summary.riskRatio, withRange(result.relativeRisk, ratio, words), width));
  lines.push(differenceRow(result, wanted, width, words));
  const ranged = [result.interventionRisk, result.relativeRisk, result.absoluteReduction].some(
    (value) => value !== null && value.lower !== null,
  );
  if (ranged && result.level !== null) {
    lines.push(row(summary.intervals, summary.intervalsValue(numbers.level(result.level)), width));
  }
  // The same NNT as the result's, written with this catalogue's words for "to" and infinity.
  const nnt = numberNeeded(result.absoluteReduction, { wanted, words: words.catalogue.numbers });
  lines.push(row(summary.numberNeeded, nnt.text, width));
  if (people !== null) {
    const change = changeText(people, result.absoluteReduction.estimate, words);
    const counts = summary.outOfValue(numbers.count(people.comparison), numbers.count(people.intervention), change);
    lines.push(row(summary.outOf(numbers.count(people.denominator)), counts, width));
  }
  return lines.map((line) => `${indent}${line}`);
}

function warningLines(notices: readonly Notice[], words: CliWords): string[] {
  if (notices.length === 0) return [];
  return [words.summary.warningsHeading, ...warningSentences(notices, words.catalogue).map((sentence) => `  - ${sentence}`)];
}

/** The rows of the trial-count statistics, lined up with the effect's rows of an event to avoid. */
function countsLines(counts: NonNullable<EffectComputation['counts']>, words: CliWords): string[] {
  const { summary, numbers } = words;
  const labels = [summary.oddsRatio, summary.chiSquare, summary.chiSquareYates, summary.fisherExact, summary.cramersV];
  const width = Math.max(widthOf(effectLabels(words, false, null)), widthOf(labels));
  const lines: string[] = [];
  const decimal = (digits: number) => (value: number) => numbers.decimal(value, digits);
  if (counts.oddsRatio !== null) lines.push(row(summary.oddsRatio, withRange(counts.oddsRatio, decimal(3), words), width));
  for (const [label, test] of [
    [summary.chiSquare, counts.chiSquare],
    [summary.chiSquareYates, counts.chiSquareYates],
  ] as const) {
    if (test !== null) lines.push(row(label, summary.chiSquareValue(decimal(3)(test.statistic), decimal(4)(test.p)), width));
  }
  if (counts.fisherExactP !== null) lines.push(row(summary.fisherExact, decimal(4)(counts.fisherExactP), width));
  if (counts.cramersV !== null) lines.push(row(summary.cramersV, decimal(3)(counts.cramersV), width));
  return lines;
}

/**
 * The readable summary of one effect, for a terminal, in the given words (the command line
 * passes its own; English for a caller that gives none).
 */
export function effectSummary(result: EffectComputation, wanted = false, words: CliWords = cliWordsEn): string {
  const lines = effectLines(result, result.wordsPeople, '', wanted, words);
  if (result.counts !== null) lines.push(...countsLines(result.counts, words));
  return `${[...lines, ...warningLines(result.notices, words)].join('\n')}\n`;
}

/** The readable summary of a whole topic, for a terminal, in the given words. */
export function topicSummary(result: TopicResult, words: CliWords): string {
  const { summary, numbers } = words;
  const period = summary.duration({ years: result.periodYears, unit: result.periodUnit });
  const lines = [result.title, summary.topicScope(result.population, period, numbers.count(result.wordsDenominator))];
  if (result.illustrative) lines.push(summary.illustrative);
  for (const outcome of result.outcomes) {
    lines.push('', summary.outcomeHeading(outcome.name, outcome.kind, outcome.wanted, outcome.isHeadline));
    for (const option of outcome.options) {
      if (option.isComparison) {
        const count = numbers.count(option.wordsPeople.comparison);
        const line = summary.comparisonLine(
          option.name,
          count,
          numbers.count(result.wordsDenominator),
          numbers.percent(option.comparisonRisk.estimate),
        );
        lines.push(`  ${line}`);
        continue;
      }
      lines.push(
        `  ${summary.optionHeading(option.name)}`,
        ...effectLines(option, option.wordsPeople, '    ', outcome.wanted, words),
      );
    }
  }
  const warnings = warningLines(result.notices, words);
  if (warnings.length > 0) lines.push('', ...warnings);
  return `${lines.join('\n')}\n`;
}
