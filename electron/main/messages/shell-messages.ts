/**
 * The words of the desktop shell: the application menu, the native dialogs, the about box
 * and the fatal error box. Types only; `en.ts` beside this file provides the English.
 */
export interface ShellMenuMessages {
  readonly app: string;
  readonly about: string;
  readonly file: string;
  readonly newTopic: string;
  readonly open: string;
  readonly openRecent: string;
  readonly noRecent: string;
  readonly clearRecent: string;
  readonly save: string;
  readonly saveAs: string;
  readonly exportHandout: string;
  readonly printHandout: string;
  readonly edit: string;
  readonly view: string;
  readonly help: string;
}

export interface ShellDialogMessages {
  readonly openTitle: string;
  readonly saveTitle: string;
  readonly exportTitle: string;
  readonly topicFilter: string;
  readonly pdfFilter: string;
  readonly recoveryButtons: readonly [restore: string, discard: string];
  readonly recoveryMessage: string;
  readonly replaceButtons: readonly [open: string, cancel: string];
  readonly replaceMessage: (fileName: string) => string;
  readonly replaceDetail: string;
  readonly closeButtons: readonly [save: string, discard: string, cancel: string];
  readonly closeMessage: string;
  readonly closeDetail: string;
  readonly openFailure: (fileName: string) => string;
  readonly crashLoopTitle: string;
  readonly crashLoopMessage: string;
}

export interface ShellMessages {
  readonly menu: ShellMenuMessages;
  readonly dialogs: ShellDialogMessages;
  readonly aboutCredits: string;
  readonly fatalErrorTitle: string;
  readonly fatalErrorMessage: string;
}
