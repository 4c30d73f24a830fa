/**
 * English wording of results: every sentence a patient or clinician reads about
 * the numbers. The code that computes passes named values and cases; only this
 * file knows English words, plurals and capitals.
 */
import type { Amount, FrequencyBand, RangeCase, WordingMessages } from '../../wording/wording-catalogue.ts';
import { formatDecimal } from '../format-number.ts';

/** English plural rule: the `one` form for exactly 1, the `other` form otherwise. */
export function plural(count: number, one: string, other: string): string {
  return count === 1 ? one : other;
}

/** A sentence starts with a capital; names typed with a capital are left as they are. */
const capitalise = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * Outcome names are usually noun phrases ("a stroke": "will have a stroke"). A few
 * start with a verb in -ing ("dying of bowel cancer"); those read "will end up dying".
 */
const VERBS_IN_ING = new Set([
  'becoming', 'being', 'breaking', 'catching', 'developing', 'dying', 'falling', 'feeling', 'getting',
  'going', 'having', 'leaving', 'living', 'losing', 'needing', 'returning', 'spending', 'staying',
  'starting', 'stopping', 'taking', 'using',
]);
/** True when an outcome name starts with a verb in -ing ("dying of bowel cancer"). */
export const startsWithVerb = (outcome: string): boolean =>
  VERBS_IN_ING.has((outcome.trim().split(/\s+/)[0] ?? '').toLowerCase());
/** "have" / "get" before a noun phrase, "end up" before a verb in -ing. */
const haveVerb = (outcome: string): string => (startsWithVerb(outcome) ? 'end up' : 'have');
const getVerb = (outcome: string, count: number): string =>
  startsWithVerb(outcome) ? plural(count, 'ends up', 'end up') : plural(count, 'gets', 'get');

const period = (years: number): string =>
  years === 1 ? 'the next year' : `the next ${formatDecimal(years, 2)} years`;

const duration = (years: number): string => `${formatDecimal(years, 2)} ${plural(years, 'year', 'years')}`;

/** An amount as it leads an "in 100" phrase: "about 15 in 100", "fewer than 1 in 1000". */
const amountPhrase = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return `none of ${denominator}`;
    case 'fewer-than-one':
      return `fewer than 1 in ${denominator}`;
    case 'about':
      return `about ${amount.count} in ${denominator}`;
    case 'nearly-all':
      return `nearly all ${denominator}`;
    case 'all':
      return `all ${denominator}`;
  }
};

const freeFrame = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return 'None of them will stay free of it.';
    case 'fewer-than-one':
      return `Fewer than 1 in ${denominator} will not.`;
    case 'about':
      return `About ${amount.count} will not.`;
    case 'nearly-all':
      return `Nearly all ${denominator} will not.`;
    case 'all':
      return `All ${denominator} will stay free of it.`;
  }
};

const bandNames: Record<FrequencyBand, string> = {
  'very-common': 'very common',
  common: 'common',
  uncommon: 'uncommon',
  rare: 'rare',
  'very-rare': 'very rare',
  'not-known': 'not known',
};

const range = (found: RangeCase, option: string, outcome: string, denominator: number): string => {
  switch (found.variant) {
    case 'avoid':
      return `With ${option}, the number who avoid ${outcome} could be anywhere between ${found.low} and ${found.high} in ${denominator}.`;
    case 'get':
      return `With ${option}, the number who ${getVerb(outcome, 2)} ${outcome} because of it could be anywhere between ${found.low} and ${found.high} in ${denominator}.`;
    case 'narrow':
      return found.direction === 'fewer'
        ? `With ${option}, the research puts the number who avoid ${outcome} at about ${found.count} in ${denominator}, with little uncertainty.`
        : `With ${option}, the research puts the number who ${getVerb(outcome, 2)} ${outcome} because of it at about ${found.count} in ${denominator}, with little uncertainty.`;
    case 'either':
      return `With ${option}, anything from ${found.fewer} fewer to ${found.more} more people in ${denominator} could ${haveVerb(outcome)} ${outcome}.`;
    case 'no-change':
      return `With ${option}, the research points to little or no change in how many people ${haveVerb(outcome)} ${outcome}.`;
  }
};

/** Santesso et al. (2020) GRADE informative statements, the "moderate effect" and "trivial" columns. */
const hedges = {
  high: { reduce: 'reduces', increase: 'increases', trivial: 'results in little or no difference to' },
  moderate: {
    reduce: 'probably reduces',
    increase: 'probably increases',
    trivial: 'probably results in little or no difference to',
  },
  low: { reduce: 'may reduce', increase: 'may increase', trivial: 'may result in little or no difference to' },
} as const;

/** The English wording catalogue. */
export const wordingMessages: WordingMessages = {
  group: (count) => plural(count, 'person like you', 'people like you'),
  population: ({ population, group }) => {
    const trimmed = population.trim();
    return `In these numbers, "${group}" means ${trimmed}${/[.!?]$/.test(trimmed) ? '' : '.'}`;
  },
  eventFrame: ({ option, outcome, amount, denominator, group, years }) =>
    `${capitalise(option)}: ${amountPhrase(amount, denominator)} ${group} will ${haveVerb(outcome)} ${outcome} in ${period(years)}.`,
  freeFrame: ({ amount, denominator }) => freeFrame(amount, denominator),
  change: ({ option, outcome, direction, count, either, denominator }) => {
    switch (direction) {
      case 'fewer':
        return `With ${option}, about ${count} of those ${denominator} people ${plural(count, 'avoids', 'avoid')} ${outcome}.`;
      case 'more':
        return `About ${count} in ${denominator} ${getVerb(outcome, count)} ${outcome} because of ${option}.`;
      case 'same':
        return `${capitalise(option)} makes little or no difference to how many people ${haveVerb(outcome)} ${outcome}: ${amountPhrase(either, denominator)} either way.`;
    }
  },
  range: ({ option, outcome, range: found, denominator }) => range(found, option, outcome, denominator),
  rangeUnknown: ({ option }) => `The research does not tell us how precise the numbers for ${option} are.`,
  certainty: ({ option, outcome, certainty, importance, direction }) => {
    if (certainty === 'very-low') {
      return `The evidence is very uncertain about the effect of ${option} on the chance of ${outcome}.`;
    }
    const verb = hedges[certainty][importance === 'trivial' ? 'trivial' : direction];
    return `${capitalise(option)} ${verb} the chance of ${outcome}.`;
  },
  band: ({ option, outcome, band, amount, denominator }) =>
    band === 'not-known'
      ? `With ${option}, how often ${outcome} happens is not known.`
      : `With ${option}, ${outcome} is ${bandNames[band]}: ${amountPhrase(amount, denominator)} people.`,
  nnt: ({ option, outcome, label, count, group, years }) =>
    `${label} ${count}: treating ${count} ${group} with ${option} for ${duration(years)} ${label === 'NNTB' ? 'prevents' : 'causes'} ${outcome} in one of them.`,
  nntNone: ({ option, outcome }) =>
    `There is no number needed to treat: on these numbers, ${option} makes no difference to the chance of ${outcome}.`,
  relative: ({ option, outcome, from, to, denominator, direction, percent }) =>
    `With ${option}, the chance of ${outcome} goes from ${from} in ${denominator} to ${to} in ${denominator}: a relative ${direction} of ${percent}%.`,
};
