// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DOCUMENT_CHANNEL, COMMAND_CHANNEL } from '../../../electron/contract/ipc-contract.ts';
import { loadSnapshotKey } from '../../../electron/main/snapshot/snapshot-key.ts';
import { createSnapshotText } from '../../../electron/main/snapshot/snapshot-record.ts';
import { app, dialog, FakeBrowserWindow, resetElectronMock, shell } from '../electron-mock.ts';

vi.mock('electron', () => import('../electron-mock.ts'));

const { startShellController } = await import('../../../electron/main/shell-controller.ts');

const demo = fileURLToPath(new URL('../../../assets/demo/01-kidney-stone.json', import.meta.url));
let base: string;
let userData: string;

beforeEach(async () => {
  resetElectronMock();
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-shell-'));
  userData = path.join(base, 'userData');
  await fs.mkdir(userData);
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

async function start(launchFiles: string[] = []) {
  const controller = await startShellController({ appPath: '/app', userDataPath: userData, launchFiles, log: () => undefined });
  const window = FakeBrowserWindow.created.at(-1);
  if (window === undefined) throw new Error('no window');
  await controller.load();
  return { controller, window, contents: window.webContents as unknown as Electron.WebContents };
}

const draft = { title: 'Illustrative topic', patientName: 'Ann Example', patientReference: 'R-7' };

describe('startShellController()', () => {
  it('opens one hardened window on the app page, with the preload from the app folder', async () => {
    const { window } = await start();
    expect(FakeBrowserWindow.created).toHaveLength(1);
    expect(window.options).toMatchObject({
      width: 1200,
      height: 820,
      webPreferences: {
        preload: '/app/dist-electron/preload.cjs',
        sandbox: true,
        contextIsolation: true,
        nodeIntegration: false,
      },
    });
    expect(window.loaded).toEqual(['app://chancewise/index.html']);
  });

  it('knows its own web contents from any other', async () => {
    const { controller, contents } = await start();
    expect(controller.isOwnContents(contents)).toBe(true);
    expect(controller.isOwnContents({})).toBe(false);
  });

  it('hands the launch file to the renderer once it is ready', async () => {
    const { controller, window, contents } = await start([demo]);
    expect(window.webContents.sent).toEqual([]);
    await controller.actions.rendererReady(contents);
    await vi.waitFor(() => expect(window.webContents.sent).toHaveLength(1));
    expect(window.webContents.sent[0]).toEqual([
      DOCUMENT_CHANNEL,
      { kind: 'file', text: await fs.readFile(demo, 'utf8'), fileName: '01-kidney-stone.json' },
    ]);
    expect(window.title).toBe('01-kidney-stone.json — Chancewise');
  });

  it('after a renderer crash, reloads the page and restores the last snapshot in full', async () => {
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: true });
    // On disk the snapshot has no patient details ...
    const [name] = await fs.readdir(path.join(userData, 'snapshots'));
    expect(await fs.readFile(path.join(userData, 'snapshots', name ?? ''), 'utf8')).not.toContain('Ann Example');

    window.webContents.emit('render-process-gone', { reason: 'crashed', exitCode: 139 });
    expect(window.loaded).toEqual(['app://chancewise/index.html', 'app://chancewise/index.html']);
    expect(window.webContents.sent).toEqual([]);
    await controller.actions.rendererReady(contents);
    // ... but the restored topic loses nothing, patient details included (they never left memory).
    expect(window.webContents.sent).toEqual([
      [DOCUMENT_CHANNEL, { kind: 'snapshot', content: draft, reason: 'renderer-crashed', fileName: null }],
    ]);
  });

  it('stops reloading at the third crash within a minute and keeps the snapshot for the next start', async () => {
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: true });
    for (let crash = 0; crash < 3; crash += 1)
      window.webContents.emit('render-process-gone', { reason: 'crashed', exitCode: 139 });
    expect(window.loaded).toHaveLength(3);
    expect(dialog.showErrorBox).toHaveBeenCalledOnce();
    expect(await fs.readdir(path.join(userData, 'snapshots'))).toHaveLength(1);
  });

  it('offers the newest snapshot left by an unexpected exit, and restores it when accepted', async () => {
    await fs.mkdir(path.join(userData, 'snapshots'));
    const text = createSnapshotText(
      { content: { title: 'Left behind' }, keepPatient: false, documentPath: null, savedAt: 1_700_000_000_000 },
      await loadSnapshotKey(userData),
    );
    await fs.writeFile(path.join(userData, 'snapshots', 'snapshot-1700000000000-1.json'), text);
    dialog.showMessageBox.mockImplementationOnce(async () => ({ response: 0, checkboxChecked: false }));
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    expect(dialog.showMessageBox).toHaveBeenCalledOnce();
    expect(window.webContents.sent).toEqual([
      [DOCUMENT_CHANNEL, { kind: 'snapshot', content: { title: 'Left behind' }, reason: 'unexpected-exit', fileName: null }],
    ]);
  });

  it('discards the left-behind snapshot when the person declines', async () => {
    await fs.mkdir(path.join(userData, 'snapshots'));
    const text = createSnapshotText(
      { content: { title: 'Left behind' }, keepPatient: false, documentPath: null, savedAt: 5 },
      await loadSnapshotKey(userData),
    );
    await fs.writeFile(path.join(userData, 'snapshots', 'snapshot-5-1.json'), text);
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    expect(window.webContents.sent).toEqual([]);
    expect(await fs.readdir(path.join(userData, 'snapshots'))).toEqual([]);
  });

  it('saves through the save dialog, keeps a backup on the next save, and clears the snapshots', async () => {
    const { controller, contents } = await start();
    const target = path.join(base, 'heart');
    dialog.showSaveDialog.mockImplementation(async () => ({ canceled: false, filePath: target }));
    const text = await fs.readFile(demo, 'utf8');
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: true });
    const saved = await controller.actions.saveDocument(contents, text);
    expect(saved?.fileName).toBe('heart.cwtopic');
    expect(await fs.readFile(`${target}.cwtopic`, 'utf8')).toBe(text);
    expect(await fs.readdir(path.join(userData, 'snapshots'))).toEqual([]);
    await controller.actions.saveDocument(contents, text.replace('illustrative example', 'illustrative case'));
    expect(await fs.readFile(`${target}.cwtopic.bak`, 'utf8')).toBe(text);
    expect(dialog.showSaveDialog).toHaveBeenCalledOnce();
    await controller.flush();
    expect(JSON.parse(await fs.readFile(path.join(userData, 'recent-files.json'), 'utf8'))).toEqual([`${target}.cwtopic`]);
  });

  it('refuses to save text that is not a valid topic file', async () => {
    const { controller, contents } = await start();
    await expect(controller.actions.saveDocument(contents, '{"format":"chancewise-topic","version":2}')).rejects.toMatchObject({
      code: 'not-a-topic-file',
    });
    expect(dialog.showSaveDialog).not.toHaveBeenCalled();
  });

  it('opens only files from its own recent list', async () => {
    const { controller, contents } = await start();
    await expect(controller.actions.openRecentDocument(contents, '/etc/passwd')).rejects.toMatchObject({
      code: 'not-in-recent-list',
    });
    dialog.showOpenDialog.mockImplementationOnce(async () => ({ canceled: false, filePaths: [demo] }));
    expect((await controller.actions.openDocument(contents))?.fileName).toBe('01-kidney-stone.json');
    expect((await controller.actions.openRecentDocument(contents, demo))?.fileName).toBe('01-kidney-stone.json');
  });

  it('asks before closing with unsaved changes, and saves first when asked to', async () => {
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: true });
    dialog.showMessageBox.mockImplementationOnce(async () => ({ response: 0, checkboxChecked: false }));
    expect(window.emit('close')).toBe(true);
    await vi.waitFor(() => expect(window.webContents.sent).toEqual([[COMMAND_CHANNEL, { name: 'save' }]]));
  });

  it('closes without asking when nothing is unsaved', async () => {
    const { controller, window, contents } = await start();
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: false });
    expect(window.emit('close')).toBe(false);
    expect(dialog.showMessageBox).not.toHaveBeenCalled();
    await controller.flush();
    expect(JSON.parse(await fs.readFile(path.join(userData, 'window-state.json'), 'utf8'))).toEqual({
      x: 10,
      y: 20,
      width: 1000,
      height: 700,
      isMaximized: false,
    });
  });

  it('asks before a file from the system (a second launch) replaces a topic with unsaved changes', async () => {
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    await controller.actions.saveSnapshot(contents, { content: draft, keepPatient: false, hasUnsavedChanges: true });
    controller.openFromSystem(demo);
    await vi.waitFor(() => expect(dialog.showMessageBox).toHaveBeenCalledOnce());
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(window.webContents.sent).toEqual([]);
    dialog.showMessageBox.mockImplementationOnce(async () => ({ response: 0, checkboxChecked: false }));
    controller.openFromSystem(demo);
    await vi.waitFor(() => expect(window.webContents.sent.map(([channel]) => channel)).toEqual([DOCUMENT_CHANNEL]));
  });

  it('prints the handout itself: its PDF is opened in the system’s viewer from a private folder of the temporary files, never the app’s window', async () => {
    const { controller, window, contents } = await start();
    app.getPath.mockImplementation((name: string) => (name === 'temp' ? base : `/fake/${name}`));
    const bytes = new TextEncoder().encode('%PDF-1.7\n');
    expect(await controller.actions.printHandout(contents, { bytes, suggestedName: 'heart-handout.pdf' })).toEqual({
      fileName: 'heart-handout.pdf',
    });
    const target = path.join(base, 'chancewise-print', 'heart-handout.pdf');
    expect(shell.openPath).toHaveBeenCalledWith(target);
    expect(new Uint8Array(await fs.readFile(target))).toEqual(bytes);
    expect(window.webContents.print).not.toHaveBeenCalled();
    shell.openPath.mockResolvedValueOnce('no viewer');
    await expect(controller.actions.printHandout(contents, { bytes, suggestedName: 'heart-handout.pdf' })).rejects.toMatchObject({
      code: 'print-failed',
    });
    app.getPath.mockImplementation((name: string) => `/fake/${name}`);
  });
});
