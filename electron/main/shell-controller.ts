import path from 'node:path';
import { app, BrowserWindow, Menu, screen } from 'electron';
import type { WebContents } from 'electron';
import { APP_ENTRY_URL } from './web/app-origin.ts';
import { buildMenuTemplate } from './application-menu.ts';
import { writeFileAtomic } from './files/atomic-write.ts';
import type { ValidSnapshotCandidate } from './snapshot/choose-recovery-snapshot.ts';
import { respondToRendererGone } from './window/crash-recovery.ts';
import { findRecoverySnapshot, modificationTime } from './snapshot/find-recovery-snapshot.ts';
import { COMMAND_CHANNEL, DOCUMENT_CHANNEL } from '../contract/ipc-contract.ts';
import type {
  ExportedHandout,
  HandoutPdfRequest,
  IncomingDocument,
  OpenedDocument,
  PrintOutcome,
  SavedDocument,
  ShellCommand,
  SnapshotRequest,
  SnapshotSaved,
} from '../contract/ipc-contract.ts';
import type { ShellActions } from './ipc/ipc-handlers.ts';
import { readJsonFile, writeJsonFile } from './files/json-file.ts';
import { fileLabel } from './log/log-redaction.ts';
import { createPendingWork } from './pending-work.ts';
import { isTopicFileText, readTopicDocument } from './document/read-topic-document.ts';
import { addRecentFile, parseRecentFiles } from './document/recent-files.ts';
import { saveWithBackup } from './files/save-with-backup.ts';
import { createShellDialogs } from './window/shell-dialogs.ts';
import { ShellFailure } from './ipc/shell-messages.ts';
import { loadSnapshotKey } from './snapshot/snapshot-key.ts';
import { createSnapshotStore } from './snapshot/snapshot-store.ts';
import { createMainWindowOptions } from './window/window-options.ts';
import { fitWindowToDisplays } from './window/window-state.ts';
import { loadWindowState, rememberWindowState } from './window/window-state-file.ts';

/** What the controller is started with. */
export interface ShellControllerSettings {
  /** The folder holding package.json, dist/ and dist-electron/ (or app.asar). */
  readonly appPath: string;
  readonly userDataPath: string;
  /** Topic files asked for at launch (command line, or the system before the app was ready). */
  readonly launchFiles: readonly string[];
  readonly log: (line: string) => void;
}

