import type { ProblemValues } from '../../problems.ts';
import { formatDecimal, formatPercent } from '../format-number.ts';

type Render = (values: ProblemValues) => string;

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
  | 'denominator-raised'
  | 'reading-grade-high';

/** English sentences for every warning code. */
export const noticeMessages: Record<NoticeCode, Render> = {
  'interval-ignores-baseline-uncertainty': () =>
    'The intervals reflect uncertainty in the effect only, not in the baseline risk.',
  'baseline-period-converted': (v) =>
    `The baseline risk of ${percent(v, 'risk')} over ${text(v, 'from')} years was converted to ${percent(v, 'converted')} over ${text(v, 'to')} years, assuming a constant hazard.`,
  'period-beyond-followup': (v) =>
    `The period of ${text(v, 'period')} years is longer than the ${text(v, 'followup')} years over which the effect${v.option === undefined ? '' : ` of ${text(v, 'option')}`} was measured: the result assumes the effect lasts.`,
  'counts-zero-cell-corrected': () =>
    'A cell of the trial table is 0, so 0.5 was added to every cell to compute the ratios (Haldane–Anscombe correction).',
  'counts-ratios-undefined': () =>
    'The risk ratio and odds ratio cannot be computed: neither arm has an event, or both arms are all events.',
  'counts-baseline-from-trial': (v) =>
    `No baseline risk was given${v.outcome === undefined ? '' : ` for ${text(v, 'outcome')}`}, so the trial’s comparison arm was used as the baseline. The patient’s own risk may differ.`,
  'hr-proportional-hazards': () =>
    'The hazard ratio was applied assuming proportional hazards over the whole period.',
  'denominator-raised': () =>
    'The numbers are shown per 1000 people, because per 100 they would round a difference away or move it by half a person or more.',
  'reading-grade-high': (v) => {
    const grade = v.grade;
    const shown = typeof grade === 'number' ? formatDecimal(grade, 1) : text(v, 'grade');
    return `The text in ${text(v, 'field')} reads at about grade ${shown}, above grade ${text(v, 'limit')}. Shorter sentences and everyday words make it easier to read.`;
  },
};
