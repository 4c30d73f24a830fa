/**
 * English wording of results: every sentence a patient or clinician reads about
 * the numbers. The code that computes passes named values and cases; only this
 * file knows English words, plurals and capitals.
 */
import { writeNntInterval } from '../../nnt-interval.ts';
import { amountIn } from '../../time-unit.ts';
import type { NntInterval } from '../../nnt-interval.ts';
import type { Amount, FrequencyBand, PeriodValues, RangeCase, WordingMessages } from '../../wording/wording-catalogue.ts';
import { UNIT_NAMES_EN, amountWithUnit } from './time-words.ts';
import { formatCount, formatDecimal } from '../format-number.ts';
import { capitalise, plural, startsWithVerb } from './english-grammar.ts';
import { numberMessages } from './numbers.ts';

export { plural, startsWithVerb } from './english-grammar.ts';

/** "have" / "get" before a noun phrase, "end up" before a verb in -ing. */
const haveVerb = (outcome: string): string => (startsWithVerb(outcome) ? 'end up' : 'have');
const getVerb = (outcome: string, count: number): string =>
  startsWithVerb(outcome) ? plural(count, 'ends up', 'end up') : plural(count, 'gets', 'get');

/** A period as the clinician gave it, with its preposition: "in the next 10 years", "by day 3". */
const within = ({ years, unit }: PeriodValues): string => {
  const amount = amountIn(years, unit);
  const shown = formatDecimal(amount, 2);
  if (unit === 'days') return amount === 1 ? 'within a day' : `by day ${shown}`;
  const [one, other] = UNIT_NAMES_EN[unit];
  return amount === 1 ? `in the next ${one}` : `in the next ${shown} ${other}`;
};

/** The period after an outcome's name, unless the name already says it ("pain gone by day 3"). */
const periodAfter = (outcome: string, period: PeriodValues): string => {
  const phrase = within(period);
  return outcome.toLowerCase().includes(phrase.toLowerCase()) ? '' : ` ${phrase}`;
};

/** A length of time: "10 years", "3 days". */
export const duration = ({ years, unit }: PeriodValues): string => amountWithUnit(amountIn(years, unit), unit);

/** An amount as it leads an "in 100" phrase: "about 15 in 100", "fewer than 1 in 1000". */
const amountPhrase = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return `none of ${formatCount(denominator)}`;
    case 'fewer-than-one':
      return denominator === 1000000 ? 'fewer than 1 in a million' : `fewer than 1 in ${formatCount(denominator)}`;
    case 'about':
      return `about ${formatCount(amount.count)} in ${formatCount(denominator)}`;
    case 'nearly-all':
      return `nearly all ${formatCount(denominator)}`;
    case 'all':
      return `all ${formatCount(denominator)}`;
  }
};

const freeFrame = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return 'None of them will stay free of it.';
    case 'fewer-than-one':
      return `Fewer than 1 in ${formatCount(denominator)} will not.`;
    case 'about':
      return `About ${formatCount(amount.count)} will not.`;
    case 'nearly-all':
      return `Nearly all ${formatCount(denominator)} will not.`;
    case 'all':
      return `All ${formatCount(denominator)} will stay free of it.`;
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

/**
 * The range of a wanted event: `avoid` means fewer people have it (they miss out because of
 * the option), `get` means more people have it (they gain it).
 */
const wantedRange = (found: RangeCase, option: string, outcome: string, denominator: number): string => {
  switch (found.variant) {
    case 'avoid':
      return `With ${option}, the number who miss out on ${outcome} because of it could be anywhere between ${formatCount(found.low)} and ${formatCount(found.high)} in ${formatCount(denominator)}.`;
    case 'get':
      return `With ${option}, the number of extra people who ${haveVerb(outcome)} ${outcome} could be anywhere between ${formatCount(found.low)} and ${formatCount(found.high)} in ${formatCount(denominator)}.`;
    case 'narrow':
      return found.direction === 'fewer'
        ? `With ${option}, the research puts the number who miss out on ${outcome} at about ${formatCount(found.count)} in ${formatCount(denominator)}, with little uncertainty.`
        : `With ${option}, the research puts the number of extra people who ${haveVerb(outcome)} ${outcome} at about ${formatCount(found.count)} in ${formatCount(denominator)}, with little uncertainty.`;
    case 'either':
    case 'no-change':
    case 'below-one':
      return range(found, option, outcome, denominator);
  }
};

