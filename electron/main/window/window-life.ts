import path from 'node:path';
import { app, BrowserWindow, screen } from 'electron';
import type { WebContents } from 'electron';
import { COMMAND_CHANNEL, DOCUMENT_CHANNEL } from '../../contract/ipc-contract.ts';
import type { IncomingDocument, ShellCommand } from '../../contract/ipc-contract.ts';
import type { PendingWork } from '../pending-work.ts';
import { APP_ENTRY_URL } from '../web/app-origin.ts';
import { respondToRendererGone } from './crash-recovery.ts';
import { createShellDialogs } from './shell-dialogs.ts';
import type { ShellDialogs } from './shell-dialogs.ts';
import { createMainWindowOptions } from './window-options.ts';
import { fitWindowToDisplays } from './window-state.ts';
import { loadWindowState, rememberWindowState } from './window-state-file.ts';

/** What the main window is opened with. */
export interface MainWindowSettings {
  /** Absolute path of the built preload (dist-electron/preload.cjs). */
  readonly preloadPath: string;
  /** Where the window's place and size are remembered between runs. */
  readonly windowStatePath: string;
  readonly pending: PendingWork;
  readonly log: (line: string) => void;
}

/** What the window asks of the open topic when it closes or its page crashes. */
export interface WindowDocument {
  hasUnsavedChanges(): boolean;
  /** Closing without saving: forget the unsaved changes (their snapshots). */
  discardChanges(): Promise<void>;
  /** The page crashed and is loading again: hand the open topic back through `deliver`. */
  handBack(): void;
}

/** What the open topic may do to the window. */
export interface DocumentWindow {
  isDestroyed(): boolean;
  /** Name the open topic's file in the title (null: a topic never saved). */
  showFile(filePath: string | null): void;
  /** The macOS title-bar dot for unsaved changes (no such thing elsewhere). */
  markEdited(edited: boolean): void;
  /** Send a document to the page, or keep it until the page is ready. */
  deliver(document: IncomingDocument): void;
  /** A save finished: if closing waited for it, close now. */
  saved(): void;
  /** The save dialog was cancelled: closing no longer waits for a save. */
  saveCancelled(): void;
}

/** The main window from creation to close: the page's readiness, closing with unsaved changes, crashes. */
export interface WindowLife extends DocumentWindow {
  readonly dialogs: ShellDialogs;
  isOwnContents(contents: unknown): contents is WebContents;
  /** Send a menu command to the page (dropped while the page is not ready). */
  sendCommand(command: ShellCommand): void;
  /**
   * The page says it is ready: run `firstTime` on the first call only (start-up), then send
   * the documents that waited.
   */
  rendererReady(firstTime: () => Promise<void>): Promise<void>;
  /** From now on, ask about `document` when closing and hand it back after a crash. */
  watch(document: WindowDocument): void;
  /** Load the app page. */
  load(): Promise<void>;
  /** Bring the window to the front (a second launch). */
  focus(): void;
}

/** Open the main window where it was last (fitted to the displays there are now), still hidden until ready. */
export async function openMainWindow(settings: MainWindowSettings): Promise<WindowLife> {
  const { log } = settings;
  const state = await loadWindowState(settings.windowStatePath);
  const workAreas = [screen.getPrimaryDisplay(), ...screen.getAllDisplays()].map((display) => display.workArea);
  const bounds = fitWindowToDisplays(state, workAreas);
  const window = new BrowserWindow(
    createMainWindowOptions({ preloadPath: settings.preloadPath, bounds, devTools: !app.isPackaged }),
  );
  if (state?.isMaximized === true) window.maximize();
  const dialogs = createShellDialogs(window);
  rememberWindowState(window, settings.windowStatePath, settings.pending);

  const outbox: IncomingDocument[] = [];
  const crashTimes: number[] = [];
  let rendererReady = false;
  let startupDone = false;
  let closeConfirmed = false;
  let closeAfterSave = false;

  const sendCommand = (command: ShellCommand): void => {
    if (!window.isDestroyed() && rendererReady) window.webContents.send(COMMAND_CHANNEL, command);
  };

  const deliver = (document: IncomingDocument): void => {
    if (!window.isDestroyed() && rendererReady) window.webContents.send(DOCUMENT_CHANNEL, document);
    else outbox.push(document);
  };

  const showFile = (filePath: string | null): void => {
    if (window.isDestroyed()) return;
    window.setTitle(filePath === null ? 'Chancewise' : `${path.basename(filePath)} — Chancewise`);
    if (filePath !== null && process.platform === 'darwin') window.setRepresentedFilename(filePath);
  };

  const watch = (document: WindowDocument): void => {
    window.on('close', (event) => {
      if (closeConfirmed || !document.hasUnsavedChanges()) return;
      event.preventDefault();
      void dialogs.chooseOnClose().then(async (choice) => {
        if (choice === 'save') {
          closeAfterSave = true;
          sendCommand({ name: 'save' });
        } else if (choice === 'discard') {
          closeConfirmed = true;
          await document.discardChanges();
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
      document.handBack();
      window.loadURL(APP_ENTRY_URL).catch((error: unknown) => {
        log(`reload after the crash failed: ${error instanceof Error ? error.message : String(error)}`);
      });
    });
  };

  window.on('page-title-updated', (event) => {
    event.preventDefault();
  });
  window.once('ready-to-show', () => {
    window.show();
  });
  window.webContents.on('unresponsive', () => {
    log('renderer unresponsive');
  });
  showFile(null);

  return {
    dialogs,
    isDestroyed: () => window.isDestroyed(),
    isOwnContents: (contents: unknown): contents is WebContents => !window.isDestroyed() && contents === window.webContents,
    showFile,
    markEdited(edited) {
      if (process.platform === 'darwin' && !window.isDestroyed()) window.setDocumentEdited(edited);
    },
    sendCommand,
    deliver,
    async rendererReady(firstTime) {
      rendererReady = true;
      if (!startupDone) {
        startupDone = true;
        await firstTime();
      }
      for (const document of outbox.splice(0)) deliver(document);
    },
    saved() {
      if (!closeAfterSave) return;
      closeAfterSave = false;
      closeConfirmed = true;
      setImmediate(() => {
        if (!window.isDestroyed()) window.close();
      });
    },
    saveCancelled() {
      closeAfterSave = false;
    },
    watch,
    load: () => window.loadURL(APP_ENTRY_URL),
    focus() {
      if (window.isDestroyed()) return;
      if (window.isMinimized()) window.restore();
      window.show();
      window.focus();
    },
  };
}
