// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { COMMAND_CHANNEL, DOCUMENT_CHANNEL } from '../../../../electron/contract/ipc-contract.ts';
import type { IncomingDocument } from '../../../../electron/contract/ipc-contract.ts';
import { createPendingWork } from '../../../../electron/main/pending-work.ts';
import { app, dialog, FakeBrowserWindow, resetElectronMock } from '../../electron-mock.ts';

vi.mock('electron', () => import('../../electron-mock.ts'));

const { openMainWindow } = await import('../../../../electron/main/window/window-life.ts');

let base: string;
let lines: string[];

beforeEach(async () => {
  resetElectronMock();
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-window-'));
  lines = [];
});

afterEach(async () => {
  vi.restoreAllMocks();
  await fs.rm(base, { recursive: true, force: true });
});

async function open() {
  const life = await openMainWindow({
    preloadPath: '/app/dist-electron/preload.cjs',
    windowStatePath: path.join(base, 'window-state.json'),
    pending: createPendingWork(() => undefined),
    log: (line) => lines.push(line),
  });
  const window = FakeBrowserWindow.created.at(-1);
  if (window === undefined) throw new Error('no window');
  return { life, window };
}

/** A topic as the window sees it, with its answers set by each test. */
function documentWith(hasUnsavedChanges: boolean) {
  return { hasUnsavedChanges: () => hasUnsavedChanges, discardChanges: vi.fn(async () => undefined), handBack: vi.fn() };
}

const file: IncomingDocument = { kind: 'file', text: '{}', fileName: 'heart.cwtopic' };
const answer = (response: number) =>
  dialog.showMessageBox.mockImplementationOnce(async () => ({ response, checkboxChecked: false }));

describe('openMainWindow()', () => {
  it('opens one window where it was last, maximised again if it was', async () => {
    await fs.writeFile(
      path.join(base, 'window-state.json'),
      JSON.stringify({ x: 100, y: 80, width: 1000, height: 700, isMaximized: true }),
    );
    const maximize = vi.spyOn(FakeBrowserWindow.prototype, 'maximize');
    const { window } = await open();
    expect(FakeBrowserWindow.created).toHaveLength(1);
    expect(window.options).toMatchObject({
      x: 100,
      y: 80,
      width: 1000,
      height: 700,
      webPreferences: { preload: '/app/dist-electron/preload.cjs' },
    });
    expect(maximize).toHaveBeenCalledOnce();
  });

  it('names the open file in the title, and the app alone for a topic never saved', async () => {
    const { life, window } = await open();
    expect(window.title).toBe('Chancewise');
    life.showFile(path.join(base, 'heart.cwtopic'));
    expect(window.title).toBe('heart.cwtopic — Chancewise');
    life.showFile(null);
    expect(window.title).toBe('Chancewise');
  });

  it('knows its own web contents from any other', async () => {
    const { life, window } = await open();
    expect(life.isOwnContents(window.webContents)).toBe(true);
    expect(life.isOwnContents(new FakeBrowserWindow({}).webContents)).toBe(false);
  });

  it('loads the app page, never a file or remote page', async () => {
    const { life, window } = await open();
    await life.load();
    expect(window.loaded).toEqual(['app://chancewise/index.html']);
  });
});

describe('the page becoming ready', () => {
  it('holds documents until the page is ready, runs start-up once, and drops commands sent before', async () => {
    const { life, window } = await open();
    life.sendCommand({ name: 'save' });
    life.deliver(file);
    expect(window.webContents.sent).toEqual([]);
    const startUp = vi.fn(async () => {
      life.deliver({ ...file, fileName: 'from-start-up.cwtopic' });
    });
    await life.rendererReady(startUp);
    expect(window.webContents.sent).toEqual([
      [DOCUMENT_CHANNEL, { ...file, fileName: 'from-start-up.cwtopic' }],
      [DOCUMENT_CHANNEL, file],
    ]);
    await life.rendererReady(startUp);
    expect(startUp).toHaveBeenCalledOnce();
    life.sendCommand({ name: 'save' });
    expect(window.webContents.sent.at(-1)).toEqual([COMMAND_CHANNEL, { name: 'save' }]);
  });
});

