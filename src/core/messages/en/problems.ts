import type { ProblemCode, ProblemValues } from '../../problems.ts';
import { isEffectMeasure } from '../../effect-measures.ts';
import { formatPercent } from '../format-number.ts';
import { capitalise } from './english-grammar.ts';
import { measureNamesEn } from './measure-names.ts';

type Render = (values: ProblemValues) => string;

const text = (values: ProblemValues, key: string): string => String(values[key] ?? '');
const percent = (values: ProblemValues, key: string): string => {
  const value = values[key];
  return typeof value === 'number' ? formatPercent(value) : String(value ?? '');
};

const measure = (values: ProblemValues): string => {
  const name = text(values, 'measure');
  return isEffectMeasure(name) ? measureNamesEn[name] : 'effect';
};
/** The measure with its article: "a risk ratio", "an odds ratio". */
const aMeasure = (values: ProblemValues): string => {
  const name = measure(values);
  return /^[aeiou]/.test(name) ? `an ${name}` : `a ${name}`;
};
/** A value of the measure as the clinician typed it: percent for reductions, plain for ratios. */
const measureValue = (values: ProblemValues, key: string): string => {
  const value = values[key];
  if (typeof value !== 'number') return String(value ?? '');
  const kind = text(values, 'measure');
  if (kind === 'arr') return formatPercent(value);
  if (kind === 'rrr') return `${String(value)}%`;
  return String(value);
};
/** The fix to suggest when a risk would leave 0% to 100%: an odds ratio only for risk and hazard ratios. */
const outsideFix = (values: ProblemValues, what: string): string =>
  text(values, 'measure') === 'rr' ? `Check the ${what}, or enter the effect as an odds ratio.` : `Check the ${what}.`;

