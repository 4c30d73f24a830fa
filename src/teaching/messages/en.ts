/**
 * English wording of the teaching view: step names, slide texts, the evidence line of
 * each format demonstration with its source, the controls, and the teaching-set file
 * messages. Slide builders pass numbers and names; only this file holds English.
 */
import { capitalise, plural, startsWithVerb } from '../../core/messages/en/english-grammar.ts';
import { UNIT_NAMES_EN } from '../../core/messages/en/time-words.ts';
import { wordingMessages } from '../../core/messages/en/wording.ts';
import { amountIn } from '../../core/time-unit.ts';
import type {
  Period,
  TeachingClinicianMessages,
  TeachingLessonMessages,
  TeachingMessages,
  TeachingPatientSlideMessages,
  TeachingPresenterMessages,
} from './teaching-messages.ts';

export type { EvidenceWords, Period, TeachingMessages, TeachingPatientSlideMessages } from './teaching-messages.ts';

/**
 * A period with its preposition, in the unit given: "over 10 years", "over the next 6 months",
 * "by day 3".
 */
const over = ({ years, unit }: Period): string => {
  const amount = amountIn(years, unit);
  const shown = shortDecimal(amount);
  if (unit === 'years') return `over ${shown} ${plural(amount, 'year', 'years')}`;
  if (unit === 'days') return amount === 1 ? 'within a day' : `by day ${shown}`;
  const [one, other] = UNIT_NAMES_EN[unit];
  return amount === 1 ? `over the next ${one}` : `over the next ${shown} ${other}`;
};

/** A decimal with at most two places and no trailing zeros: 11.25, 3.75, 26.67. */
export function shortDecimal(value: number): string {
  // Hundredths counted after trimming float noise (3.75 × 100 may be 374.99999999999994).
  const hundredths = Math.round(Number((value * 100).toPrecision(12)));
  const sign = hundredths < 0 ? '-' : '';
  const whole = Math.floor(Math.abs(hundredths) / 100);
  const rest = String(Math.abs(hundredths) % 100)
    .padStart(2, '0')
    .replace(/0+$/, '');
  return `${sign}${whole}${rest === '' ? '' : `.${rest}`}`;
}

/** Outcome names starting with a verb in -ing ("dying of …") read "end up dying"; others "have a stroke". */
const have = (outcome: string, count: number): string =>
  startsWithVerb(outcome) ? plural(count, 'ends up', 'end up') : plural(count, 'has', 'have');
const get = (outcome: string, count: number): string =>
  startsWithVerb(outcome) ? plural(count, 'ends up', 'end up') : plural(count, 'gets', 'get');
const missOut = (count: number): string => plural(count, 'misses out on', 'miss out on');

/**
 * What the people changed by an option do, by the group they are in and whether the event is
 * wanted: an unwanted event is avoided (`prevented`) or got (`caused`); a wanted one is had
 * because of the option (`caused`) or missed out on (`prevented`).
 */
const changedVerb = (group: 'prevented' | 'caused', wanted: boolean, outcome: string, count: number): string => {
  if (wanted) return group === 'caused' ? have(outcome, count) : missOut(count);
  return group === 'prevented' ? plural(count, 'avoids', 'avoid') : get(outcome, count);
};

