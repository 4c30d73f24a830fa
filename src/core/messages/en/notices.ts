import type { ProblemValues } from '../../problems.ts';
import { isEffectMeasure } from '../../effect-measures.ts';
import { formatCount, formatDecimal, formatPercent } from '../format-number.ts';
import { isTimeUnit } from '../../time-unit.ts';
import { measureNamesEn } from './measure-names.ts';
import { amountWithUnit } from './time-words.ts';

type Render = (values: ProblemValues) => string;

/** English names of the INFLESZ bands (Barrio-Cantalejo et al. 2008: muy difícil, algo difícil, normal, bastante fácil, muy fácil). */
export const INFLESZ_BAND_NAMES: Readonly<Record<string, string>> = {
  'very-difficult': 'very difficult',
  'somewhat-difficult': 'somewhat difficult',
  normal: 'normal',
  'fairly-easy': 'fairly easy',
  'very-easy': 'very easy',
};

/** A span of time from an amount and its unit ("3 days", "1 year"); years when no unit is given. */
const span = (values: ProblemValues, key: string): string => {
  const amount = values[key];
  const unit = values[`${key}Unit`];
  return typeof amount === 'number' ? amountWithUnit(amount, isTimeUnit(unit) ? unit : 'years') : String(amount ?? '');
};

const text = (values: ProblemValues, key: string): string => String(values[key] ?? '');
const percent = (values: ProblemValues, key: string): string => {
  const value = values[key];
  return typeof value === 'number' ? formatPercent(value) : String(value ?? '');
};

/** Codes of the warnings the core can attach to a result. */
export type NoticeCode =
  | 'interval-ignores-baseline-uncertainty'
  | 'baseline-period-converted'
  | 'period-beyond-followup'
  | 'counts-zero-cell-corrected'
  | 'counts-ratios-undefined'
  | 'counts-baseline-from-trial'
  | 'hr-proportional-hazards'
  | 'opposite-ratio-applied'
  | 'opposite-odds-ratio-inverted'
  | 'denominator-raised'
  | 'rounding-moves-difference'
  | 'rounding-hides-difference'
  | 'difference-below-one-in-a-million'
  | 'reading-grade-high'
  | 'reading-ease-low';

/** English sentences for every warning code. */
export const noticeMessages: Record<NoticeCode, Render> = {
  'interval-ignores-baseline-uncertainty': () =>
    'The intervals reflect uncertainty in the effect only, not in the baseline risk.',
  'baseline-period-converted': (v) =>
    `The baseline risk of ${percent(v, 'risk')} over ${span(v, 'from')} was converted to ${percent(v, 'converted')} over ${span(v, 'to')}, assuming a constant hazard.`,
  'period-beyond-followup': (v) =>
    `The period of ${span(v, 'period')} is longer than the ${span(v, 'followup')} over which the effect${v.option === undefined ? '' : ` of ${text(v, 'option')}`} was measured: the result assumes the effect lasts.`,
  'counts-zero-cell-corrected': () =>
    'A cell of the trial table is 0, so 0.5 was added to every cell to compute the ratios (Haldane–Anscombe correction).',
  'counts-ratios-undefined': () =>
    'The risk ratio and odds ratio cannot be computed: neither arm has an event, or both arms are all events.',
  'counts-baseline-from-trial': (v) =>
    `No baseline risk was given${v.outcome === undefined ? '' : ` for ${text(v, 'outcome')}`}, so the trial’s comparison arm was used as the baseline. The patient’s own risk may differ.`,
  'hr-proportional-hazards': () => 'The hazard ratio was applied assuming proportional hazards over the whole period.',
  'opposite-ratio-applied': (v) =>
    `The ${isEffectMeasure(v.measure) ? measureNamesEn[v.measure] : 'effect'} was reported for the opposite event, so it was applied to the chance of not having the outcome. A ratio for one event is not the same as the inverse ratio for its opposite: check that the trial reported it this way.`,
  'opposite-odds-ratio-inverted': () =>
    'The odds ratio was reported for the opposite event, so its inverse (1 ÷ OR) was used; for odds ratios this is exact.',
  'denominator-raised': (v) => {
    const words = typeof v.denominator === 'number' ? v.denominator : 1000;
    const picture = typeof v.picture === 'number' ? v.picture : 1000;
    if (words <= 1000) {
      return `The numbers are shown per ${formatCount(words)} people, because per 100 a risk or a difference would show as 0 people, or rounding would move a difference by half a person or more.`;
    }
    return `The words and tables count per ${formatCount(words)} people, because per 1000 a risk or a difference would show as 0 people; the pictures show ${formatCount(picture)} people, too few to show that difference as whole people.`;
  },
  'rounding-moves-difference': (v) =>
    `Rounding to whole people moves a difference by ${text(v, 'people')} of a person out of ${formatCount(Number(v.denominator))}: the people counts are approximate, so read the percentages for the exact values.`,
  'rounding-hides-difference': (v) =>
    `A difference is smaller than 1 person in ${formatCount(Number(v.denominator))}, so the people counts show none. There is a difference: read the percentages, or count per more people.`,
  'difference-below-one-in-a-million': () =>
    'A difference is smaller than 1 in a million: the words say "fewer than 1 in a million" rather than a number of people.',
  'reading-grade-high': (v) => {
    const grade = v.grade;
    const shown = typeof grade === 'number' ? formatDecimal(grade, 1) : text(v, 'grade');
    return `The text in ${text(v, 'field')} reads at about grade ${shown}, above grade ${text(v, 'limit')}. Shorter sentences and everyday words make it easier to read.`;
  },
  'reading-ease-low': (v) => {
    const score = v.score;
    const shown = typeof score === 'number' ? formatCount(score) : text(v, 'score');
    const band = INFLESZ_BAND_NAMES[text(v, 'band')] ?? text(v, 'band');
    return `The text in ${text(v, 'field')} has a reading ease of ${shown} on the INFLESZ scale (${band}), below the aim of ${text(v, 'target')} (Barrio-Cantalejo et al. 2008). Shorter sentences and everyday words make it easier to read.`;
  },
};
