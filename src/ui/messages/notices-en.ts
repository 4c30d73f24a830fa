/** The English of the messages at the foot of the window (see `notice-messages.ts`). */
import { handoutRefusalMessagesEn } from '../../handout/messages/refusal-messages.ts';
import type { NoticeMessages } from './notice-messages.ts';

const downloads = (inBrowser: boolean): string => (inBrowser ? ' Your browser puts it in its downloads folder.' : '');
const currentUnchanged = ' Your current topic is unchanged.';

export const noticeMessagesEn: NoticeMessages = {
  previousKept: ' Your previous topic had unsaved changes: they are kept above, to restore or discard.',
  opened: (fileName, replacing, migrated) =>
    `Opened “${fileName}”${replacing === null ? '' : ` (you chose it in place of “${replacing}”)`}.` +
    (migrated ? ' It was written by an older version and has been updated; saving writes the new format.' : ''),
  openedExample: (title) => `Opened the example “${title}”. Its numbers are invented.`,
  started: 'Started a new topic.',
  restored: (fileName, replacedKept) =>
    'Your unsaved work is back.' +
    (fileName === null ? '' : ` Save writes it to “${fileName}”.`) +
    (replacedKept ? ' The topic it replaced had unsaved changes: they are kept above.' : ''),
  fileEmpty: (fileName) => `“${fileName}” is empty, so there is no topic to open.`,
  fileUnreadable: (fileName, why) => `“${fileName}” could not be opened. ${why}`,
  numbersUnreadable: (count) =>
    `${count === 1 ? 'One number cannot' : `${count} numbers cannot`} be read yet. ` +
    `Fix ${count === 1 ? 'it' : 'them'} to save a file; meanwhile Chancewise keeps your work on this computer.`,
  snapshotUnreadable: 'A copy of unsaved work was found but could not be read.',
  openFailed: (reason) => `${reason}${currentUnchanged}`,
  topicSaved: (fileName, withPatient, inBrowser) =>
    `Saved “${fileName}”${withPatient ? ', with the patient’s details' : ''}.${downloads(inBrowser)}`,
  topicNotSaved: (reason) => `The topic was not saved: ${reason} Your work is still here.`,
  chartSaved: (fileName, inBrowser) => `The chart is saved as “${fileName}”.${downloads(inBrowser)}`,
  chartNotSaved: (reason) => `The chart could not be saved: ${reason}.`,
  handoutNeedsResults: 'Fix the marked fields first: the handout is only made from up-to-date results.',
  handoutOpen: (fileName, inBrowser) =>
    `The handout “${fileName}” is open ${inBrowser ? 'in a new tab: print it from there (Ctrl+P)' : 'in your PDF viewer: print it from there'}.`,
  handoutSaved: (fileName, inBrowser) => `The handout is saved as “${fileName}”.${downloads(inBrowser)} Open it to print it.`,
  handoutNotMade: (reason) => `The handout could not be made: ${reason}.`,
  platform: {
    tabBlocked:
      'Your browser did not open a new tab for the handout. Allow pop-ups for Chancewise, or make the handout (PDF) and print it from your PDF reader.',
    fileTooLarge: (fileName, megabytes, limitMegabytes) =>
      `“${fileName}” is ${megabytes.toFixed(1)} MB, larger than a Chancewise file can be (${limitMegabytes} MB), so it was not opened. Choose a topic or teaching set file.`,
  },
  handoutRefusal: handoutRefusalMessagesEn,
};
