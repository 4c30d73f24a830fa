/** The English words of the clinician's interface, exactly as the screens show them. */
import type { TimeUnit } from '../../core/time-unit.ts';
import type { InfleszBand } from '../../core/wording/readability-es.ts';
import type { ReadingLevel } from '../../core/wording/reading-scale.ts';
import type { PatientLanguage } from '../../core/topic/topic-language.ts';
import { noticeMessagesEn } from './notices-en.ts';
import type { UiMessages } from './ui-messages.ts';

const INFLESZ_BANDS: Readonly<Record<InfleszBand, string>> = {
  'very-difficult': 'very difficult',
  'somewhat-difficult': 'somewhat difficult',
  normal: 'normal',
  'fairly-easy': 'fairly easy',
  'very-easy': 'very easy',
};

/** The patient languages by their English names. */
const LANGUAGE_NAMES: Readonly<Record<PatientLanguage, string>> = { en: 'English', es: 'Spanish' };

/** The reading level in one sentence, with its aim and where the scale comes from. */
function readingLevel(level: ReadingLevel): string {
  if (level.score === null) return 'There is no patient wording to score yet.';
  if (level.scale === 'flesch-kincaid-grade') {
    return `The patient wording reads at about grade ${level.score.toFixed(1).replace(/\.0$/, '')} (Flesch–Kincaid, ${level.source}); the aim is grade ${level.limit} or below. ${level.withinTarget ? 'Within the aim.' : 'Above the aim: shorter outcome names help.'}`;
  }
  const band = level.band === null ? '' : ` (${INFLESZ_BANDS[level.band]})`;
  return `The Spanish patient wording has a reading ease of ${level.score} on the INFLESZ scale${band} (Szigriszt-Pazos perspicuity, bands of ${level.source}); the aim is ${level.target} or more. ${level.withinTarget ? 'Within the aim.' : 'Below the aim: shorter outcome names help.'}`;
}

const SINGULAR: Readonly<Record<TimeUnit, string>> = { days: 'day', weeks: 'week', months: 'month', years: 'year' };

