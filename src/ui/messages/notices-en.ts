/** The English of the messages at the foot of the window (see `notice-messages.ts`). */
import { handoutRefusalMessagesEn } from '../../handout/messages/refusal-messages.ts';
import type { NoticeMessages } from './notice-messages.ts';

const downloads = (inBrowser: boolean): string => (inBrowser ? ' Your browser puts it in its downloads folder.' : '');
const currentUnchanged = ' Your current topic is unchanged.';

export const noticeMessagesEn: NoticeMessages = {
  previousKept: ' Your previous topic had unsaved changes: they are kept above, to restore or discard.',
  currentUnchanged,
  opened: (fileName, replacing, migrated) =>
    `Opened “${fileName}”${replacing === null ? '' : ` (you chose it in place of “${replacing}”)`}.` +
    (migrated ? ' It was written by an older version and has been updated; saving writes the new format.' : ''),
  openedExample: (title) => `Opened the example “${title}”. Its numbers are invented.`,
  started: 'Started a new topic.',
  restored: (fileName, replacedKept) =>
    'Your unsaved work is back.' +
    (fileName === null ? '' : ` Save writes it to “${fileName}”.`) +
    (replacedKept ? ' The topic it replaced had unsaved changes: they are kept above.' : ''),
  snapshotUnreadable: 'A copy of unsaved work was found but could not be read.',
  openFailed: (reason) => `${reason}${currentUnchanged}`,
  topicSaved: (fileName, withPatient, inBrowser) =>
    `Saved “${fileName}”${withPatient ? ', with the patient’s details' : ''}.${downloads(inBrowser)}`,
  topicNotSaved: (reason) => `The topic was not saved: ${reason} Your work is still here.`,
  numbersUnreadable: (count) =>
    `${count === 1 ? 'One number cannot' : `${count} numbers cannot`} be read yet. Fix ${count === 1 ? 'it' : 'them'} to save a file; meanwhile Chancewise keeps your work on this computer.`,
  chartSaved: (fileName, inBrowser) => `The chart is saved as “${fileName}”.${downloads(inBrowser)}`,
  chartNotSaved: (reason) => `The chart could not be saved: ${reason}.`,
  handoutNeedsResults: 'Fix the marked fields first: the handout is only made from up-to-date results.',
  handoutOpen: (fileName, inBrowser) =>
    `The handout “${fileName}” is open ${inBrowser ? 'in a new tab: print it from there (Ctrl+P)' : 'in your PDF viewer: print it from there'}.`,
  handoutSaved: (fileName, inBrowser) => `The handout is saved as “${fileName}”.${downloads(inBrowser)} Open it to print it.`,
  handoutNotMade: (reason) => `The handout could not be made: ${reason}.`,
  handoutRefusal: handoutRefusalMessagesEn,
};
