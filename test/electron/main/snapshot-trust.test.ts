// @vitest-environment node
// A snapshot decides nothing on its own: one forged without the secret key is not offered, and
// after a restore a plain Save writes only where the person chose (a dialog, the recent list).
import { createHash } from 'node:crypto';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { loadSnapshotKey, SNAPSHOT_KEY_FILE } from '../../../electron/main/snapshot/snapshot-key.ts';
import { createSnapshotText } from '../../../electron/main/snapshot/snapshot-record.ts';
import { recoveryDetail } from '../../../electron/main/window/shell-dialogs.ts';
import { dialog, FakeBrowserWindow, resetElectronMock } from '../electron-mock.ts';

vi.mock('electron', () => import('../electron-mock.ts'));

const { startShellController } = await import('../../../electron/main/shell-controller.ts');

const demo = fileURLToPath(new URL('../../../assets/demo/01-kidney-stone.json', import.meta.url));
let base: string;
let userData: string;
let autostart: string;

beforeEach(async () => {
  resetElectronMock();
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-trust-'));
  userData = path.join(base, 'userData');
  autostart = path.join(base, 'autostart', 'evil.desktop');
  await fs.mkdir(path.join(userData, 'snapshots'), { recursive: true });
  await fs.mkdir(path.dirname(autostart));
  await fs.writeFile(autostart, '[Desktop Entry]\nExec=true\n');
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

async function start() {
  const controller = await startShellController({
    appPath: '/app',
    userDataPath: userData,
    launchFiles: [],
    log: () => undefined,
  });
  const window = FakeBrowserWindow.created.at(-1);
  if (window === undefined) throw new Error('no window');
  await controller.load();
  return { controller, window, contents: window.webContents as unknown as Electron.WebContents };
}

const plant = (name: string, text: string) => fs.writeFile(path.join(userData, 'snapshots', name), text);

/** A snapshot as the old format wrote it: a plain SHA-256 of the content, which anyone can compute. */
function unkeyedSnapshot(documentPath: string): string {
  const content = { title: 'Forged' };
  const checksum = createHash('sha256').update(JSON.stringify(content)).digest('hex');
  return JSON.stringify({
    format: 'chancewise-snapshot',
    version: 1,
    savedAt: Date.now(),
    documentPath,
    keepsPatient: false,
    content,
    checksum,
  });
}

const acceptRestore = () => dialog.showMessageBox.mockImplementationOnce(async () => ({ response: 0, checkboxChecked: false }));

describe('snapshots found at start-up', () => {
  it('does not offer a snapshot with a plain checksum pointing at the autostart folder', async () => {
    await plant('snapshot-9999999999999-1.json', unkeyedSnapshot(autostart));
    acceptRestore();
    const { controller, window, contents } = await start();
    await controller.actions.rendererReady(contents);
    expect(dialog.showMessageBox).not.toHaveBeenCalled();
    expect(window.webContents.sent).toEqual([]);
  });

  it('does not offer a snapshot sealed with another key', async () => {
    const forged = createSnapshotText(
      { content: { title: 'Forged' }, keepPatient: false, documentPath: autostart, savedAt: Date.now() },
      Buffer.alloc(32, 1),
    );
    await plant('snapshot-9999999999999-1.json', forged);
    const { controller, contents } = await start();
    await controller.actions.rendererReady(contents);
    expect(dialog.showMessageBox).not.toHaveBeenCalled();
  });

  it('after restoring a genuine snapshot of a file not on the recent list, Save asks where and never writes that file', async () => {
    const genuine = createSnapshotText(
      { content: { title: 'Mine' }, keepPatient: false, documentPath: autostart, savedAt: Date.now() + 60_000 },
      await loadSnapshotKey(userData),
    );
    await plant('snapshot-9999999999999-1.json', genuine);
    acceptRestore();
    const { controller, contents, window } = await start();
    await controller.actions.rendererReady(contents);
    expect(window.webContents.sent).toEqual([
      ['chancewise:document', { kind: 'snapshot', content: { title: 'Mine' }, reason: 'unexpected-exit', fileName: null }],
    ]);
    const detail = (dialog.showMessageBox.mock.calls[0] as unknown[] | undefined)?.[1] as { detail: string };
    expect(detail.detail).toContain(autostart);
    expect(detail.detail).toContain('Save will ask where to save');
    const saved = await controller.actions.saveDocument(contents, await fs.readFile(demo, 'utf8'));
    expect(saved).toBeNull(); // the dialog was cancelled
    expect(dialog.showSaveDialog).toHaveBeenCalledOnce();
    expect(await fs.readFile(autostart, 'utf8')).toBe('[Desktop Entry]\nExec=true\n');
  });

  it('after restoring a snapshot of a file on the recent list, Save writes that file', async () => {
    const topic = path.join(base, 'kidney.cwtopic');
    const text = await fs.readFile(demo, 'utf8');
    await fs.writeFile(topic, text);
    await fs.writeFile(path.join(userData, 'recent-files.json'), JSON.stringify([topic]));
    const genuine = createSnapshotText(
      { content: { title: 'Mine' }, keepPatient: false, documentPath: topic, savedAt: Date.now() + 60_000 },
      await loadSnapshotKey(userData),
    );
    await plant('snapshot-9999999999999-1.json', genuine);
    acceptRestore();
    const { controller, contents, window } = await start();
    await controller.actions.rendererReady(contents);
    // Save only once the restored snapshot has reached the page (under load it can take a moment).
    await vi.waitFor(() => expect(window.webContents.sent.length).toBeGreaterThan(0));
    expect((await controller.actions.saveDocument(contents, text))?.fileName).toBe('kidney.cwtopic');
    expect(dialog.showSaveDialog).not.toHaveBeenCalled();
  });
});

describe('recoveryDetail()', () => {
  it('names the topic by its full path', () => {
    const detail = recoveryDetail({
      savedAt: 0,
      topicPath: '/home/a/Clinic/kidney.cwtopic',
      asksWhereToSave: false,
      skippedFile: null,
    });
    expect(detail).toContain('/home/a/Clinic/kidney.cwtopic');
    expect(recoveryDetail({ savedAt: 0, topicPath: null, asksWhereToSave: false, skippedFile: 'x.cwtopic' })).toContain(
      'an unsaved topic',
    );
  });
});

describe('loadSnapshotKey()', () => {
  it('keeps a 256-bit key in a file only its owner can read, and gives the same key next time', async () => {
    const key = await loadSnapshotKey(userData);
    expect(key.byteLength).toBe(32);
    if (process.platform !== 'win32') expect((await fs.stat(path.join(userData, SNAPSHOT_KEY_FILE))).mode & 0o777).toBe(0o600);
    expect(Buffer.from(await loadSnapshotKey(userData)).equals(Buffer.from(key))).toBe(true);
  });

  it.runIf(process.platform !== 'win32')('replaces a key others could read, and one reached through a link', async () => {
    const first = await loadSnapshotKey(userData);
    const keyPath = path.join(userData, SNAPSHOT_KEY_FILE);
    await fs.chmod(keyPath, 0o644);
    const second = await loadSnapshotKey(userData);
    expect(Buffer.from(second).equals(Buffer.from(first))).toBe(false);
    expect((await fs.stat(keyPath)).mode & 0o777).toBe(0o600);

    const planted = path.join(base, 'planted-key');
    await fs.writeFile(planted, `${'ab'.repeat(32)}\n`, { mode: 0o600 });
    await fs.rm(keyPath);
    await fs.symlink(planted, keyPath);
    const third = await loadSnapshotKey(userData);
    expect(Buffer.from(third).toString('hex')).not.toBe('ab'.repeat(32));
    expect(await fs.readFile(planted, 'utf8')).toBe(`${'ab'.repeat(32)}\n`);
    expect((await fs.lstat(keyPath)).isSymbolicLink()).toBe(false);
  });
});