/** The English words a patient would read on the slides. */
export const teachingPatientSlideMessagesEn: TeachingPatientSlideMessages = {
  /** The name of each story step, as the slide's heading. */
  stepNames: {
    title: 'The decision',
    baseline: 'Without the option',
    'with-option': 'With the option',
    helped: 'Who is helped',
    harmed: 'Who is harmed',
    uncertainty: 'How sure are we?',
    'patient-words': 'What the patient hears',
  },

  wording: wordingMessages,
  decimal: shortDecimal,
  capitalise,

  title: {
    who: (population: string) => `For ${population}.`,
    period: (period: Period) =>
      period.unit === 'years' ? `Every number is ${over(period)}.` : `Every number counts what happens ${over(period)}.`,
    comparing: (option: string, comparison: string) => `Comparing ${option} with ${comparison}.`,
    illustrative: 'Illustrative example: every number is invented, for teaching. Not for real decisions.',
  },

  /** Short call-outs beside the people: a count in large type, then what it means. */
  callouts: {
    countIn: (count: number, denominator: number) => `${count} in ${denominator}`,
    have: (count: number, outcome: string, period: Period) => `${have(outcome, count)} ${outcome} ${over(period)}`,
    doNot: (count: number) => plural(count, 'does not', 'do not'),
    haveWith: (count: number, outcome: string, option: string) => `${have(outcome, count)} ${outcome} with ${option}`,
    without: (comparison: string) => `without it (${comparison})`,
    /** The people an option changes: "avoid a stroke because of …", "have pain relief because of …". */
    changedBecause: (group: 'prevented' | 'caused', wanted: boolean, count: number, outcome: string, option: string) =>
      `${changedVerb(group, wanted, outcome, count)} ${outcome} because of ${option}`,
    anyway: (count: number) => `${plural(count, 'has', 'have')} it anyway`,
    peopleLikeYou: (denominator: number, population: string) =>
      `Each figure is one of ${denominator} people like you: ${population}.`,
    outlined: 'Outlined: people who may or may not have it, depending on where in the range the truth lies.',
  },

  /** Each count under an array, in words, for assistive technology and the slide export. */
  chips: {
    event: (count: number, outcome: string) => `${count} ${have(outcome, count)} ${outcome}`,
    changed: (group: 'prevented' | 'caused', wanted: boolean, count: number, outcome: string, option: string) =>
      `${count} ${changedVerb(group, wanted, outcome, count)} ${outcome} because of ${option}`,
    free: (count: number, outcome: string) =>
      `${count} ${plural(count, 'does', 'do')} not ${startsWithVerb(outcome) ? 'end up' : 'have'} ${outcome}`,
    uncertain: (count: number, outcome: string) =>
      `${count} may or may not ${startsWithVerb(outcome) ? 'end up' : 'have'} ${outcome}`,
  },

  panels: {
    description: (title: string, labels: readonly string[]) => `${title}: ${labels.join(', ')}.`,
  },

  story: {
    totalWithout: (count: number, denominator: number, comparison: string) =>
      `Without it (${comparison}): ${count} in ${denominator}.`,
    /** No one changed: "none of 100 avoid a stroke …", "none of 100 miss out on pain relief …". */
    noOneChanged: (group: 'prevented' | 'caused', wanted: boolean, denominator: number, outcome: string, option: string) =>
      `At these numbers, none of ${denominator} ${changedVerb(group, wanted, outcome, 2)} ${outcome} because of ${option}.`,
    /** The people an option changes the other way: "Instead, 10 in 100 miss out on … because of …". */
    instead: (count: string, because: string) => `Instead, ${count} ${because}.`,
    /** The heading of one of a step's several slides (one per harm, say): "Who is harmed (1 of 2)". */
    partOf: (heading: string, part: number, parts: number) => (parts > 1 ? `${heading} (${part} of ${parts})` : heading),
    certaintyLabel: 'Certainty of the evidence',
    /** The level of the range: "The range is the research's 95% interval." */
    intervalLevel: (percent: number) => `The range is the research’s ${shortDecimal(percent)}% interval.`,
    certaintyNames: { high: 'high', moderate: 'moderate', low: 'low', 'very-low': 'very low' },
    patientTopics: (outcome: string) => `About ${outcome}`,
  },

  framing: {
    relativeLabel: 'Relative',
    /** An unwanted event's relative change is a lower or higher risk; a wanted event's is more or fewer people having it. */
    relativeValue: (percent: number, direction: 'lower' | 'higher', wanted: boolean) =>
      wanted ? `${percent}% ${direction === 'higher' ? 'more' : 'fewer'} people have it` : `${percent}% ${direction} risk`,
    relativeDetail: (from: string, to: string, denominator: number) => `From ${from} to ${to} in ${denominator}`,
    relativeNone: 'No relative change at these numbers',
    absoluteLabel: 'Absolute',
    absoluteValue: (count: number, denominator: number, direction: 'fewer' | 'more') => `${count} in ${denominator} ${direction}`,
    /** The subtraction the larger count first: "15 − 11 = 4 fewer in 100", "45 − 25 = 20 more in 100". */
    absoluteDetail: (larger: string, smaller: string, difference: string, denominator: number, direction: 'fewer' | 'more') =>
      `${larger} − ${smaller} = ${difference} ${direction} in ${denominator}`,
    absoluteNone: (denominator: number) => `No difference in ${denominator}`,
    nntLabel: 'NNT',
    /**
     * Unwanted: "Treat 27 to prevent 1"; wanted: "Treat 5 for 1 more" (to have it), short
     * enough for one line of the card beside 100 people.
     */
    nntValue: (count: number, change: 'helps' | 'harms', wanted: boolean) =>
      wanted
        ? `Treat ${count} for 1 ${change === 'helps' ? 'more' : 'fewer'}`
        : `Treat ${count} to ${change === 'helps' ? 'prevent' : 'cause'} 1`,
    /** A number needed to benefit is rounded up, one needed to harm down. */
    nntDetail: (denominator: number, difference: string, quotient: string, count: number, rounding: 'up' | 'down') =>
      `${denominator} ÷ ${difference} = ${quotient}, rounded ${rounding}: ${count}`,
    nntNone: 'No number needed to treat',
  },
};

