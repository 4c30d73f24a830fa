import type { EffectComputation } from '../core/compute-effect.ts';
import { formatDecimal, formatPercent } from '../core/messages/format-number.ts';
import type { EffectResult, TopicResult } from '../core/topic/topic-result.ts';
import type { Estimate, Notice } from '../core/types.ts';
import { warningSentences } from './warning-sentences.ts';

/** One decimal, or two below 1% so that a small risk such as 0.15% is not shown as 0.1%. */
const percent = (value: number): string => formatPercent(value, value > 0 && value < 0.01 ? 2 : 1);
const points = (value: number): string => formatDecimal(value * 100, 1).replace(/^-/, '−');

function withRange(value: Estimate, show: (number: number) => string): string {
  if (value.lower === null || value.upper === null) return show(value.estimate);
  return `${show(value.estimate)} (${show(value.lower)} to ${show(value.upper)})`;
}

function effectLines(result: EffectResult, indent: string): string[] {
  const lines: string[] = [];
  if (result.comparisonRisk !== null) lines.push(`Risk without the option: ${withRange(result.comparisonRisk, percent)}`);
  if (result.interventionRisk !== null) lines.push(`Risk with the option:    ${withRange(result.interventionRisk, percent)}`);
  if (result.relativeRisk !== null) {
    lines.push(`Risk ratio:              ${withRange(result.relativeRisk, (value) => formatDecimal(value, 3))}`);
  }
  const reduction = result.absoluteReduction;
  const note = reduction.estimate < 0 ? ', negative: an increase' : '';
  lines.push(`Absolute reduction:      ${withRange(reduction, points)} percentage points${note}`);
  lines.push(`Number needed to treat:  ${result.nnt.text}`);
  const people = result.perPeople;
  if (people !== null) {
    const change =
      people.difference === 0
        ? 'no difference'
        : people.difference > 0
          ? `${people.difference} fewer`
          : `${-people.difference} more`;
    lines.push(
      `Out of ${people.denominator} people:    ${people.comparison} without, ${people.intervention} with the option (${change})`,
    );
  }
  return lines.map((line) => `${indent}${line}`);
}

function warningLines(notices: readonly Notice[]): string[] {
  if (notices.length === 0) return [];
  return ['Warnings:', ...warningSentences(notices).map((sentence) => `  - ${sentence}`)];
}

/** The readable summary of one effect, for a terminal. */
export function effectSummary(result: EffectComputation): string {
  const lines = effectLines(result, '');
  const counts = result.counts;
  if (counts !== null) {
    if (counts.oddsRatio !== null) lines.push(`Odds ratio:              ${withRange(counts.oddsRatio, (value) => formatDecimal(value, 3))}`);
    if (counts.chiSquare !== null) {
      lines.push(`Chi-square:              ${formatDecimal(counts.chiSquare.statistic, 3)}, p = ${formatDecimal(counts.chiSquare.p, 4)}`);
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
    `For ${result.population}, over ${formatDecimal(result.periodYears, 2)} years, per ${result.denominator} people.`,
  ];
  if (result.illustrative) lines.push('Illustrative example: invented numbers, not for real decisions.');
  for (const outcome of result.outcomes) {
    lines.push('', `${outcome.name} (${outcome.kind}${outcome.isHeadline ? ', headline' : ''})`);
    for (const option of outcome.options) {
      if (option.isComparison) {
        lines.push(`  ${option.name} (comparison): ${option.perPeople.comparison} in ${result.denominator} (${percent(option.comparisonRisk.estimate)})`);
        continue;
      }
      lines.push(`  ${option.name}:`, ...effectLines(option, '    '));
    }
  }
  const warnings = warningLines(result.notices);
  if (warnings.length > 0) lines.push('', ...warnings);
  return `${lines.join('\n')}\n`;
}