const range = (found: RangeCase, option: string, outcome: string, denominator: number): string => {
  switch (found.variant) {
    case 'avoid':
      return `With ${option}, the number who avoid ${outcome} could be anywhere between ${formatCount(found.low)} and ${formatCount(found.high)} in ${formatCount(denominator)}.`;
    case 'get':
      return `With ${option}, the number who ${getVerb(outcome, 2)} ${outcome} because of it could be anywhere between ${formatCount(found.low)} and ${formatCount(found.high)} in ${formatCount(denominator)}.`;
    case 'narrow':
      return found.direction === 'fewer'
        ? `With ${option}, the research puts the number who avoid ${outcome} at about ${formatCount(found.count)} in ${formatCount(denominator)}, with little uncertainty.`
        : `With ${option}, the research puts the number who ${getVerb(outcome, 2)} ${outcome} because of it at about ${formatCount(found.count)} in ${formatCount(denominator)}, with little uncertainty.`;
    case 'either':
      return `With ${option}, anything from ${formatCount(found.fewer)} fewer to ${formatCount(found.more)} more people in ${formatCount(denominator)} could ${haveVerb(outcome)} ${outcome}.`;
    case 'no-change':
      return `With ${option}, the research points to little or no change in how many people ${haveVerb(outcome)} ${outcome}.`;
    case 'below-one':
      return `With ${option}, the research puts the whole range of the change at fewer than 1 in ${denominator === 1000000 ? 'a million' : formatCount(denominator)} people.`;
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

/** "a million" or the denominator as a number, after "1 in". */
const sizeOf = (denominator: number): string => (denominator === 1000000 ? 'a million' : formatCount(denominator));

/** The short form's change, the outcome said as "it": "about 16 in 100 avoid it because of the option". */
const shortChange = (
  outcome: string,
  wanted: boolean,
  direction: 'fewer' | 'more' | 'same',
  count: number,
  either: Amount,
  hidden: 'fewer' | 'more' | null,
  denominator: number,
): string => {
  const people = `about ${formatCount(count)}`;
  const size = formatCount(denominator);
  if (direction === 'same') {
    return hidden === null
      ? `little or no difference, ${amountPhrase(either, denominator)} have it either way`
      : `slightly ${hidden} have it, but the difference is smaller than 1 in ${sizeOf(denominator)}: ${amountPhrase(either, denominator)} either way`;
  }
  if (direction === 'fewer' && !wanted)
    return `${people} in ${size} ${plural(count, 'avoids', 'avoid')} it because of the option`;
  // A name that starts with a verb ("dying of bowel cancer") does not follow "have".
  if (startsWithVerb(outcome)) return `it happens to ${people} ${direction} in ${size} because of the option`;
  return `${people} ${direction} in ${size} ${plural(count, 'has', 'have')} it because of the option`;
};

/** The short form's range, in brackets after the change; the direction is said when it is not the change's own. */
const shortRange = (found: RangeCase | null, direction: 'fewer' | 'more' | 'same', denominator: number): string => {
  if (found === null) return 'the research does not tell us how precise this is';
  const size = formatCount(denominator);
  switch (found.variant) {
    case 'avoid':
      return `somewhere between ${formatCount(found.low)} and ${formatCount(found.high)}${direction === 'fewer' ? '' : ' fewer'} in ${size}`;
    case 'get':
      return `somewhere between ${formatCount(found.low)} and ${formatCount(found.high)}${direction === 'more' ? '' : ' more'} in ${size}`;
    case 'narrow':
      return 'with little uncertainty';
    case 'either':
      return `anywhere from ${formatCount(found.fewer)} fewer to ${formatCount(found.more)} more in ${size}`;
    case 'no-change':
      return 'the whole range is little or no change';
    case 'below-one':
      return `the whole range is smaller than 1 in ${sizeOf(denominator)}`;
  }
};

/** "NNTB 25" or "NNTB 25 (NNTB 13 to 100)". */
const nntHead = (label: string, count: number, interval: NntInterval | null): string =>
  interval === null ? `${label} ${count}` : `${label} ${count} (${writeNntInterval(interval, numberMessages)})`;

/** The English wording catalogue. */
export const wordingMessages: WordingMessages = {
  newComparison: 'no treatment',
  group: (count) => plural(count, 'person like you', 'people like you'),
  population: ({ population, group }) => {
    const trimmed = population.trim();
    return `In these numbers, "${group}" means ${trimmed}${/[.!?]$/.test(trimmed) ? '' : '.'}`;
  },
  eventFrame: ({ option, outcome, amount, denominator, group, years, unit }) =>
    `${capitalise(option)}: ${amountPhrase(amount, denominator)} ${group} will ${haveVerb(outcome)} ${outcome}${periodAfter(outcome, { years, unit })}.`,
  freeFrame: ({ amount, denominator }) => freeFrame(amount, denominator),
  change: ({ option, outcome, wanted, direction, count, either, denominator, hidden }) => {
    if (direction === 'same' && hidden !== null) {
      const size = denominator === 1000000 ? 'a million' : formatCount(denominator);
      return `With ${option}, slightly ${hidden} people ${haveVerb(outcome)} ${outcome}, but the difference is smaller than 1 in ${size} people: ${amountPhrase(either, denominator)} either way.`;
    }
    if (wanted && direction !== 'same') {
      return `With ${option}, about ${formatCount(count)} ${direction === 'more' ? 'more' : 'fewer'} of those ${formatCount(denominator)} people ${haveVerb(outcome)} ${outcome}.`;
    }
    switch (direction) {
      case 'fewer':
        return `With ${option}, about ${formatCount(count)} of those ${formatCount(denominator)} people ${plural(count, 'avoids', 'avoid')} ${outcome}.`;
      case 'more':
        return `About ${formatCount(count)} in ${formatCount(denominator)} ${getVerb(outcome, count)} ${outcome} because of ${option}.`;
      case 'same':
        return `${capitalise(option)} makes little or no difference to how many people ${haveVerb(outcome)} ${outcome}: ${amountPhrase(either, denominator)} either way.`;
    }
  },
  range: ({ option, outcome, wanted, range: found, denominator }) =>
    (wanted ? wantedRange : range)(found, option, outcome, denominator),
  rangeUnknown: ({ option }) => `The research does not tell us how precise the numbers for ${option} are.`,
  certainty: ({ option, outcome, certainty, importance, direction }) => {
    if (certainty === 'very-low') {
      return `The evidence is very uncertain about the effect of ${option} on the chance of ${outcome}.`;
    }
    const verb = hedges[certainty][importance === 'trivial' ? 'trivial' : direction];
    return `${capitalise(option)} ${verb} the chance of ${outcome}.`;
  },
  shortEffect: ({ option, outcome, wanted, direction, count, either, hidden, denominator, range: found }) =>
    `${capitalise(option)}: ${shortChange(outcome, wanted, direction, count, either, hidden, denominator)} (${shortRange(found, direction, denominator)}).`,
  shortCertainty: ({ certainty, importance, direction }) =>
    certainty === 'very-low'
      ? 'The evidence is very uncertain about its effect.'
      : `It ${hedges[certainty][importance === 'trivial' ? 'trivial' : direction]} the chance.`,
  shortNnt: ({ wanted, label, count, group, years, unit, interval, crossesNoEffect }) => {
    const head = nntHead(label, count, interval);
    const treating = `${head}: treating ${count} ${group} for ${duration({ years, unit })}`;
    const range = crossesNoEffect ? ' Its range includes no difference at all.' : '';
    if (wanted) return `${treating} means one ${label === 'NNTB' ? 'more' : 'fewer'} of them has it.${range}`;
    return `${treating} ${label === 'NNTB' ? 'prevents' : 'causes'} it in one of them.${range}`;
  },
  band: ({ option, outcome, band, amount, denominator, comparison, comparisonAmount, direction, count }) => {
    if (band === 'not-known') return `With ${option}, how often ${outcome} happens is not known.`;
    const change = direction === 'same' ? 'the same number' : `${formatCount(count)} ${direction} in ${formatCount(denominator)}`;
    return `With ${option}, ${outcome} is ${bandNames[band]}: ${amountPhrase(amount, denominator)} people, against ${amountPhrase(comparisonAmount, denominator)} with ${comparison} (${change}).`;
  },
  /*
   * The NNT always carries its interval, in Altman's form (Altman DG 1998, "Confidence intervals for
   * the number needed to treat", BMJ 317:1309–1312): "NNTB 10 (NNTB 4 to ∞ to NNTH 20)" for an
   * absolute reduction of 10% with interval −5% to 25%, the example Newcombe RG restates in his
   * rapid response to the paper (BMJ, 5 January 1999). An interval that crosses no effect is
   * printed rather than dropped, as Altman argues against showing intervals only for significant
   * effects, and a plain clause says that the range includes no difference.
   */
  nnt: ({ option, outcome, wanted, label, count, group, years, unit, interval, crossesNoEffect }) => {
    const head = nntHead(label, count, interval);
    const treating = `${head}: treating ${count} ${group} with ${option} for ${duration({ years, unit })}`;
    const range = crossesNoEffect ? ' Its range includes no difference at all.' : '';
    if (wanted) {
      return `${treating} means one ${label === 'NNTB' ? 'more' : 'fewer'} of them has ${outcome}.${range}`;
    }
    return `${treating} ${label === 'NNTB' ? 'prevents' : 'causes'} ${outcome} in one of them.${range}`;
  },
  nntNone: ({ option, outcome }) =>
    `There is no number needed to treat: on these numbers, ${option} makes no difference to the chance of ${outcome}.`,
  relative: ({ option, outcome, wanted, from, to, denominator, direction, percent }) =>
    wanted
      ? `With ${option}, the number who ${haveVerb(outcome)} ${outcome} goes from ${formatCount(from)} in ${formatCount(denominator)} to ${formatCount(to)} in ${formatCount(denominator)}: ${percent}% ${direction === 'increase' ? 'more' : 'fewer'} people.`
      : `With ${option}, the chance of ${outcome} goes from ${formatCount(from)} in ${formatCount(denominator)} to ${formatCount(to)} in ${formatCount(denominator)}: a relative ${direction} of ${percent}%.`,
};