export const uiMessagesEn: UiMessages = {
  app: {
    skipLinks: 'Skip to',
    skipToTopic: 'Skip to the topic',
    skipToResults: 'Skip to the results',
    topicHeading: 'Topic',
    topicHint: 'The results update as you type.',
    resultsHeading: 'Results',
    present: 'Present for teaching',
    footer:
      'Chancewise runs entirely on this device: nothing you enter is sent anywhere. The numbers are group estimates, not a prediction for one person.',
  },
  appBar: {
    brand: 'Chancewise',
    unsaved: 'Unsaved changes',
    exampleNotSaved: 'Example (not saved)',
    notSavedYet: 'Not saved yet',
    windowTitle: (decision, unsaved) => `${unsaved ? '• ' : ''}${decision ?? 'New topic'} — Chancewise`,
    actions: 'Topic',
    topics: 'Topics',
    open: 'Open…',
    save: 'Save',
    saveKeys: 'Ctrl+S',
    undo: 'Undo',
    redo: 'Redo',
    copyInSpanish: 'A copy in Spanish',
    copyInSpanishHint: 'A new, unsaved topic with the same numbers, for you to write in Spanish. This topic stays as it is.',
    copiedInSpanish:
      'This is a new copy in Spanish, not saved yet: the numbers are the same, and every text is still in English until you write it in Spanish (see “Still to fill in”). The topic you copied is unchanged.',
  },
  headline: {
    label: 'Headline results',
    empty: 'Headline numbers appear here once the marked fields are filled in.',
    outOf: (outcome, per) => `${outcome}, out of ${per}:`,
    stale: 'Out of date',
    allResults: 'All results',
  },
  start: {
    heading: 'Start',
    close: 'Close',
    yourTopics: 'Your topics',
    newTopic: 'New topic',
    newTopicLanguage: 'Written for a patient who reads',
    openFile: 'Open a topic file…',
    recent: 'Recent files',
    noRecent: 'Files you open or save appear here.',
    browserReopens: 'Your browser asks you to choose the file again; nothing is kept but its name.',
    examples: 'Examples',
    examplesHint: 'Invented scenarios for learning the tool. Every number in them is made up.',
    illustrative: 'Illustrative',
    demoFacts: (options, outcomes, period) => `${options} options · ${outcomes} outcomes · ${period}`,
    demoTitle: (title) => title.replace(/\s*\(illustrative example\)\s*$/i, ''),
  },
  banners: {
    restoreLabel: 'Unsaved work',
    restoreFrom: (savedAt) => `Unsaved work from ${savedAt.toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}`,
    restoreWhat: (title) => `${title.trim() === '' ? '(an untitled topic)' : `“${title}”`} was not saved to a file.`,
    restore: 'Restore it',
    discard: 'Discard it',
    illustrativeLabel: 'Illustrative example',
    illustrativeHeading: 'Illustrative example',
    illustrativeText: 'Every number here is invented, for demonstration and teaching. Do not use it for real decisions.',
    illustrativeStart: 'Start a new topic or open a file',
    languageLabel: (language) => `Patient wording in ${language}`,
    languageHeading: (language) => `Check the ${language}`,
    languageText: (language) =>
      `The ${language} wording of the sentences, pictures and handout is written by Chancewise, from set patterns around the names you type. Before it reaches patients, have it checked by a qualified medical translator or a ${language}-speaking clinician, and follow your local guidance on translated information for patients.`,
  },
  toast: {
    dismiss: 'Dismiss',
    dismissLabel: 'Dismiss this message',
  },
  saveDialog: {
    heading: 'Save the topic',
    fileName: 'File name',
    includePatient: 'Include the patient’s name and reference in the file',
    patientHint: 'Left out unless ticked. Anyone with the file could read them.',
    noPatientHint: 'No patient details are entered, so none can be saved.',
    cancel: 'Cancel',
    saveFile: 'Save file',
  },
  patientWording: {
    readingHeading: 'Reading level',
    readingLevel,
    wordsLoading: (language) => `Preparing the ${LANGUAGE_NAMES[language]} patient wording…`,
    wordsFailed: (language, detail) =>
      `The ${LANGUAGE_NAMES[language]} patient wording could not be loaded (${detail}). Reload the app; the topic is kept.`,
  },
  resultsStatus: {
    waiting: 'No results yet: fill in the marked fields.',
    stale: 'Out of date.',
    staleRest: 'Showing your last complete entry.',
    fresh: 'Up to date',
    showOutOf: 'Show out of',
    automatic: 'Automatic',
    people: (count) => `${count} people`,
  },
  results: {
    staleHeading: 'These results are from before your latest change.',
    staleText: 'They will update as soon as the marked fields are fixed.',
    illustrative: 'Illustrative',
    illustrativeText: '— invented numbers for demonstration; not for real decisions.',
    picturesShow: 'The pictures show',
    peopleOver: 'people like this, over',
    tablesCountPer: '; the tables and words count per',
    becauseNoOne: (picturesCount) => `, because out of ${picturesCount} a difference would show as no one. Headline first.`,
    outOf: 'Out of',
    headlineFirst: '. Headline first.',
    outline: 'Outline the people who depend on the range',
    footnote: (rangesNote) =>
      `${rangesNote} and leave out uncertainty in the baseline. NNTB: number needed to treat for one more person to benefit; NNTH: for one more to be harmed.`,
    warningsHeading: 'Check before use',
  },
  intervals: {
    oneLevel: (level) => `Ranges are ${level} intervals for the effect`,
    severalLevels: (levels) =>
      `Ranges are intervals for the effect at the level each effect gives (${levels.slice(0, -1).join(', ')} and ${levels.at(-1) ?? ''}: see each table)`,
  },
  outcomeResult: {
    benefit: 'Benefit',
    harm: 'Harm',
    headline: ' · headline',
    exportLabel: (outcome) => `Save the chart of ${outcome}`,
    saveSvg: 'Save chart as SVG',
    savePng: 'Save as PNG (300 dpi)',
    inWords: 'In words',
    forClinician: 'For you, not the handout',
  },
  keyNumbers: {
    caption: (outcome, outOf) => `Key numbers for ${outcome}, out of ${outOf} people`,
    option: 'Option',
    peopleWithIt: 'People with it',
    outOf: (count) => `out of ${count}`,
    change: 'Change',
    risk: (wanted) => (wanted ? 'Chance' : 'Risk'),
    nnt: 'NNT',
    comparison: 'comparison',
    ranges: (level) => `ranges: ${level} interval`,
    notApplicable: 'not applicable',
    rangeIntro: (level) => `, ${level} interval `,
  },
  peopleChange: {
    noChange: 'no change',
    underOne: 'under 1',
    fewer: (size) => `${size} fewer`,
    more: (size) => `${size} more`,
    fewerRange: (from, to) => `${from} to ${to} fewer`,
    moreRange: (from, to) => `${from} to ${to} more`,
    fewerToMore: (fewer, more) => `${fewer} fewer to ${more} more`,
    range: (lower, upper) => `${lower} to ${upper}`,
    nntInterval: { infinity: '∞', to: 'to' },
    noNnt: 'No difference between the options, so no number needed to treat',
  },
  handoutCard: {
    heading: 'Handout for the patient',
    summary: (illustrative) =>
      `One printed page${illustrative ? ', marked illustrative' : ''}. For every benefit and side effect alike: how many people have it with and without each option, the change, its range, how sure the research is, and any assumption behind the numbers. Pictures of every outcome at one size, smaller when the page is full, or none when even small ones do not fit (then a table sets the outcomes side by side where there is room). A question weighing the benefit against the side effects, questions to ask, each effect's source, and who prepared the sheet, its funding, interests and review date ("not stated" when not given).`,
    paper: 'Paper',
    a4: 'A4',
    letter: 'US Letter',
    includeNnt: 'Include the number needed to treat',
    making: 'Making the handout…',
    make: 'Make the handout (PDF)',
    print: 'Print the handout…',
    warningsLabel: 'Warnings on the handout',
    warningsIntro: 'The handout was made. Some typed text may be hard to read:',
    staleNote: 'Fix the marked fields first: the handout is only made from up-to-date results.',
  },
  outcomes: {
    heading: 'Outcomes',
    count: (count, most) => `${count} of ${most}`,
    addBenefit: 'Add a benefit',
    addHarm: 'Add a harm',
    full: (most) => `A topic has at most ${most} outcomes.`,
  },
  basics: {
    heading: 'The decision',
    title: 'Decision',
    titleHint: 'In one line, what the person is deciding about.',
    population: 'Who the numbers are for',
    populationHint: 'In plain words, for example “people aged 60 to 69 with a 15% ten-year risk”.',
    period: 'Over what period',
    periodHint: 'Every number covers this period: 10 years, 6 months, 3 days.',
  },
  problemSummary: {
    toFix: (count) => `${count === 1 ? '1 thing to fix' : `${count} things to fix`} before the results can update`,
    toFixKept: 'Everything you typed is kept. The results show your last complete entry until then.',
    needed: (count) => `Still to fill in (${count})`,
    neededNote: 'The results appear once these are entered.',
    gaps: (count) => `Still to fill in for the handout (${count})`,
    gapsNote: 'The results do not wait for these. Until they are given, the handout says “not stated”.',
    gapNames: {
      'effect-source': 'Where the effect comes from',
      preparedBy: 'Who prepared this topic',
      funding: 'Who funded it',
      interests: 'Interests (conflicts of interest) of those who prepared it',
      reviewBy: 'The date to review it by',
    },
  },
  namePreview: {
    heading: 'How the names read to the patient',
    hint: (language) =>
      `The ${LANGUAGE_NAMES[language]} sentences your names go into, as the patient will read them. Reword a name until each sentence reads well (its article, its gender, a verb at the start).`,
    waiting: 'The sentences appear once the numbers are complete.',
  },
  options: {
    heading: 'Options',
    count: (count, most) => `${count} of ${most}`,
    hint: (least, most) =>
      `Between ${least} and ${most} options. One is the comparison (often “no treatment”): every effect is measured against it.`,
    nameLabel: (number) => `Option ${number} name`,
    comparison: 'Comparison',
    unnamed: (number) => `option ${number}`,
    moveUp: (option) => `Move ${option} up`,
    moveDown: (option) => `Move ${option} down`,
    removeLabel: (option) => `Remove ${option}`,
    remove: 'Remove',
    add: 'Add an option',
    full: (most) => `A topic has at most ${most} options.`,
  },
  outcome: {
    unnamed: (number) => `Outcome ${number}`,
    benefit: 'Benefit',
    harm: 'Harm',
    headlineTag: ' · headline',
    removeLabel: (outcome) => `Remove outcome ${outcome}`,
    remove: 'Remove',
    name: 'Outcome',
    nameHint: 'As it reads in a sentence: “a heart attack or stroke”, “muscle pain”.',
    kindLegend: 'This outcome is',
    kindBenefit: 'A benefit (what the options aim at)',
    kindHarm: 'A harm (a side effect)',
    headline: 'Headline outcome (shown first)',
    wantedLegend: 'For the person, having it is',
    unwanted: 'Something people want to avoid',
    unwantedExample: '(a stroke, a broken bone)',
    wanted: 'Something people want',
    wantedExample: '(pain gone by day 3, stopped smoking)',
    wantedHint: 'This sets which way counts as better: fewer people having it, or more.',
  },
  baseline: {
    title: (wanted) => `${wanted ? 'Chance' : 'Risk'} without any option (baseline)`,
    risk: (wanted) => `Baseline ${wanted ? 'chance' : 'risk'}`,
    over: 'Over',
    hint: (wanted, countsOnly) =>
      `As you would write it: 15%, 0.15, 15/100 or 1 in 7.${countsOnly ? ` Leave it empty to use the ${wanted ? 'chance' : 'risk'} in the trial’s comparison arm.` : ''}`,
    source: (wanted) => `Source of the baseline ${wanted ? 'chance' : 'risk'}`,
    sourcePlaceholder: 'Score, registry or trial comparison arm',
  },
  effect: {
    legend: 'Effect of',
    unnamedOption: (number) => `option ${number}`,
    quotedOutcome: (outcome) => `“${outcome}”`,
    thisOutcome: 'this outcome',
    measures: {
      rr: 'Risk ratio (RR)',
      or: 'Odds ratio (OR)',
      hr: 'Hazard ratio (HR)',
      rrr: 'Relative risk reduction (%)',
      arr: 'Absolute risk reduction (percentage points)',
      counts: 'Trial counts (people in each arm)',
    },
    measureHint: (measure, wanted) => {
      switch (measure) {
        case 'rr':
          return 'Below 1 means fewer people have the outcome; for example 0.75.';
        case 'or':
          return 'Below 1 means fewer people have the outcome; for example 0.73.';
        case 'hr':
          return 'Below 1 means fewer people have the outcome; for example 0.8.';
        case 'rrr':
          return `In percent: 25 means the ${wanted ? 'chance' : 'risk'} is a quarter lower. A negative number is an increase.`;
        case 'arr':
          return 'In percentage points: 3 means 3 in 100 fewer. A negative number is an increase.';
        case 'counts':
          return 'The trial’s own numbers: how many people in each arm had the outcome, out of how many.';
      }
    },
    certainties: { high: 'High', moderate: 'Moderate', low: 'Low', 'very-low': 'Very low' },
    importance: { important: 'Important', trivial: 'Little or none' },
    enteredAs: 'Entered as',
    estimate: 'Estimate',
    interval: (level) => `${level} interval`,
    optional: '(optional)',
    lower: (interval) => `Lower limit of the ${interval}`,
    upper: (interval) => `Upper limit of the ${interval}`,
    to: 'to',
    followUp: 'Follow-up',
    followUpHint: 'How long the effect was measured for.',
    certainty: 'Certainty (GRADE)',
    importanceLabel: 'Difference judged',
    source: 'Source of the effect',
    sourcePlaceholder: 'Trial, review or guideline, with year',
  },
  opposite: {
    label: (counts, outcome) => `${counts ? 'These counts are' : 'This number is'} for the opposite: not having ${outcome}`,
    hint: (measure) =>
      measure === 'or'
        ? 'The odds ratio is turned round (1 ÷ OR), which is exact.'
        : measure === 'counts'
          ? 'Each arm’s count is taken from its total to give the people who had the outcome.'
          : 'It is applied to the chance of not having the outcome. A ratio for one event is not the inverse of the ratio for its opposite, so check the trial reported it this way.',
  },
  trialArms: {
    withOption: (option) => `With ${option}`,
    comparisonArm: 'In the comparison arm',
    eventsLabel: (arm) => `People with the outcome, ${arm.toLowerCase()}`,
    totalLabel: (arm) => `People in the arm, ${arm.toLowerCase()}`,
    eventsPlaceholder: 'with it',
    totalPlaceholder: 'people',
    of: 'of',
    hadOutcome: 'had the outcome',
  },
  period: {
    unitLabel: (field) => `${field}: unit`,
    units: { days: 'days', weeks: 'weeks', months: 'months', years: 'years' },
    amount: (amount, unit, one) => `${amount} ${one ? SINGULAR[unit] : unit}`,
  },
  field: {
    needed: 'Still needed: ',
    problem: 'Problem: ',
    characters: (length, limit) => `${length} of ${limit} characters`,
  },
  handoutDetails: {
    heading: 'Evidence, questions and patient',
    hint: 'For the handout; optional',
    evidenceSummary: 'Where the evidence comes from',
    evidenceReviewed: 'Evidence reviewed on',
    evidenceReviewedHint: 'A date, for example 2026-11-01.',
    clinician: 'Clinician or practice',
    questions: (most) => `Questions to think about (up to ${most})`,
    question: (number) => `Question ${number}`,
    removeQuestion: (number) => `Remove question ${number}`,
    remove: 'Remove',
    addQuestion: 'Add a question',
    illustrative: 'This is an invented example (marked “illustrative” everywhere it appears)',
    patient: 'Patient (optional)',
    patientHint: 'Kept only while this topic is open, and written to a file only if you tick the box when saving.',
    patientName: 'Patient name',
    patientReference: 'Patient reference',
  },
  aboutTopic: {
    heading: 'About this topic',
    hint: 'Printed in the handout’s “About this sheet” line. An empty one is printed as “not stated”.',
    fields: {
      preparedBy: { label: 'Prepared by', hint: 'Who wrote the numbers and words: a person, team or organisation.' },
      funding: { label: 'Funding', hint: 'Who paid for the work, or “none”.' },
      interests: { label: 'Interests', hint: 'Conflicts of interest of those who prepared it, or “none declared”.' },
      reviewBy: { label: 'Review by', hint: 'The date to check the numbers again, for example 2028-06-30.' },
    },
    reviewByPlaceholder: 'YYYY-MM-DD',
  },
  screening: {
    heading: 'Screening test',
    hint: 'Only for a topic about a test; printed as “If you have the test” when filled in',
    positiveLeadsTo: 'A positive result leads to',
    positiveLeadsToHint: 'For example “a camera test of the bowel to look for the cause”.',
    missedCase: 'Missed cases (false reassurance)',
    missedCaseHint: 'People told all is well who do have the illness, for example 3 in 1000.',
    overdiagnosis: 'Overdiagnosis',
    overdiagnosisHint: 'People found to have an illness that would never have harmed them, for example 4 in 1000.',
    outOf: 'Out of the people who have the test; the handout counts them per its own number of people.',
  },
  teachingSlide: {
    evidenceLabel: 'What the research found',
  },
  language: {
    label: 'Language the patient reads',
    hint: 'The sentences, pictures and handout are written in it. This screen stays in English.',
    names: { en: 'English', es: 'Español' },
    notWritten: (tag) => `“${tag}” (not one Chancewise writes)`,
  },
  translation: {
    kinds: {
      title: 'Decision',
      population: 'Who the numbers are for',
      optionName: 'Option name',
      outcomeName: 'Outcome name',
      evidenceSummary: 'Where the evidence comes from',
      question: 'Question',
      funding: 'Funding',
      interests: 'Interests',
      positiveLeadsTo: 'What a positive result leads to',
    },
    languageNames: LANGUAGE_NAMES,
    stillIn: (what, text, from, to) => `${what} “${text}” is still in ${from}: write it in ${to}.`,
    note: (from) =>
      `Until it is rewritten, a text still in ${from} reaches the patient as it is, on screen and on the handout. ` +
      'A text that reads the same in both (a medicine’s name) can be kept as it is.',
    keep: 'Keep as it is',
    keepLabel: (text, to) => `Keep “${text}” as it is in ${to}`,
  },
  notices: noticeMessagesEn,
};