describe('closing', () => {
  it('closes without asking when nothing is unsaved', async () => {
    const { life, window } = await open();
    life.watch(documentWith(false));
    expect(window.emit('close')).toBe(false);
    expect(dialog.showMessageBox).not.toHaveBeenCalled();
  });

  it('with unsaved changes, asks, and on "Close without saving" drops the changes and closes', async () => {
    const { life, window } = await open();
    const document = documentWith(true);
    life.watch(document);
    answer(1);
    expect(window.emit('close')).toBe(true);
    await vi.waitFor(() => expect(window.close).toHaveBeenCalledOnce());
    expect(document.discardChanges).toHaveBeenCalledOnce();
    expect(window.destroyed).toBe(true);
  });

  it('on "Cancel" keeps the window and the changes', async () => {
    const { life, window } = await open();
    const document = documentWith(true);
    life.watch(document);
    answer(2);
    expect(window.emit('close')).toBe(true);
    await vi.waitFor(() => expect(dialog.showMessageBox).toHaveBeenCalledOnce());
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window.close).not.toHaveBeenCalled();
    expect(document.discardChanges).not.toHaveBeenCalled();
  });

  it('on "Save…", asks the page to save and closes once the save has finished', async () => {
    const { life, window } = await open();
    life.watch(documentWith(true));
    await life.rendererReady(async () => undefined);
    answer(0);
    window.emit('close');
    await vi.waitFor(() => expect(window.webContents.sent).toEqual([[COMMAND_CHANNEL, { name: 'save' }]]));
    expect(window.close).not.toHaveBeenCalled();
    life.saved();
    await vi.waitFor(() => expect(window.close).toHaveBeenCalledOnce());
    expect(window.destroyed).toBe(true);
  });

  it('stays open when the save dialog that closing waited for is cancelled', async () => {
    const { life, window } = await open();
    life.watch(documentWith(true));
    await life.rendererReady(async () => undefined);
    answer(0);
    window.emit('close');
    await vi.waitFor(() => expect(window.webContents.sent).toHaveLength(1));
    life.saveCancelled();
    life.saved();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window.close).not.toHaveBeenCalled();
  });

  it('does not close after an ordinary save', async () => {
    const { life, window } = await open();
    life.watch(documentWith(true));
    life.saved();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window.close).not.toHaveBeenCalled();
  });
});

describe('the page crashing', () => {
  it('reloads the page, drops what waited, and has the topic handed back', async () => {
    const { life, window } = await open();
    const document = documentWith(true);
    life.watch(document);
    await life.load();
    life.deliver(file);
    await life.rendererReady(async () => undefined);
    window.webContents.sent.length = 0;
    window.webContents.emit('render-process-gone', { reason: 'crashed', exitCode: 139 });
    expect(document.handBack).toHaveBeenCalledOnce();
    expect(window.loaded).toEqual(['app://chancewise/index.html', 'app://chancewise/index.html']);
    // Until the reloaded page says it is ready, nothing is sent to it.
    life.deliver(file);
    expect(window.webContents.sent).toEqual([]);
    expect(lines).toEqual(['renderer gone (crashed, exit code 139): reload']);
  });

  it('ignores a clean exit', async () => {
    const { life, window } = await open();
    const document = documentWith(true);
    life.watch(document);
    window.webContents.emit('render-process-gone', { reason: 'clean-exit', exitCode: 0 });
    expect(document.handBack).not.toHaveBeenCalled();
    expect(window.loaded).toEqual([]);
  });

  it('gives up at the third crash within a minute: says so, quits, and closes without asking', async () => {
    const { life, window } = await open();
    const document = documentWith(true);
    life.watch(document);
    for (let crash = 0; crash < 3; crash += 1)
      window.webContents.emit('render-process-gone', { reason: 'crashed', exitCode: 139 });
    expect(document.handBack).toHaveBeenCalledTimes(2);
    expect(dialog.showErrorBox).toHaveBeenCalledOnce();
    expect(app.quit).toHaveBeenCalledOnce();
    expect(window.emit('close')).toBe(false);
    expect(dialog.showMessageBox).not.toHaveBeenCalled();
  });
});