/** The running shell: its one window, the open topic, and the actions behind every IPC channel. */
export interface ShellController {
  readonly actions: ShellActions<WebContents>;
  isOwnContents(contents: unknown): contents is WebContents;
  /** Open a topic file the system handed over (a second launch, a file opened from the desktop). */
  openFromSystem(filePath: string): void;
  /** Bring the window to the front (a second launch). */
  focus(): void;
  /** Resolves once pending writes (snapshots, window state) have finished. */
  flush(): Promise<void>;
  /** Load the app page into the window (after the IPC handlers know the controller). */
  load(): Promise<void>;
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

/** Start the shell: read remembered state, build the menu, create the main window (call `load` next). */
export async function startShellController(settings: ShellControllerSettings): Promise<ShellController> {
  const { log } = settings;
  const pending = createPendingWork((error) => {
    log(`background write failed: ${error instanceof Error ? error.message : String(error)}`);
  });
  const windowStatePath = path.join(settings.userDataPath, 'window-state.json');
  const recentFilesPath = path.join(settings.userDataPath, 'recent-files.json');
  const snapshotKey = await loadSnapshotKey(settings.userDataPath);
  const snapshots = createSnapshotStore({ folder: path.join(settings.userDataPath, 'snapshots'), key: snapshotKey });
  const preloadPath = path.join(settings.appPath, 'dist-electron', 'preload.cjs');

  let recentFiles = parseRecentFiles(await readJsonFile(recentFilesPath));
  const topic: OpenTopic = { filePath: null, lastSavedAt: null, lastSnapshot: null };
  const outbox: IncomingDocument[] = [];
  const crashTimes: number[] = [];
  let rendererReady = false;
  let startupDone = false;
  let closeConfirmed = false;
  let closeAfterSave = false;
  let saving: Promise<unknown> = Promise.resolve();

  const recovery = await findRecoverySnapshot(snapshots);
  const state = await loadWindowState(windowStatePath);
  const workAreas = [screen.getPrimaryDisplay(), ...screen.getAllDisplays()].map((display) => display.workArea);
  const bounds = fitWindowToDisplays(state, workAreas);
  const window = new BrowserWindow(createMainWindowOptions({ preloadPath, bounds, devTools: !app.isPackaged }));
  if (state?.isMaximized === true) window.maximize();
  const dialogs = createShellDialogs(window);
  rememberWindowState(window, windowStatePath, pending);

  const isOwnContents = (contents: unknown): contents is WebContents =>
    !window.isDestroyed() && contents === window.webContents;

  const updateTitle = (): void => {
    if (window.isDestroyed()) return;
    const name = fileNameOf(topic.filePath);
    window.setTitle(name === null ? 'Chancewise' : `${name} — Chancewise`);
    if (topic.filePath !== null && process.platform === 'darwin') window.setRepresentedFilename(topic.filePath);
  };

  /** The macOS title-bar dot for unsaved changes (no such thing elsewhere). */
  const markEdited = (edited: boolean): void => {
    if (process.platform === 'darwin' && !window.isDestroyed()) window.setDocumentEdited(edited);
  };

  const sendCommand = (command: ShellCommand): void => {
    if (!window.isDestroyed() && rendererReady) window.webContents.send(COMMAND_CHANNEL, command);
  };

  const deliver = (document: IncomingDocument): void => {
    if (!window.isDestroyed() && rendererReady) window.webContents.send(DOCUMENT_CHANNEL, document);
    else outbox.push(document);
  };

  const rebuildMenu = (): void => {
    const template = buildMenuTemplate({
      platform: process.platform,
      recentFiles,
      sendCommand,
      clearRecentFiles: () => {
        recentFiles = [];
        app.clearRecentDocuments();
        void pending.track(writeJsonFile(recentFilesPath, recentFiles));
        rebuildMenu();
      },
      showAbout: () => {
        app.showAboutPanel();
      },
    });
    Menu.setApplicationMenu(Menu.buildFromTemplate(template));
  };

  const rememberRecent = (filePath: string): void => {
    recentFiles = addRecentFile(recentFiles, filePath);
    app.addRecentDocument(filePath);
    void pending.track(writeJsonFile(recentFilesPath, recentFiles));
    rebuildMenu();
  };

  const takeOn = async (filePath: string): Promise<OpenedDocument> => {
    const document = await readTopicDocument(filePath);
    topic.filePath = filePath;
    topic.lastSavedAt = document.modifiedAt;
    topic.lastSnapshot = null;
    await snapshots.clear();
    rememberRecent(filePath);
    updateTitle();
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
          if (opened !== null) deliver({ kind: 'file', text: opened.text, fileName: opened.fileName });
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
      rememberRecent(filePath);
      updateTitle();
      markEdited(false);
      if (closeAfterSave) {
        closeAfterSave = false;
        closeConfirmed = true;
        setImmediate(() => {
          if (!window.isDestroyed()) window.close();
        });
      }
      return { fileName: path.basename(filePath), savedAt: topic.lastSavedAt };
    });
    saving = run.catch(() => undefined);
    return run;
  };

  const saveAs = async (text: string): Promise<SavedDocument | null> => {
    if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
    const filePath = await dialogs.chooseTopicSavePath(topic.filePath ?? path.join(app.getPath('documents'), 'topic.cwtopic'));
    if (filePath === null) {
      closeAfterSave = false;
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

  const runStartup = async (): Promise<void> => {
    if (recovery !== null && (await offerRecovery(recovery))) {
      const { record } = recovery;
      const savePath = savePathAfterRestore(record.documentPath);
      topic.filePath = savePath;
      topic.lastSavedAt = savePath === null ? null : recovery.documentSavedAt;
      topic.lastSnapshot = { content: record.content, keepPatient: record.keepsPatient, hasUnsavedChanges: true, savedAt: record.savedAt };
      updateTitle();
      deliver({ kind: 'snapshot', content: record.content, reason: 'unexpected-exit', fileName: fileNameOf(savePath) });
      return;
    }
    if (recovery !== null) await snapshots.clear();
    const first = settings.launchFiles[0];
    if (first !== undefined) openFromSystem(first);
  };

  const actions: ShellActions<WebContents> = {
    async rendererReady() {
      rendererReady = true;
      if (!startupDone) {
        startupDone = true;
        await runStartup();
      }
      for (const document of outbox.splice(0)) deliver(document);
      return null;
    },
    async newDocument() {
      topic.filePath = null;
      topic.lastSavedAt = null;
      topic.lastSnapshot = null;
      await snapshots.clear();
      updateTitle();
      markEdited(false);
      return null;
    },
    async openDocument() {
      const chosen = await dialogs.chooseTopicToOpen(topic.filePath);
      return chosen === null ? null : takeOn(chosen);
    },
    async openRecentDocument(_sender, recentPath) {
      if (!recentFiles.includes(recentPath)) throw new ShellFailure('not-in-recent-list');
      try {
        return await takeOn(recentPath);
      } catch (error) {
        if (error instanceof ShellFailure && error.code === 'read-failed') {
          recentFiles = recentFiles.filter((item) => item !== recentPath);
          void pending.track(writeJsonFile(recentFilesPath, recentFiles));
          rebuildMenu();
        }
        throw error;
      }
    },
    async saveDocument(_sender, text) {
      if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
      if (topic.filePath === null) return saveAs(text);
      return writeDocument(topic.filePath, text);
    },
    saveDocumentAs: (_sender, text) => saveAs(text),
    async saveSnapshot(_sender, snapshot): Promise<SnapshotSaved> {
      const savedAt = Date.now();
      topic.lastSnapshot = { ...snapshot, savedAt };
      markEdited(snapshot.hasUnsavedChanges);
      if (snapshot.hasUnsavedChanges) {
        await pending.track(
          snapshots.write({ content: snapshot.content, keepPatient: snapshot.keepPatient, documentPath: topic.filePath, savedAt }),
        );
      } else {
        await pending.track(snapshots.clear());
      }
      return { savedAt };
    },
    async exportHandoutPdf(_sender, request: HandoutPdfRequest): Promise<ExportedHandout | null> {
      const name = request.suggestedName.toLowerCase().endsWith('.pdf') ? request.suggestedName : `${request.suggestedName}.pdf`;
      const target = await dialogs.chooseHandoutSavePath(path.join(app.getPath('documents'), name));
      if (target === null) return null;
      try {
        await writeFileAtomic(target, request.bytes);
      } catch (error) {
        throw new ShellFailure('write-failed', error instanceof Error ? error.message : undefined);
      }
      return { fileName: path.basename(target) };
    },
    printHandout(sender): Promise<PrintOutcome> {
      return new Promise((resolve, reject) => {
        sender.print({ printBackground: true }, (success, failureReason) => {
          if (success) resolve({ printed: true });
          else if (failureReason === 'cancelled' || failureReason === 'Print job canceled') resolve({ printed: false });
          else reject(new ShellFailure('print-failed', failureReason));
        });
      });
    },
  };

  window.on('page-title-updated', (event) => {
    event.preventDefault();
  });
  window.once('ready-to-show', () => {
    window.show();
  });

  window.on('close', (event) => {
    if (closeConfirmed || topic.lastSnapshot?.hasUnsavedChanges !== true) return;
    event.preventDefault();
    void dialogs.chooseOnClose().then(async (choice) => {
      if (choice === 'save') {
        closeAfterSave = true;
        sendCommand({ name: 'save' });
      } else if (choice === 'discard') {
        closeConfirmed = true;
        await snapshots.clear();
        if (!window.isDestroyed()) window.close();
      }
    });
  });

  window.webContents.on('render-process-gone', (_event, details) => {
    const now = Date.now();
    const response = respondToRendererGone(details.reason, crashTimes, now);
    log(`renderer gone (${details.reason}, exit code ${details.exitCode}): ${response}`);
    if (response === 'ignore') return;
    crashTimes.push(now);
    rendererReady = false;
    if (response === 'give-up') {
      dialogs.showCrashLoop();
      closeConfirmed = true;
      app.quit();
      return;
    }
    outbox.length = 0;
    const last = topic.lastSnapshot;
    if (last !== null) {
      outbox.push({ kind: 'snapshot', content: last.content, reason: 'renderer-crashed', fileName: fileNameOf(topic.filePath) });
    } else if (topic.filePath !== null) {
      const filePath = topic.filePath;
      void readTopicDocument(filePath).then(
        (document) => {
          deliver({ kind: 'file', text: document.text, fileName: path.basename(filePath) });
        },
        () => undefined,
      );
    }
    window.loadURL(APP_ENTRY_URL).catch((error: unknown) => {
      log(`reload after the crash failed: ${error instanceof Error ? error.message : String(error)}`);
    });
  });

  window.webContents.on('unresponsive', () => {
    log('renderer unresponsive');
  });

  rebuildMenu();
  updateTitle();
  app.setAboutPanelOptions({
    applicationName: 'Chancewise',
    applicationVersion: app.getVersion(),
    credits: 'Absolute risks, icon arrays and a one-page handout, offline.',
  });

  return {
    load: () => window.loadURL(APP_ENTRY_URL),
    actions,
    isOwnContents,
    openFromSystem,
    focus() {
      if (window.isDestroyed()) return;
      if (window.isMinimized()) window.restore();
      window.show();
      window.focus();
    },
    flush: () => pending.settled(),
  };
}
