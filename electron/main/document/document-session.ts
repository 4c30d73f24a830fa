import path from 'node:path';
import type { OpenedDocument, SavedDocument, SnapshotRequest, SnapshotSaved } from '../../contract/ipc-contract.ts';
import { saveWithBackup } from '../files/save-with-backup.ts';
import { ShellFailure } from '../ipc/shell-failure.ts';
import { fileLabel } from '../log/log-redaction.ts';
import type { PendingWork } from '../pending-work.ts';
import type { ValidSnapshotCandidate } from '../snapshot/choose-recovery-snapshot.ts';
import { modificationTime } from '../snapshot/find-recovery-snapshot.ts';
import type { SnapshotStore } from '../snapshot/snapshot-store.ts';
import type { ShellDialogs } from '../window/shell-dialogs.ts';
import type { DocumentWindow, WindowDocument } from '../window/window-life.ts';
import { isTopicFileText, readTopicDocument } from './read-topic-document.ts';
import type { RecentFiles } from './recent-files-store.ts';

/** What a document session works with. */
export interface DocumentSessionSettings {
  readonly window: DocumentWindow;
  readonly dialogs: ShellDialogs;
  readonly snapshots: SnapshotStore;
  readonly recentFiles: RecentFiles;
  readonly pending: PendingWork;
  /** The snapshot an unexpected exit left behind, found at start-up, or null. */
  readonly recovery: ValidSnapshotCandidate | null;
  /** Topic files asked for at launch; the first is opened unless a snapshot is restored. */
  readonly launchFiles: readonly string[];
  /** The folder the save dialog starts in for a topic never saved. */
  readonly documentsFolder: () => string;
  readonly log: (line: string) => void;
}

/**
 * The one open topic: which file it belongs to, its last snapshot, and every way it is
 * opened, saved and restored. Saves run one after another, never at once.
 */
export interface DocumentSession extends WindowDocument {
  /** Start-up, once the page is ready: offer a left-behind snapshot, else open the launch file. */
  start(): Promise<void>;
  newDocument(): Promise<null>;
  openDocument(): Promise<OpenedDocument | null>;
  /** Open a file from the recent list (and only from it); one that cannot be read leaves the list. */
  openRecentDocument(recentPath: string): Promise<OpenedDocument>;
  saveDocument(text: string): Promise<SavedDocument | null>;
  saveDocumentAs(text: string): Promise<SavedDocument | null>;
  saveSnapshot(snapshot: SnapshotRequest): Promise<SnapshotSaved>;
  /** Open a topic file the system handed over, asking first if that would lose unsaved changes. */
  openFromSystem(filePath: string): void;
}

interface OpenTopic {
  filePath: string | null;
  /** The file's modification time after the last open or save. */
  lastSavedAt: number | null;
  lastSnapshot: (SnapshotRequest & { readonly savedAt: number }) | null;
}

function fileNameOf(filePath: string | null): string | null {
  return filePath === null ? null : path.basename(filePath);
}