/** The English commentary of the lesson: the format demonstrations and what the research found. */
export const teachingLessonMessagesEn: TeachingLessonMessages = {
  stepNames: {
    framing: 'One result, four ways',
    denominator: '100 or 1000 people?',
    arrangement: 'Grouped or scattered?',
    incremental: 'Two totals, or the change itself?',
  },

  panels: {
    denominatorCaption: (denominator: number) => `${denominator} people`,
    grouped: 'Grouped',
    scattered: 'Scattered',
    totalsOnly: 'Two totals',
    withChange: 'Change as its own group',
  },

  missing: {
    noBenefit: 'This topic lists no benefit to show.',
    noHarm: 'This topic lists no harms.',
    noHarmPrompt: 'Ask: what could go wrong, and how often? Leaving harms out is a choice too.',
  },

  /**
   * What the research found about each format, short enough for a projector, with its source:
   * first author, journal, year, volume and first page, so that two papers of one year stay apart.
   * framing: Akl EA, Oxman AD, Herrin J, et al. Using alternative statistical formats for presenting
   *   risks and risk reductions. Cochrane Database Syst Rev 2011;(3):CD006776; Zipkin DA, Umscheid
   *   CA, Keating NL, et al. Evidence-based risk communication: a systematic review. Ann Intern Med
   *   2014;161(4):270–280.
   * incremental: Zikmund-Fisher BJ, Fagerlin A, Roberts TR, Derry HA, Ubel PA. Alternate methods of
   *   framing information about medication side effects: incremental risk versus total risk of
   *   occurrence. J Health Commun 2008;13(2):107–124; Zikmund-Fisher BJ, Ubel PA, Smith DM, et al.
   *   Communicating side effect risks in a tamoxifen prophylaxis decision aid: the debiasing
   *   influence of pictographs. Patient Educ Couns 2008;73(2):209–214.
   */
  evidence: {
    framing: {
      finding:
        'Relative reductions looked bigger and swayed patients and clinicians more; absolute numbers were as clear or clearer, the NNT less.',
      source: 'Akl 2011, Cochrane · Zipkin 2014, Annals',
    },
    denominator: {
      finding: 'With 1000 rather than 100 people, risks seemed more serious and risk reductions larger.',
      source: 'Galesic, Garcia-Retamero & Gigerenzer 2009',
    },
    arrangement: {
      finding: 'Scattered figures were overestimated more, and more variably, than grouped ones.',
      source: 'Ancker, Weber & Kukafka 2011',
    },
    incremental: {
      finding: 'Side effects: the extra risk on its own eased worry; in words alone it was less clear, with pictures clearer.',
      source: 'Zikmund-Fisher, J Health Commun 2008;13:107 · Patient Educ Couns 2008;73:209',
    },
  },
};

