/**
 * English wording of the people charts: titles, group labels and the range
 * sentence. Drawing code never holds prose; a second language is a sibling
 * module with the same shape ({@link ChartMessages}).
 */
import { formatCount, formatPercent } from '../../core/messages/format-number.ts';
import { plural, startsWithVerb } from '../../core/messages/en/english-grammar.ts';
import { duration } from '../../core/messages/en/wording.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type {
  ChartMessages,
  LabelValues,
  NarrowRangeValues,
  RangeValues,
  TitleValues,
  ArmRole,
  BelowOneValues,
} from './chart-messages.ts';

/** "have a stroke", but "end up dying of bowel cancer" for outcomes named with a verb in -ing. */
const have = (outcome: string, count: number | null = null): string => {
  if (startsWithVerb(outcome)) return count === null ? 'end up' : plural(count, 'ends up', 'end up');
  return count === null ? 'have' : plural(count, 'has', 'have');
};
const get = (outcome: string, count: number): string =>
  startsWithVerb(outcome) ? plural(count, 'ends up', 'end up') : plural(count, 'gets', 'get');

/** A name as it reads inside a sentence: "Option A" → "option A"; acronyms such as "ACE inhibitor" kept. */
function inSentence(name: string): string {
  const trimmed = name.trim();
  const [first, second] = [trimmed.charAt(0), trimmed.charAt(1)];
  const acronym = second !== '' && second === second.toUpperCase() && second !== second.toLowerCase();
  return acronym ? trimmed : first.toLowerCase() + trimmed.slice(1);
}

/**
 * A period in words, in the unit it was given in: 10 years → "10 years", 3 days → "3 days".
 * Without a unit, whole months under a year read as months: 0.5 → "6 months".
 */
function period(years: number, unit: TimeUnit | undefined): string {
  const months = years * 12;
  if (unit === undefined && years < 1 && Math.abs(months - Math.round(months)) < 1e-9) {
    return duration({ years, unit: 'months' });
  }
  return duration({ years, unit: unit ?? 'years' });
}

/** ", over 10 years", or nothing without a period. */
const over = ({ periodYears, periodUnit }: TitleValues): string =>
  periodYears === null ? '' : `, over ${period(periodYears, periodUnit)}`;

/** One array's title: "With option A: 100 people over 10 years". */
const groupTitle = (values: TitleValues): string =>
  `With ${inSentence(values.option)}: ${values.denominator} people${values.periodYears === null ? '' : ` over ${period(values.periodYears, values.periodUnit)}`}`;

const event = ({ count, outcome, role }: LabelValues): string =>
  `${count} ${have(outcome, count)} ${outcome}${role === 'option' ? ' anyway' : ''}`;
const free = ({ count, outcome }: LabelValues): string =>
  `${count} ${plural(count, 'does', 'do')} not ${have(outcome)} ${outcome}`;