/** English sentences for every problem code: what is wrong, and how to fix it. */
export const problemMessages: Record<ProblemCode, Render> = {
  'number-unparsable': (v) => `"${text(v, 'input')}" is not a number. Write digits, for example 0.75.`,
  'number-out-of-reach': (v) =>
    `"${text(v, 'input')}" is too ${text(v, 'size') === 'large' ? 'large' : 'small'} to compute with. Check the number: it is almost certainly a typing mistake.`,
  'number-missing': (v) => `The ${text(v, 'what')} is empty. Write a number, for example ${text(v, 'example')}.`,
  'risk-empty': () => 'The risk is empty. Write it as 20%, 0.2, 20/100, 1 in 5 or 200 per 1000.',
  'risk-unparsable': (v) => `"${text(v, 'input')}" is not a risk. Write it as 20%, 0.2, 20/100, 1 in 5 or 200 per 1000.`,
  'risk-ambiguous': (v) =>
    `A risk of "${text(v, 'input')}" is ambiguous: write ${text(v, 'input')}% or ${text(v, 'asProportion')}.`,
  'risk-denominator-zero': (v) => `"${text(v, 'input')}" divides by zero. The number of people must be at least 1.`,
  'risk-out-of-range': (v) => `A risk of "${text(v, 'input')}" is outside 0% to 100%. A risk must lie between 0% and 100%.`,
  'baseline-out-of-range': (v) =>
    `A baseline risk of ${percent(v, 'risk')} is not possible here: it must be more than 0% and less than 100%.`,
  'trial-baseline-unusable': (v) =>
    `The trial’s comparison arm (${text(v, 'arm')}) cannot stand in for the baseline risk: it must be more than 0% and less than 100%. Give the patient’s baseline risk, for example 15%.`,
  'baseline-missing': () =>
    'A baseline risk is needed to apply a risk ratio, odds ratio, hazard ratio or relative reduction. Give the patient’s risk, for example 15%.',
  'percent-unparsable': (v) => `"${text(v, 'input')}" is not a percentage. Write it as 25 or 25%.`,
  'level-out-of-range': (v) =>
    `An interval level of "${text(v, 'input')}" is not possible. Write a level between 50% and 99.9%, for example 0.95 or 95%.`,
  'ratio-not-positive': (v) => `${capitalise(aMeasure(v))} of ${text(v, 'value')} is not possible: it must be greater than 0.`,
  'rrr-out-of-range': (v) => `A relative risk reduction of ${text(v, 'value')}% is not possible: it must be less than 100%.`,
  'arr-out-of-range': (v) =>
    `An absolute risk reduction of ${percent(v, 'value')} is not possible: it must lie between −100% and 100%.`,
  'interval-incomplete': () => 'The interval needs both a lower and an upper limit, for example 0.6,0.9.',
  'interval-reversed': (v) =>
    `The interval is written the wrong way round: its first limit, ${text(v, 'lower')}, is above its second, ${text(v, 'upper')}. Write the lower limit first: ${text(v, 'upper')} to ${text(v, 'lower')}.`,
  'risk-certain': (v) =>
    `${capitalise(aMeasure(v))} of ${measureValue(v, 'value')} at a baseline risk of ${percent(v, 'baseline')} would make the outcome ${text(v, 'risk') === '1' ? 'certain (100%) with the option' : 'impossible (0%) with the option'}. A real effect does not do that: check the number.`,
  'interval-excludes-estimate': (v) =>
    `The interval ${text(v, 'lower')} to ${text(v, 'upper')} does not contain the estimate ${text(v, 'estimate')}. Check the numbers and their order.`,
  'rr-risk-above-one': (v) =>
    `A risk ratio of ${text(v, 'ratio')} at a baseline risk of ${percent(v, 'baseline')} would mean a risk of ${percent(v, 'risk')}. Check the numbers, or enter the effect as an odds ratio.`,
  'limit-risk-outside': (v) =>
    `The interval limit ${measureValue(v, 'limit')} of the ${measure(v)} at a baseline risk of ${percent(v, 'baseline')} would mean a risk of ${percent(v, 'risk')}, outside 0% to 100%. ${outsideFix(v, 'interval')}`,
  'risk-outside': (v) =>
    `${capitalise(aMeasure(v))} of ${measureValue(v, 'value')} at a baseline risk of ${percent(v, 'baseline')} would mean a risk of ${percent(v, 'risk')}, outside 0% to 100%. ${outsideFix(v, 'numbers')}`,
  'period-not-positive': (v) =>
    `A period of "${text(v, 'input')}" years is not possible. Write a number of years greater than 0, for example 10.`,
  'period-too-long': (v) =>
    `A period of "${text(v, 'input')}" years is too long: write at most ${text(v, 'limit')} years, for example 10.`,
  'period-pair-incomplete': () =>
    'Give both the period the baseline risk covers and the period wanted (--over YEARS --to YEARS), or neither.',
  'counts-too-large': (v) =>
    `"${text(v, 'input')}" is more people than Chancewise counts in one arm (at most ${text(v, 'limit')}). Check the counts.`,
  'counts-not-whole': (v) => `"${text(v, 'input')}" is not a whole number of people. Write counts like 12/100.`,
  'counts-negative': (v) => `"${text(v, 'input')}" is negative. Counts of people cannot be below 0.`,
  'counts-total-zero': (v) => `The arm "${text(v, 'input')}" has no people. Each arm needs a total of at least 1.`,
  'counts-events-above-total': (v) =>
    `The arm "${text(v, 'input')}" has more events than people. Write events/total, for example 12/100.`,
  'counts-unparsable': (v) =>
    `"${text(v, 'input')}" is not a pair of trial arms. Write EVENTS/TOTAL,EVENTS/TOTAL with the option first, for example 12/100,20/100.`,
  'topic-text-missing': (v) => `The ${text(v, 'what')} is empty. Write a short ${text(v, 'what')}.`,
  'topic-text-too-long': (v) =>
    `The ${text(v, 'what')} has ${text(v, 'length')} characters. Shorten it to ${text(v, 'limit')} or fewer.`,
  'topic-too-few-options': (v) => `A topic needs at least ${text(v, 'limit')} options; it has ${text(v, 'count')}.`,
  'topic-too-many-options': (v) =>
    `A topic can have at most ${text(v, 'limit')} options; it has ${text(v, 'count')}. Remove one.`,
  'topic-comparison-count': (v) => `Exactly one option must be the comparison; ${text(v, 'count')} are marked. Mark one.`,
  'topic-too-few-outcomes': () => 'A topic needs at least 1 outcome. Add one.',
  'topic-too-many-outcomes': (v) =>
    `A topic can have at most ${text(v, 'limit')} outcomes; it has ${text(v, 'count')}. Remove one.`,
  'topic-headline-count': (v) => `Exactly one outcome must be the headline; ${text(v, 'count')} are marked. Mark one.`,
  'topic-duplicate-id': (v) => `The identifier "${text(v, 'id')}" is used twice. Each must be different.`,
  'topic-duplicate-name': (v) => `The name "${text(v, 'name')}" is used twice. Give each a different name.`,
  'topic-effect-missing': (v) => `The effect of "${text(v, 'option')}" on "${text(v, 'outcome')}" is missing. Enter it.`,
  'topic-effect-unknown-option': (v) => `An effect names the option "${text(v, 'option')}", which the topic does not have.`,
  'topic-effect-on-comparison': (v) =>
    `The comparison "${text(v, 'option')}" cannot have an effect of its own; its risk is the baseline.`,
  'date-not-written': (v) =>
    `The ${text(v, 'what')} "${text(v, 'input')}" is not written as year-month-day. Write it YYYY-MM-DD, for example 2028-06-30, or leave it empty.`,
  'date-not-real': (v) =>
    `The ${text(v, 'what')} "${text(v, 'input')}" is not a day of the calendar. Check the month and the day, for example 2028-06-30.`,
  'file-not-json': (v) =>
    `This file is not a readable topic: it is not complete JSON (${text(v, 'detail')}). Open another file or restore a backup.`,
  'file-format-unknown': (v) => `This file is not a Chancewise topic (its format is "${text(v, 'format')}").`,
  'file-version-unsupported': (v) =>
    `This topic file was made by a newer Chancewise (file version ${text(v, 'version')}; this one reads up to version ${text(v, 'supported')}). Update Chancewise to open it; the file has not been changed.`,
  'file-field-invalid': (v) =>
    `This topic file is damaged at "${text(v, 'path')}": expected ${text(v, 'expected')}, found ${text(v, 'received')}.`,
  'topic-language-unsupported': (v) =>
    `${text(v, 'reason') === 'malformed' ? `This topic's "language" value "${text(v, 'language')}" is not a language tag` : `Chancewise cannot write patient wording in "${text(v, 'language')}"`}. Set "language" in the topic to "en" for English or to a Spanish tag ("es", "es-ES", "es-419", "es-MX"), or remove it for English; the file has not been changed.`,
  'cli-usage': (v) => text(v, 'detail'),
};