/** The English controls and messages of the teaching view, and of teaching-set files. */
export const teachingPresenterMessagesEn: TeachingPresenterMessages = {
  view: {
    label: 'Teaching view',
    progress: (step: number, steps: number) => `${step} / ${steps}`,
    progressLabel: (step: number, steps: number, topic: number, topics: number) =>
      topics > 1 ? `Slide ${step} of ${steps}, topic ${topic} of ${topics}` : `Slide ${step} of ${steps}`,
    topicOf: (topic: number, topics: number) => `Topic ${topic} of ${topics}`,
    previous: 'Back',
    next: 'Next',
    leave: 'Leave',
    savePng: 'PNG',
    saveSvg: 'SVG',
    saveSlideGroup: 'Save this slide',
    setGroup: 'Teaching set',
    menu: 'File…',
    cannotPresent: (detail: string) => `This topic cannot be presented yet: ${detail}`,
    openSet: 'Open set…',
    saveSet: 'Save set',
    example: 'Example set',
    controls: 'Presentation controls',
    keysHint: 'Arrow keys, Page Up/Down or a clicker to step; Esc to leave.',
    illustrative: 'Illustrative',
    illustrativeLong: 'Illustrative: invented numbers, not from a real study',
    opened: (title: string, count: number) => `Opened the teaching set “${title}”: ${count} ${plural(count, 'topic', 'topics')}.`,
    saved: (name: string) => `Saved “${name}”.`,
    exported: (name: string) => `Saved the slide as “${name}”.`,
    exportFailed: (detail: string) => `The slide could not be saved: ${detail}.`,
    notOpened: (message: string) => `${message} The presentation is unchanged.`,
    dismiss: 'Dismiss',
  },

  file: {
    notJson: (name: string, detail: string) => `“${name}” is not a readable teaching set: it is not complete JSON (${detail}).`,
    empty: (name: string) => `“${name}” is empty, so there is no teaching set to open.`,
    notASet: (name: string, format: string) => `“${name}” is not a Chancewise teaching set (its format is "${format}").`,
    isATopic: (name: string) => `“${name}” is a topic, not a teaching set: open it as a topic, or put it in a set.`,
    newerVersion: (name: string, version: string, supported: number) =>
      `“${name}” is a teaching set of version ${version}, newer than this version of Chancewise reads (up to ${supported}).`,
    damaged: (name: string, path: string, expected: string, received: string) =>
      `“${name}” is damaged at "${path}": expected ${expected}, found ${received}.`,
    emptyList: (name: string, path: string, what: 'topic' | 'step') =>
      `“${name}” is damaged at "${path}": expected at least one ${what}, found an empty list.`,
    topicProblem: (name: string, item: number, path: string, detail: string) => `“${name}”, topic ${item} ("${path}"): ${detail}`,
    topicNotComputed: (name: string, item: number, path: string, detail: string) =>
      `“${name}”, topic ${item} cannot be shown ("${path}"): ${detail}`,
    unknownOption: (name: string, path: string, value: string, known: string) =>
      `“${name}” is damaged at "${path}": there is no option "${value}" to present (the options are ${known}).`,
    comparisonOption: (name: string, path: string, value: string) =>
      `“${name}” is damaged at "${path}": "${value}" is the comparison; name an option to compare with it.`,
    unknownHarm: (name: string, path: string, value: string, known: string) =>
      `“${name}” is damaged at "${path}": there is no harm "${value}" in this topic (${known}).`,
    noHarms: 'it has no harms',
    harmsAre: (ids: string) => `the harms are ${ids}`,
    pathInBrowser: (name: string, item: number, path: string) =>
      `“${name}”, topic ${item} is a file (“${path}”), which a browser cannot open by itself. Save the set from the desktop app, or write the topic inside the set.`,
    pathUnusable: (name: string, item: number, path: string) =>
      `“${name}”, topic ${item} (“${path}”) must be a relative path to a .json file next to the set.`,
    pathUnreadable: (name: string, item: number, path: string, detail: string) =>
      `“${name}”, topic ${item} (“${path}”) could not be read: ${detail}.`,
    setSuffix: '.teaching.json',
  },
};

/** The English words of the clinician: the lesson's commentary and the presenter's. */
export const teachingClinicianMessagesEn: TeachingClinicianMessages = {
  ...teachingLessonMessagesEn,
  ...teachingPresenterMessagesEn,
};

/**
 * The teaching view's words for a topic: the patient's slide words in the topic's language
 * (English unless given), beside the clinician's English.
 */
export function teachingMessagesWith(
  patient: TeachingPatientSlideMessages = teachingPatientSlideMessagesEn,
  clinician: TeachingClinicianMessages = teachingClinicianMessagesEn,
): TeachingMessages {
  return { patient, clinician };
}

/** Every English word of the teaching view, the patient's and the clinician's. */
export const teachingMessagesEn: TeachingMessages = teachingMessagesWith();
