import type { EffectComputation } from '../core/compute-effect.ts';
import { benefitOf, changeOf } from '../core/direction.ts';
import { duration } from '../core/messages/en/wording.ts';
import { formatCount, formatDecimal, formatPercentSignificant, formatSignificant } from '../core/messages/format-number.ts';
import type { EffectResult, TopicResult } from '../core/topic/topic-result.ts';
import type { Estimate, Notice, PeopleCounts } from '../core/types.ts';
import { warningSentences } from './warning-sentences.ts';

/**
 * Risks and percentage points keep their meaning when written: one decimal from 1 up, two
 * significant figures below, so that 0.02 points is not "0" and −0.01 keeps its sign.
 */
const percent = (value: number): string => formatPercentSignificant(value);
const points = (value: number): string => formatSignificant(value * 100).replace(/^-/, '−');

function withRange(value: Estimate, show: (number: number) => string): string {
  if (value.lower === null || value.upper === null) return show(value.estimate);
  return `${show(value.estimate)} (${show(value.lower)} to ${show(value.upper)})`;
}

/** One labelled row; rows of one summary share a width so their values line up. */
const row = (label: string, value: string, width: number): string => `${`${label}:`.padEnd(width)} ${value}`;

/**
 * The absolute difference as its row reads: for an event to avoid, the reduction (comparison −
 * option); for an event people want, the gain (option − comparison). Either way the label says
 * which, and a negative value says what it means.
 */
function differenceRow(result: EffectResult, wanted: boolean, width: number): string {
  const reduction = result.absoluteReduction;
  if (!wanted) {
    const note = reduction.estimate < 0 ? ', negative: an increase' : '';
    return row('Absolute reduction', `${withRange(reduction, points)} percentage points${note}`, width);
  }
  const gain = benefitOf(reduction, true);
  const note = changeOf(reduction.estimate, true) === 'harms' ? ', negative: fewer people have it' : '';
  return row('Absolute gain', `${withRange(gain, points)} percentage points${note}`, width);
}

/** The change as people: "5 fewer", "20 more", or why no whole person shows it. */
function changeText(people: PeopleCounts<number>, exact: number): string {
  if (people.difference > 0) return `${formatCount(people.difference)} fewer`;
  if (people.difference < 0) return `${formatCount(-people.difference)} more`;
  // "No difference" only when the difference is exactly 0, never when rounding hid it.
  if (exact === 0) return 'no difference';
  const direction = exact > 0 ? 'fewer' : 'more';
  if (people.denominator === 1000000) return `fewer than 1 in a million ${direction}`;
  return `fewer than 1 in ${formatCount(people.denominator)} ${direction}: too small to show as whole people`;
}

function effectLines(result: EffectResult, words: PeopleCounts<number> | null, indent: string, wanted: boolean): string[] {
  const lines: string[] = [];
  // A wanted event is a chance, not a risk; the measure keeps its name ("risk ratio").
  const noun = wanted ? 'Chance' : 'Risk';
  const width = wanted ? 26 : 24;
  if (result.comparisonRisk !== null)
    lines.push(row(`${noun} without the option`, withRange(result.comparisonRisk, percent), width));
  if (result.interventionRisk !== null)
    lines.push(row(`${noun} with the option`, withRange(result.interventionRisk, percent), width));
  if (result.relativeRisk !== null) {
    lines.push(
      row(
        'Risk ratio',
        withRange(result.relativeRisk, (value) => formatDecimal(value, 3)),
        width,
      ),
    );
  }
  lines.push(differenceRow(result, wanted, width));
  const ranged = [result.interventionRisk, result.relativeRisk, result.absoluteReduction].some(
    (value) => value !== null && value.lower !== null,
  );
  if (ranged && result.level !== null) {
    lines.push(row('Intervals', `${formatSignificant(result.level * 100, 1)}% intervals (in brackets)`, width));
  }
  lines.push(row('Number needed to treat', result.nnt.text, width));
  if (words !== null) {
    const change = changeText(words, result.absoluteReduction.estimate);
    const counts = `${formatCount(words.comparison)} without, ${formatCount(words.intervention)} with the option (${change})`;
    lines.push(row(`Out of ${formatCount(words.denominator)} people`, counts, width));
  }
  return lines.map((line) => `${indent}${line}`);
}

function warningLines(notices: readonly Notice[]): string[] {
  if (notices.length === 0) return [];
  return ['Warnings:', ...warningSentences(notices).map((sentence) => `  - ${sentence}`)];
}

/** The readable summary of one effect, for a terminal. */
export function effectSummary(result: EffectComputation, wanted = false): string {
  const lines = effectLines(result, result.wordsPeople, '', wanted);
  const counts = result.counts;
  if (counts !== null) {
    if (counts.oddsRatio !== null)
      lines.push(`Odds ratio:              ${withRange(counts.oddsRatio, (value) => formatDecimal(value, 3))}`);
    if (counts.chiSquare !== null) {
      lines.push(
        `Chi-square:              ${formatDecimal(counts.chiSquare.statistic, 3)}, p = ${formatDecimal(counts.chiSquare.p, 4)}`,
      );
    }
    if (counts.chiSquareYates !== null) {
      lines.push(
        `Chi-square (Yates):      ${formatDecimal(counts.chiSquareYates.statistic, 3)}, p = ${formatDecimal(counts.chiSquareYates.p, 4)}`,
      );
    }
    if (counts.fisherExactP !== null) lines.push(`Fisher's exact p:        ${formatDecimal(counts.fisherExactP, 4)}`);
    if (counts.cramersV !== null) lines.push(`Cramér's V:              ${formatDecimal(counts.cramersV, 3)}`);
  }
  return `${[...lines, ...warningLines(result.notices)].join('\n')}\n`;
}

/** The readable summary of a whole topic, for a terminal. */
export function topicSummary(result: TopicResult): string {
  const lines = [
    result.title,
    `For ${result.population}, over ${duration({ years: result.periodYears, unit: result.periodUnit })}, per ${formatCount(result.wordsDenominator)} people.`,
  ];
  if (result.illustrative) lines.push('Illustrative example: invented numbers, not for real decisions.');
  for (const outcome of result.outcomes) {
    const wanted = outcome.wanted ? ', an event people want' : '';
    lines.push('', `${outcome.name} (${outcome.kind}${wanted}${outcome.isHeadline ? ', headline' : ''})`);
    for (const option of outcome.options) {
      if (option.isComparison) {
        const shown = `${formatCount(option.wordsPeople.comparison)} in ${formatCount(result.wordsDenominator)}`;
        lines.push(`  ${option.name} (comparison): ${shown} (${percent(option.comparisonRisk.estimate)})`);
        continue;
      }
      lines.push(`  ${option.name}:`, ...effectLines(option, option.wordsPeople, '    ', outcome.wanted));
    }
  }
  const warnings = warningLines(result.notices);
  if (warnings.length > 0) lines.push('', ...warnings);
  return `${lines.join('\n')}\n`;
}