/** A session with no topic open yet. */
export function createDocumentSession(settings: DocumentSessionSettings): DocumentSession {
  const { window, dialogs, snapshots, recentFiles, pending, recovery, log } = settings;
  const topic: OpenTopic = { filePath: null, lastSavedAt: null, lastSnapshot: null };
  let saving: Promise<unknown> = Promise.resolve();

  const takeOn = async (filePath: string): Promise<OpenedDocument> => {
    const document = await readTopicDocument(filePath);
    topic.filePath = filePath;
    topic.lastSavedAt = document.modifiedAt;
    topic.lastSnapshot = null;
    await snapshots.clear();
    recentFiles.remember(filePath);
    window.showFile(topic.filePath);
    return { text: document.text, fileName: path.basename(filePath) };
  };

  const mayReplaceTopic = async (filePath: string): Promise<boolean> => {
    if (topic.lastSnapshot?.hasUnsavedChanges !== true || window.isDestroyed()) return true;
    return dialogs.confirmReplace(path.basename(filePath));
  };

  const openFromSystem = (filePath: string): void => {
    void mayReplaceTopic(filePath)
      .then((replace) => (replace ? takeOn(filePath) : null))
      .then(
        (opened) => {
          if (opened !== null) window.deliver({ kind: 'file', text: opened.text, fileName: opened.fileName });
        },
        (error: unknown) => {
          const message = error instanceof Error ? error.message : String(error);
          log(`could not open ${fileLabel(filePath)}: ${message}`);
          dialogs.showOpenFailure(path.basename(filePath), message);
        },
      );
  };

  const writeDocument = (filePath: string, text: string): Promise<SavedDocument> => {
    const run = saving.then(async () => {
      try {
        await saveWithBackup(filePath, text);
      } catch (error) {
        throw new ShellFailure('write-failed', error instanceof Error ? error.message : undefined);
      }
      topic.filePath = filePath;
      topic.lastSavedAt = (await modificationTime(filePath)) ?? Date.now();
      if (topic.lastSnapshot !== null) topic.lastSnapshot = { ...topic.lastSnapshot, hasUnsavedChanges: false };
      await snapshots.clear();
      recentFiles.remember(filePath);
      window.showFile(topic.filePath);
      window.markEdited(false);
      window.saved();
      return { fileName: path.basename(filePath), savedAt: topic.lastSavedAt };
    });
    saving = run.catch(() => undefined);
    return run;
  };

  const saveAs = async (text: string): Promise<SavedDocument | null> => {
    if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
    const filePath = await dialogs.chooseTopicSavePath(topic.filePath ?? path.join(settings.documentsFolder(), 'topic.cwtopic'));
    if (filePath === null) {
      window.saveCancelled();
      return null;
    }
    return writeDocument(filePath, text);
  };

  /**
   * The file a restored snapshot may be saved back to without a dialog: its topic's file only
   * when that is on the recent list (a file the person opened or saved), else none, so Save
   * asks. A snapshot never decides on its own where a plain Save writes.
   */
  const savePathAfterRestore = (documentPath: string | null): string | null =>
    documentPath !== null && recentFiles.includes(documentPath) ? documentPath : null;

  const offerRecovery = (candidate: ValidSnapshotCandidate): Promise<boolean> => {
    const launchFile = settings.launchFiles[0];
    const { documentPath } = candidate.record;
    return dialogs.confirmRecovery({
      savedAt: candidate.record.savedAt,
      topicPath: documentPath,
      asksWhereToSave: documentPath !== null && savePathAfterRestore(documentPath) === null,
      skippedFile: launchFile === undefined ? null : path.basename(launchFile),
    });
  };

  return {
    async start() {
      if (recovery !== null && (await offerRecovery(recovery))) {
        const { record } = recovery;
        const savePath = savePathAfterRestore(record.documentPath);
        topic.filePath = savePath;
        topic.lastSavedAt = savePath === null ? null : recovery.documentSavedAt;
        topic.lastSnapshot = {
          content: record.content,
          keepPatient: record.keepsPatient,
          hasUnsavedChanges: true,
          savedAt: record.savedAt,
        };
        window.showFile(topic.filePath);
        window.deliver({ kind: 'snapshot', content: record.content, reason: 'unexpected-exit', fileName: fileNameOf(savePath) });
        return;
      }
      if (recovery !== null) await snapshots.clear();
      const first = settings.launchFiles[0];
      if (first !== undefined) openFromSystem(first);
    },
    async newDocument() {
      topic.filePath = null;
      topic.lastSavedAt = null;
      topic.lastSnapshot = null;
      await snapshots.clear();
      window.showFile(topic.filePath);
      window.markEdited(false);
      return null;
    },
    async openDocument() {
      const chosen = await dialogs.chooseTopicToOpen(topic.filePath);
      return chosen === null ? null : takeOn(chosen);
    },
    async openRecentDocument(recentPath) {
      if (!recentFiles.includes(recentPath)) throw new ShellFailure('not-in-recent-list');
      try {
        return await takeOn(recentPath);
      } catch (error) {
        if (error instanceof ShellFailure && error.code === 'read-failed') recentFiles.forget(recentPath);
        throw error;
      }
    },
    async saveDocument(text) {
      if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
      if (topic.filePath === null) return saveAs(text);
      return writeDocument(topic.filePath, text);
    },
    saveDocumentAs: (text) => saveAs(text),
    async saveSnapshot(snapshot) {
      const savedAt = Date.now();
      topic.lastSnapshot = { ...snapshot, savedAt };
      window.markEdited(snapshot.hasUnsavedChanges);
      if (snapshot.hasUnsavedChanges) {
        await pending.track(
          snapshots.write({
            content: snapshot.content,
            keepPatient: snapshot.keepPatient,
            documentPath: topic.filePath,
            savedAt,
          }),
        );
      } else {
        await pending.track(snapshots.clear());
      }
      return { savedAt };
    },
    openFromSystem,
    hasUnsavedChanges: () => topic.lastSnapshot?.hasUnsavedChanges === true,
    discardChanges: () => snapshots.clear(),
    handBack() {
      const last = topic.lastSnapshot;
      if (last !== null) {
        window.deliver({
          kind: 'snapshot',
          content: last.content,
          reason: 'renderer-crashed',
          fileName: fileNameOf(topic.filePath),
        });
      } else if (topic.filePath !== null) {
        const filePath = topic.filePath;
        void readTopicDocument(filePath).then(
          (document) => {
            window.deliver({ kind: 'file', text: document.text, fileName: path.basename(filePath) });
          },
          () => undefined,
        );
      }
    },
  };
}
