import path from 'node:path';
import { app, Menu, shell } from 'electron';
import type { WebContents } from 'electron';
import { buildMenuTemplate } from './application-menu.ts';
import { createDocumentSession } from './document/document-session.ts';
import { exportHandoutPdf, openHandoutForPrinting } from './document/handout-output.ts';
import { loadRecentFiles } from './document/recent-files-store.ts';
import type { ShellActions } from './ipc/ipc-handlers.ts';
import { createPendingWork } from './pending-work.ts';
import { findRecoverySnapshot } from './snapshot/find-recovery-snapshot.ts';
import { loadSnapshotKey } from './snapshot/snapshot-key.ts';
import { shellMessagesEn } from './messages/en.ts';
import { createSnapshotStore } from './snapshot/snapshot-store.ts';
import { openMainWindow } from './window/window-life.ts';

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
  /** Resolves once pending writes (snapshots, window state, the recent list) have finished. */
  flush(): Promise<void>;
  /** Load the app page into the window (after the IPC handlers know the controller). */
  load(): Promise<void>;
}

/**
 * Start the shell: read remembered state, open the main window, and join its three parts
 * (the recent files, the window's life, the document session) with the menu and the IPC
 * actions. Call `load` next.
 */
export async function startShellController(settings: ShellControllerSettings): Promise<ShellController> {
  const { log, userDataPath } = settings;
  const pending = createPendingWork((error) => {
    log(`background write failed: ${error instanceof Error ? error.message : String(error)}`);
  });
  const snapshotKey = await loadSnapshotKey(userDataPath);
  const snapshots = createSnapshotStore({ folder: path.join(userDataPath, 'snapshots'), key: snapshotKey });

  const rebuildMenu = (): void => {
    const template = buildMenuTemplate({
      platform: process.platform,
      recentFiles: recentFiles.list(),
      sendCommand: (command) => {
        window.sendCommand(command);
      },
      clearRecentFiles: () => {
        recentFiles.clear();
      },
      showAbout: () => {
        app.showAboutPanel();
      },
    });
    Menu.setApplicationMenu(Menu.buildFromTemplate(template));
  };

  const recentFiles = await loadRecentFiles({
    filePath: path.join(userDataPath, 'recent-files.json'),
    pending,
    onChange: rebuildMenu,
  });
  const recovery = await findRecoverySnapshot(snapshots);
  const window = await openMainWindow({
    preloadPath: path.join(settings.appPath, 'dist-electron', 'preload.cjs'),
    windowStatePath: path.join(userDataPath, 'window-state.json'),
    pending,
    log,
  });
  const { dialogs } = window;
  const session = createDocumentSession({
    window,
    dialogs,
    snapshots,
    recentFiles,
    pending,
    recovery,
    launchFiles: settings.launchFiles,
    documentsFolder: () => app.getPath('documents'),
    log,
  });
  window.watch(session);

  const actions: ShellActions<WebContents> = {
    async rendererReady() {
      await window.rendererReady(() => session.start());
      return null;
    },
    newDocument: () => session.newDocument(),
    openDocument: () => session.openDocument(),
    openRecentDocument: (_sender, recentPath) => session.openRecentDocument(recentPath),
    saveDocument: (_sender, text) => session.saveDocument(text),
    saveDocumentAs: (_sender, text) => session.saveDocumentAs(text),
    saveSnapshot: (_sender, snapshot) => session.saveSnapshot(snapshot),
    exportHandoutPdf: (_sender, request) => exportHandoutPdf(request, dialogs, app.getPath('documents')),
    printHandout: (_sender, request) =>
      openHandoutForPrinting(request, shell, path.join(app.getPath('temp'), 'chancewise-print')),
  };

  rebuildMenu();
  app.setAboutPanelOptions({
    applicationName: 'Chancewise',
    applicationVersion: app.getVersion(),
    credits: shellMessagesEn.aboutCredits,
  });

  return {
    load: () => window.load(),
    actions,
    isOwnContents: window.isOwnContents,
    openFromSystem: session.openFromSystem,
    focus: () => {
      window.focus();
    },
    flush: () => pending.settled(),
  };
}
