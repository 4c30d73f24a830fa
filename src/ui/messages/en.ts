/** The English words of the clinician's interface, exactly as the screens show them. */
import type { InfleszBand } from '../../core/wording/readability-es.ts';
import type { ReadingLevel } from '../../core/wording/reading-scale.ts';
import type { UiMessages } from './ui-messages.ts';

const INFLESZ_BANDS: Readonly<Record<InfleszBand, string>> = {
  'very-difficult': 'very difficult',
  'somewhat-difficult': 'somewhat difficult',
  normal: 'normal',
  'fairly-easy': 'fairly easy',
  'very-easy': 'very easy',
};

/** The reading level in one sentence, with its aim and where the scale comes from. */
function readingLevel(level: ReadingLevel): string {
  if (level.score === null) return 'There is no patient wording to score yet.';
  if (level.scale === 'flesch-kincaid-grade') {
    return `The patient wording reads at about grade ${level.score.toFixed(1).replace(/\.0$/, '')} (Flesch–Kincaid, ${level.source}); the aim is grade ${level.limit} or below. ${level.withinTarget ? 'Within the aim.' : 'Above the aim: shorter outcome names help.'}`;
  }
  const band = level.band === null ? '' : ` (${INFLESZ_BANDS[level.band]})`;
  return `The Spanish patient wording has a reading ease of ${level.score} on the INFLESZ scale${band} (Szigriszt-Pazos perspicuity, bands of ${level.source}); the aim is ${level.target} or more. ${level.withinTarget ? 'Within the aim.' : 'Below the aim: shorter outcome names help.'}`;
}

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
    actions: 'Topic',
    topics: 'Topics',
    open: 'Open…',
    save: 'Save',
    saveKeys: 'Ctrl+S',
    undo: 'Undo',
    redo: 'Redo',
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
    restoreFrom: (savedAt) => `Unsaved work from ${savedAt}`,
    restoreWhat: (title) => `${title.trim() === '' ? '(an untitled topic)' : `“${title}”`} was not saved to a file.`,
    restore: 'Restore it',
    discard: 'Discard it',
    illustrativeLabel: 'Illustrative example',
    illustrativeHeading: 'Illustrative example',
    illustrativeText: 'Every number here is invented, for demonstration and teaching. Do not use it for real decisions.',
    illustrativeStart: 'Start a new topic or open a file',
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
  results: {
    readingHeading: 'Reading level',
    readingLevel,
    wordsLoading: (language) => `Preparing the ${language === 'es' ? 'Spanish' : 'English'} patient wording…`,
    wordsFailed: (language, detail) =>
      `The ${language === 'es' ? 'Spanish' : 'English'} patient wording could not be loaded (${detail}). Reload the app; the topic is kept.`,
    languageNames: { en: 'English', es: 'Spanish (Español)' },
  },
};
