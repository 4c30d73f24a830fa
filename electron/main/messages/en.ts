/** The English words of the desktop shell. */
import type { ShellMessages } from './shell-messages.ts';

export const shellMessagesEn: ShellMessages = {
  menu: {
    app: 'Chancewise',
    about: 'About Chancewise',
    file: 'File',
    newTopic: 'New Topic',
    open: 'Open…',
    openRecent: 'Open Recent',
    noRecent: 'No recent files',
    clearRecent: 'Clear Recent',
    save: 'Save',
    saveAs: 'Save As…',
    exportHandout: 'Export Handout as PDF…',
    printHandout: 'Print Handout…',
    edit: 'Edit',
    view: 'View',
    help: 'Help',
  },
  dialogs: {
    openTitle: 'Open topic',
    saveTitle: 'Save topic',
    exportTitle: 'Export handout',
    topicFilter: 'Chancewise topic',
    pdfFilter: 'PDF document',
    recoveryButtons: ['Restore', 'Discard'],
    recoveryMessage: 'Chancewise closed before your last changes were saved.',
    replaceButtons: ['Open', 'Cancel'],
    replaceMessage: (fileName: string) => `Open ${fileName}?`,
    replaceDetail: 'The topic open now has changes that are not saved; they will be lost.',
    closeButtons: ['Save…', 'Close without saving', 'Cancel'],
    closeMessage: 'Save the changes to this topic before closing?',
    closeDetail: 'If you close without saving, the changes are lost.',
    openFailure: (fileName: string) => `Could not open ${fileName}`,
    crashLoopTitle: 'Chancewise stopped working',
    crashLoopMessage:
      'The window stopped several times in a row. Your last changes are kept and will be offered when Chancewise starts again.',
  },
  aboutCredits: 'Absolute risks, icon arrays and a one-page handout, offline.',
  fatalErrorTitle: 'Chancewise stopped because of an internal error',
  fatalErrorMessage:
    'Chancewise met an error it could not recover from and will close. Changes made more than a few seconds ago ' +
    'are kept and will be offered when you start it again. The details are in the log file (main.log in the ' +
    'app’s logs folder); please pass it on to whoever supports Chancewise for you.',
};