/** English chart wording. */
export const chartMessagesEn: ChartMessages = {
  /** Heading of one outcome's chart: "Chance of a stroke over 10 years". */
  heading: (outcome: string, periodYears: number | null, periodUnit?: TimeUnit) =>
    periodYears === null ? `Chance of ${outcome}` : `Chance of ${outcome} over ${period(periodYears, periodUnit)}`,
  /** Shown under the heading of an invented demonstration topic. */
  illustrative: 'Illustrative example: invented numbers, not from a real study.',
  /** "With option A: 100 people over 10 years" (the option first, then the group and the period). */
  optionTitle: (values: TitleValues) => groupTitle(values),
  /** "With no treatment: 100 people over 10 years". */
  comparisonTitle: (values: TitleValues) => groupTitle(values),
  /** Names of the two arms of a bare pair, with no topic. */
  pairComparisonName: 'Without the option',
  pairOptionName: 'With the option',
  /** Title of an arm of a bare pair: "Without the option: 100 people like you, over 10 years". */
  pairTitle: (values: TitleValues, role: ArmRole) =>
    `${role === 'comparison' ? 'Without' : 'With'} the option: ${values.denominator} people like you${over(values)}`,
  /** The option as the cause in a label: "because of option A". */
  causeName: (option: string, bare: boolean) => (bare ? 'the option' : inSentence(option)),
  /** Outcome name of a bare pair when none is given. */
  defaultOutcome: 'the outcome',
  labels: {
    event,
    prevented: ({ count, outcome, option }: LabelValues) =>
      `${count} ${plural(count, 'avoids', 'avoid')} ${outcome} because of ${option}`,
    caused: ({ count, outcome, option }: LabelValues) => `${count} ${get(outcome, count)} ${outcome} because of ${option}`,
    free,
  },
  wantedLabels: {
    event,
    /** "3 miss out on a response because of option B". */
    prevented: ({ count, outcome, option }: LabelValues) =>
      startsWithVerb(outcome)
        ? `${count} ${plural(count, 'does', 'do')} not end up ${outcome} because of ${option}`
        : `${count} ${plural(count, 'misses', 'miss')} out on ${outcome} because of ${option}`,
    /** "20 have a response because of option A": only with the option. */
    caused: ({ count, outcome, option }: LabelValues) => `${count} ${have(outcome, count)} ${outcome} because of ${option}`,
    free,
  },
  /** When an option changes nothing: the exact difference is 0. */
  noDifference: (outcome: string, option: string) => `The same number ${have(outcome)} ${outcome} with and without ${option}.`,
  /** "Fewer than 1 in 1000: about 2 in 10,000 fewer have a stroke with option A, too few to show as a whole person here." */
  belowOnePerson: ({ outcome, option, denominator, direction, count, wordsDenominator }: BelowOneValues) =>
    wordsDenominator === null || count === 0
      ? `Fewer than 1 in ${formatCount(denominator)}, and fewer than 1 in a million: slightly ${direction} people ${have(outcome)} ${outcome} with ${option}, too few to show as a whole person here.`
      : `Fewer than 1 in ${formatCount(denominator)}: about ${formatCount(count)} in ${formatCount(wordsDenominator)} ${direction} ${have(outcome)} ${outcome} with ${option}, too few to show as a whole person here.`,
  /** The option's interval as people: "With option A, anywhere between 13 and 18 of these 100 could have a stroke (range: 95% interval)." */
  range: ({ lower, upper, denominator, outcome, option, level }: RangeValues) =>
    `With ${option}, anywhere between ${lower} and ${upper} of these ${formatCount(denominator)} could ${have(outcome)} ${outcome}${level === null ? '' : ` (range: ${formatPercent(level)} interval)`}.`,
  /** Ends that show as the same count: "the range (95% interval) is less than one person of these 1000: …". */
  narrowRange: ({ lower, denominator, outcome, option, level, words }: NarrowRangeValues) => {
    const range = level === null ? 'the range' : `the range (${formatPercent(level)} interval)`;
    return words === null
      ? `With ${option}, ${range} is less than one person wide: at either end, about ${lower} of these ${formatCount(denominator)} could ${have(outcome)} ${outcome}.`
      : `With ${option}, ${range} is less than one person of these ${formatCount(denominator)}: anywhere between ${formatCount(words.lower)} and ${formatCount(words.upper)} in ${formatCount(words.denominator)} could ${have(outcome)} ${outcome}.`;
  },
  /** Legend line for the outlined people drawn when the range is shown. */
  rangeOutline: (outcome: string, option: string) =>
    `Dashed ring: people who may or may not ${have(outcome)} ${outcome} with ${option}, depending on where in that range the truth lies.`,
  /** One array in a sentence: title, then the labels joined. */
  summary: (title: string, labels: readonly string[]) => `${title}: ${joinList(labels)}.`,
};

/** "a, b and c". */
function joinList(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
