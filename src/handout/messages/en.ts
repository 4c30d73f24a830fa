/**
 * English wording of the printed handout: headings, captions, the standard
 * caution, the footer and the refusal sentence. Layout code never holds prose; a
 * second language is a sibling module with the same shape ({@link HandoutMessages}).
 */
import { formatCount, formatPercent } from '../../core/messages/format-number.ts';
import { capitalise } from '../../core/messages/en/english-grammar.ts';
import { duration } from '../../core/messages/en/wording.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import type { Certainty } from '../../core/topic/topic.ts';
import type { PersonGroup } from '../../core/types.ts';
import type { Amount, ChangeDirection, FrequencyBand } from '../../core/wording/wording-catalogue.ts';

/** The parts of a handout the clinician can shorten when it does not fit. */
export type HandoutPart = 'header' | 'options' | 'outcomes' | 'screening' | 'evidence' | 'questions';

/** Values shared by sentences about the whole sheet. */
export interface SheetValues {
  /** The pictures' denominator (100 or 1000). */
  readonly denominator: number;
  /** The words' and table's denominator: the pictures', or 10,000 up to a million for a rare outcome. */
  readonly wordsDenominator: number;
  readonly years: number;
  /** The unit the topic's period was given in. */
  readonly unit: TimeUnit;
}

/** What the values prompt is built from: the headline benefit and the main side effects' names. */
export interface PromptValues {
  readonly benefit: string;
  /** The benefit is an event people want ("a pain-free throat"). */
  readonly wanted: boolean;
  /** The main side effects, most added people first; empty when the topic has none. */
  readonly harms: readonly string[];
}

/** The change an option makes in a table cell, as people of the row's denominator. */
export interface CellChange {
  readonly direction: ChangeDirection;
  readonly count: number;
  /** When the counts show no change: the direction of a difference smaller than one person, or null when it is exactly 0. */
  readonly hidden: 'fewer' | 'more' | null;
}

/** Whether the other benefit rows are events the options aim to make less likely, more likely, or both. */
export type BenefitAim = 'lower' | 'raise' | 'both';

/** The shape every language's handout wording provides. */
export interface HandoutMessages {
  /** BCP 47 tag written into the PDF, for screen readers. */
  readonly language: string;
  readonly documentSubject: string;
  readonly paperName: Readonly<Record<'a4' | 'letter', string>>;
  readonly illustrativeBadge: string;
  readonly numbersFor: (values: SheetValues) => string;
  readonly keyIntro: (values: SheetValues) => string;
  /** What each group of figures means for an event to avoid, in words that suit any outcome. */
  readonly keyGroups: Readonly<Record<PersonGroup, string>>;
  /** The same for an event people want: never "avoid" or "risk". */
  readonly wantedKeyGroups: Readonly<Record<PersonGroup, string>>;
  readonly sentencesHeading: string;
  readonly tableBenefitRows: (aim: BenefitAim) => string;
  readonly tableHarmRows: string;
  /** A benefit's cell: people out of the denominator. */
  readonly tableCell: (amount: Amount, denominator: number) => string;
  /** A side effect's cell: its frequency band with the number beside the word. */
  readonly bandCell: (band: FrequencyBand, amount: Amount, denominator: number) => string;
  /** Under an option's number in the table: the change it makes ("40 more"). */
  readonly tableChange: (change: CellChange) => string;
  readonly certaintyShort: Readonly<Record<Certainty, string>>;
  /** Over a side effect's pictures: the chart's heading said to be about a side effect. */
  readonly sideEffectHeading: (heading: string) => string;
  /** Before an outcome's sentences: its name, and whether it is a side effect. */
  readonly outcomeLabel: (outcome: string, kind: 'benefit' | 'harm') => string;
  /** After the sentences with ranges: the level of the interval they are, for one range or `count` of them. */
  readonly rangeLevel: (level: number, count: number) => string;
  /** Under the enlarged block of 100 of a picture of 1000. */
  readonly closeUpLabel: string;
  readonly noSideEffects: string;
  /** Under the table when a rare side effect's row counts out of more people, so its band word and number agree. */
  readonly rareRowsNote: string;
  readonly evidenceHeading: string;
  readonly evidenceSummary: (summary: string) => string;
  readonly evidenceReviewed: (reviewed: string) => string;
  readonly baselineSource: (outcome: string, source: string) => string;
  /** The starting chance was given over another period and worked out for the sheet's: "…over 10 years, worked out for 15 years…". */
  readonly baselineConverted: (outcome: string, from: string, to: string) => string;
  /** An effect applied beyond its trials' follow-up: "The research on screening lasted 12 years; …". */
  readonly beyondFollowUp: (option: string, followUp: string, period: string) => string;
  readonly mattersHeading: string;
  /** The values prompt, built from the topic's benefit and main side effects. */
  readonly mattersPrompt: (values: PromptValues) => string;
  readonly questionsHeading: string;
  readonly defaultQuestions: readonly string[];
  readonly cautionHeading: string;
  readonly caution: (values: SheetValues) => string;
  readonly preparedBy: (name: string) => string;
  readonly preparedByBlank: string;
  readonly printed: (date: string) => string;
  readonly appVersion: (version: string) => string;
  readonly pageOfPages: string;
  /** Between the parts of a footer line. */
  readonly footerSeparator: string;
  /** A date written YYYY-MM-DD in words; any other text is returned as typed. */
  readonly formatDate: (text: string) => string;
  /** The one line telling the clinician what to shorten. */
  readonly doesNotFit: (part: HandoutPart, overMillimetres: number) => string;
  /** A capital first letter, for option names used as column headings. */
  readonly capitalise: (text: string) => string;
  /** The "About this sheet" line and the sources of the effects. */
  readonly about: AboutSheetMessages;
  /** The screening section ("If you have the test:"). */
  readonly screening: ScreeningMessages;
}

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

const shortenWhat: Readonly<Record<HandoutPart, string>> = {
  header: 'the decision or the description of who the numbers are for',
  options: 'the option names, or compare fewer options',
  outcomes: 'the outcome names, or show fewer outcomes',
  evidence: 'the evidence summary, the sources, or the entries about who prepared the topic',
  screening: 'what a positive result leads to',
  questions: 'the questions, or give fewer of them',
};

/** The disclosures of a topic as the "About this sheet" line takes them: null when not given. */
export interface AboutSheetValues {
  readonly preparedBy: string | null;
  readonly funding: string | null;
  readonly interests: string | null;
  /** The review-by date, already in words. */
  readonly reviewBy: string | null;
}

/** One source of effects and what it is the source of (options or outcomes); none listed: all of them. */
export interface EffectSourceGroup {
  /** Empty when no source was given. */
  readonly source: string;
  readonly of: readonly string[];
}

/** Words of the sheet's disclosures. */
export interface AboutSheetMessages {
  readonly line: (values: AboutSheetValues) => string;
  /** The sources of the effects in one sentence; null when the topic has no effects. */
  readonly effectSources: (groups: readonly EffectSourceGroup[]) => string | null;
}

/** Words of the screening section. */
export interface ScreeningMessages {
  readonly heading: string;
  readonly positive: (leadsTo: string) => string;
  readonly missedCase: (amount: Amount, denominator: number) => string;
  readonly overdiagnosis: (amount: Amount, denominator: number) => string;
}

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
  doesNotFit: (part, overMillimetres) =>
    `The handout does not fit on one page (about ${Math.max(1, Math.ceil(overMillimetres))} mm too long): shorten ${shortenWhat[part]}.`,
  capitalise,
  about: aboutSheetMessagesEn,
  screening: screeningMessagesEn,
};
