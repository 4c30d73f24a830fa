/**
 * English wording of the printed handout: headings, captions, the standard
 * caution, the footer and the refusal sentence. Layout code never holds prose; a
 * second language is a sibling module with the same shape ({@link HandoutMessages}).
 */
import { formatCount, formatPercent } from '../../core/messages/format-number.ts';
import { capitalise } from '../../core/messages/en/english-grammar.ts';
import { duration } from '../../core/messages/en/wording.ts';
import type { Amount, FrequencyBand } from '../../core/wording/wording-catalogue.ts';
import type { AboutSheetMessages, HandoutMessages, ScreeningMessages, SheetValues } from './handout-messages.ts';

const MONTHS = [
  'January',
  'February',
  'March',
  'April',
  'May',
  'June',
  'July',
  'August',
  'September',
  'October',
  'November',
  'December',
];

/** "the next 10 years", "the next 3 days", "the next year". */
const period = ({ years, unit }: SheetValues): string => {
  const length = duration({ years, unit });
  return `the next ${length.startsWith('1 ') ? length.slice(2) : length}`;
};

/** What to shorten, as it ends the refusal sentence. */
const bandWords: Readonly<Record<FrequencyBand, string>> = {
  'very-common': 'very common',
  common: 'common',
  uncommon: 'uncommon',
  rare: 'rare',
  'very-rare': 'very rare',
  'not-known': 'not known',
};

const amountCell = (amount: Amount, denominator: number): string => {
  switch (amount.kind) {
    case 'none':
      return `0 in ${formatCount(denominator)}`;
    case 'fewer-than-one':
      return denominator === 1000000 ? 'fewer than 1 in a million' : `fewer than 1 in ${formatCount(denominator)}`;
    case 'about':
      return `${formatCount(amount.count)} in ${formatCount(denominator)}`;
    case 'nearly-all':
      return `nearly all ${formatCount(denominator)}`;
    case 'all':
      return `all ${formatCount(denominator)}`;
  }
};

const NOT_STATED = 'not stated';

/** Text as typed, ending without its full stop (the sentence adds its own). */
const unstopped = (text: string): string => text.trim().replace(/[.!?]+$/, '');

const aboutSheetMessagesEn: AboutSheetMessages = {
  line: ({ preparedBy, funding, interests, reviewBy }) =>
    [
      'About this sheet.',
      `Written by: ${unstopped(preparedBy ?? NOT_STATED)}.`,
      `Funding: ${unstopped(funding ?? NOT_STATED)}.`,
      `Interests: ${unstopped(interests ?? NOT_STATED)}.`,
      `Review by: ${reviewBy ?? NOT_STATED}.`,
    ].join(' '),
  effectSources: (groups) => {
    if (groups.length === 0) return null;
    const parts = groups.map(({ source, of }) => {
      const named = source === '' ? NOT_STATED : source;
      return of.length === 0 ? named : `${named} (${of.join('; ')})`;
    });
    return `The effects come from: ${parts.join('; ')}.`;
  },
};

/** "About 3 in 1,000 people", "Fewer than 1 in 1,000 people": the start of a screening sentence. */
const peopleStart = (amount: Amount, denominator: number): string => {
  const of = formatCount(denominator);
  switch (amount.kind) {
    case 'none':
      return `None of ${of} people`;
    case 'fewer-than-one':
      return `Fewer than 1 in ${of} people`;
    case 'about':
      return `About ${formatCount(amount.count)} in ${of} people`;
    case 'nearly-all':
      return `Nearly all of ${of} people`;
    case 'all':
      return `All of ${of} people`;
  }
};

const screeningMessagesEn: ScreeningMessages = {
  heading: 'If you have the test:',
  positive: (leadsTo) => `a positive result leads to ${unstopped(leadsTo)}.`,
  missedCase: (amount, denominator) =>
    `${peopleStart(amount, denominator)} who have the test are told all is well, but they do have the illness. This is a missed case.`,
  overdiagnosis: (amount, denominator) =>
    `${peopleStart(amount, denominator)} who have the test are found to have an illness that would never have harmed them. This is overdiagnosis.`,
};

