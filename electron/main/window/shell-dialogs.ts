import path from 'node:path';
import { dialog } from 'electron';
import type { BrowserWindow } from 'electron';
import { OPEN_DIALOG_FILTERS, SAVE_DIALOG_FILTERS, withTopicExtension } from '../document/topic-file-type.ts';
import { shellMessagesEn } from '../messages/en.ts';
import type { ShellMessages } from '../messages/shell-messages.ts';

/** What the person chose when closing with unsaved changes. */
export type CloseChoice = 'save' | 'discard' | 'cancel';

/** What the recovery question says. */
export interface RecoveryQuestion {
  readonly savedAt: number;
  /** The full path of the snapshot's topic file (shown in full), or null for a topic never saved. */
  readonly topicPath: string | null;
  /** Whether Save will ask where to save after restoring (the file is not one the person opened or saved lately). */
  readonly asksWhereToSave: boolean;
  /** A file named at launch that is not opened if the person restores. */
  readonly skippedFile: string | null;
}

/** The detail line of the recovery question: the topic's full path, so the person sees which file it belongs to. */
export function recoveryDetail(question: RecoveryQuestion): string {
  const topic = question.topicPath === null ? 'an unsaved topic' : `the topic in ${question.topicPath}`;
  const asks = question.asksWhereToSave ? ' That file is not among your recent files, so Save will ask where to save them.' : '';
  const skipped = question.skippedFile === null ? '' : ` If you restore them, ${question.skippedFile} is not opened.`;
  return `Restore the changes to ${topic} from ${new Date(question.savedAt).toLocaleString()}?${asks}${skipped}`;
}

/** The native dialogs of the shell, each attached to the main window. */
export interface ShellDialogs {
  /** Choose a topic file to open; null when cancelled. */
  chooseTopicToOpen(nearFile: string | null): Promise<string | null>;
  /** Choose where to save a topic (the topic extension added when missing); null when cancelled. */
  chooseTopicSavePath(suggested: string): Promise<string | null>;
  /** Choose where to save a handout PDF (".pdf" added when missing); null when cancelled. */
  chooseHandoutSavePath(suggested: string): Promise<string | null>;
  /** Whether to restore the changes of a snapshot left by an unexpected exit. */
  confirmRecovery(question: RecoveryQuestion): Promise<boolean>;
  /** Whether a file from the system may replace a topic with unsaved changes. */
  confirmReplace(fileName: string): Promise<boolean>;
  /** Save, discard or keep the window open, when closing with unsaved changes. */
  chooseOnClose(): Promise<CloseChoice>;
  /** Tell the person a file could not be opened. */
  showOpenFailure(fileName: string, detail: string): void;
  /** Tell the person the window kept crashing (blocking, before quitting). */
  showCrashLoop(): void;
}

function chosenPath(answer: { canceled: boolean; filePath?: string }): string | null {
  return answer.canceled || answer.filePath === undefined || answer.filePath === '' ? null : answer.filePath;
}

/** The dialogs for one window. */
export function createShellDialogs(window: BrowserWindow, words: ShellMessages = shellMessagesEn): ShellDialogs {
  const said = words.dialogs;
  return {
    async chooseTopicToOpen(nearFile) {
      const answer = await dialog.showOpenDialog(window, {
        title: said.openTitle,
        filters: OPEN_DIALOG_FILTERS,
        properties: ['openFile'],
        ...(nearFile === null ? {} : { defaultPath: path.dirname(nearFile) }),
      });
      const chosen = answer.filePaths[0];
      return answer.canceled || chosen === undefined ? null : chosen;
    },
    async chooseTopicSavePath(suggested) {
      const answer = await dialog.showSaveDialog(window, {
        title: said.saveTitle,
        defaultPath: suggested,
        filters: SAVE_DIALOG_FILTERS,
        properties: ['showOverwriteConfirmation', 'createDirectory'],
      });
      const chosen = chosenPath(answer);
      return chosen === null ? null : withTopicExtension(chosen);
    },
    async chooseHandoutSavePath(suggested) {
      const answer = await dialog.showSaveDialog(window, {
        title: said.exportTitle,
        defaultPath: suggested,
        filters: [{ name: said.pdfFilter, extensions: ['pdf'] }],
        properties: ['showOverwriteConfirmation', 'createDirectory'],
      });
      const chosen = chosenPath(answer);
      if (chosen === null) return null;
      return chosen.toLowerCase().endsWith('.pdf') ? chosen : `${chosen}.pdf`;
    },
    async confirmRecovery(question) {
      const answer = await dialog.showMessageBox(window, {
        type: 'question',
        buttons: [...said.recoveryButtons],
        defaultId: 0,
        cancelId: 1,
        message: said.recoveryMessage,
        detail: recoveryDetail(question),
      });
      return answer.response === 0;
    },
    async confirmReplace(fileName) {
      const answer = await dialog.showMessageBox(window, {
        type: 'question',
        buttons: [...said.replaceButtons],
        defaultId: 1,
        cancelId: 1,
        message: said.replaceMessage(fileName),
        detail: said.replaceDetail,
      });
      return answer.response === 0;
    },
    async chooseOnClose() {
      const answer = await dialog.showMessageBox(window, {
        type: 'question',
        buttons: [...said.closeButtons],
        defaultId: 0,
        cancelId: 2,
        message: said.closeMessage,
        detail: said.closeDetail,
      });
      return answer.response === 0 ? 'save' : answer.response === 1 ? 'discard' : 'cancel';
    },
    showOpenFailure(fileName, detail) {
      void dialog.showMessageBox(window, { type: 'error', message: said.openFailure(fileName), detail });
    },
    showCrashLoop() {
      dialog.showErrorBox(said.crashLoopTitle, said.crashLoopMessage);
    },
  };
}