/** English handout wording. */
export const handoutMessagesEn: HandoutMessages = {
  language: 'en-GB',
  documentSubject: 'Benefits and harms of the options, for talking with your clinician',
  paperName: { a4: 'A4', letter: 'US Letter' },
  illustrativeBadge: 'Illustrative example: invented numbers',
  numbersFor: (values) => {
    return values.wordsDenominator === values.denominator
      ? `Every number on this sheet is out of ${formatCount(values.denominator)} people, over ${period(values)}.`
      : `The pictures show ${formatCount(values.denominator)} people; every other number is out of ${formatCount(values.wordsDenominator)}, over ${period(values)}.`;
  },
  keyIntro: ({ denominator }) => `Each picture shows ${denominator} people like you. Each figure is one person.`,
  keyGroups: {
    event: 'People it happens to',
    prevented: 'People who avoid it because of the option',
    caused: 'People it happens to because of the option',
    free: 'People it does not happen to',
  },
  wantedKeyGroups: {
    event: 'People who have it',
    prevented: 'People who miss out on it because of the option',
    caused: 'People who gain it because of the option',
    free: 'People who do not have it',
  },
  sentencesHeading: 'What the numbers mean',
  tableBenefitRows: (aim) =>
    aim === 'lower'
      ? 'What the options aim to lower'
      : aim === 'raise'
        ? 'What the options aim to make more likely'
        : 'What the options aim to change',
  tableHarmRows: 'Side effects: how common they are',
  tableCell: amountCell,
  bandCell: (band, amount, denominator) =>
    band === 'not-known' ? amountCell(amount, denominator) : `${bandWords[band]}: ${amountCell(amount, denominator)}`,
  tableChange: ({ direction, count, hidden }) => {
    if (direction !== 'same') return `${formatCount(count)} ${direction}`;
    return hidden === null ? 'no change' : `under 1 ${hidden}`;
  },
  certaintyShort: {
    high: 'high certainty',
    moderate: 'moderate certainty',
    low: 'low certainty',
    'very-low': 'very low certainty',
  },
  rangeLevel: (level, count) => `${count === 1 ? 'That range is' : 'Each range is'} a ${formatPercent(level)} interval.`,
  sideEffectHeading: (heading) => `Side effect: ${heading.charAt(0).toLowerCase()}${heading.slice(1)}`,
  outcomeLabel: (outcome, kind) => `${capitalise(outcome)}${kind === 'harm' ? ' (side effect)' : ''}.`,
  closeUpLabel: 'The outlined 100 people, enlarged',
  rareRowsNote: 'A rare side effect’s row counts out of more people, as it says, so that the word and the number agree.',
  noSideEffects: 'No side effects were entered for this sheet. Ask your clinician about them.',
  evidenceHeading: 'Where these numbers come from:',
  evidenceSummary: (summary) => {
    const trimmed = summary.trim();
    if (trimmed === '') return 'The source of the research was not given.';
    return /[.!?]$/.test(trimmed) ? trimmed : `${trimmed}.`;
  },
  evidenceReviewed: (reviewed) =>
    reviewed.trim() === ''
      ? 'The date the research was checked was not given.'
      : `The research was last checked on ${reviewed.trim()}.`,
  baselineSource: (outcome, source) => {
    const trimmed = source.trim().replace(/[.!?]+$/, '');
    return `Your starting chance of ${outcome} comes from: ${trimmed}.`;
  },
  baselineConverted: (outcome, from, to) =>
    `Your starting chance of ${outcome} was given for ${from}. It was worked out for ${to}, assuming it stays steady.`,
  beyondFollowUp: (option, followUp, period) =>
    `The research on ${option} lasted ${followUp}. The numbers for ${period} assume its effect carries on.`,
  mattersHeading: 'What matters most to you',
  mattersPrompt: ({ benefit, wanted, harms }) => {
    const aim = wanted ? `a better chance of ${benefit}` : `avoiding ${benefit}`;
    const against =
      harms.length === 0
        ? 'Weigh it against what each option asks of you.'
        : `Weigh it against the chance of ${harms.join(harms.length === 2 ? ' or ' : ', ')}.`;
    return `How much does ${aim} matter to you? ${against} Write it here to talk about.`;
  },
  questionsHeading: 'Questions you may want to ask',
  defaultQuestions: ['What happens if I wait and decide later?', 'Can I change my mind once I have started?'],
  cautionHeading: 'Please keep in mind:',
  caution: (values) =>
    `these numbers are estimates for groups of ${formatCount(values.wordsDenominator)} people like you over ${period(values)}, ` +
    'not a prediction for you. ' +
    'This sheet helps you talk with your own doctor, nurse or pharmacist, and does not replace their advice. ' +
    'Follow local guidance.',
  preparedBy: (name) => `Prepared by ${name.trim()}`,
  preparedByBlank: 'Prepared by: ______________________',
  printed: (date) => `Printed on ${date}`,
  appVersion: (version) => `Chancewise ${version}`,
  pageOfPages: 'Page 1 of 1',
  footerSeparator: '  ·  ',
  formatDate: (text) => {
    const found = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
    const month = found === null ? undefined : MONTHS[Number(found[2]) - 1];
    if (found === null || month === undefined) return text.trim();
    return `${Number(found[3])} ${month} ${found[1]}`;
  },
  duration,
  capitalise,
  about: aboutSheetMessagesEn,
  screening: screeningMessagesEn,
};
