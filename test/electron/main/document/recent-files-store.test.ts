// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPendingWork } from '../../../../electron/main/pending-work.ts';
import { app, resetElectronMock } from '../../electron-mock.ts';

vi.mock('electron', () => import('../../electron-mock.ts'));

const { loadRecentFiles } = await import('../../../../electron/main/document/recent-files-store.ts');

let base: string;
let listPath: string;

beforeEach(async () => {
  resetElectronMock();
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-recent-'));
  listPath = path.join(base, 'recent-files.json');
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

async function load() {
  const pending = createPendingWork((error) => {
    throw error;
  });
  const onChange = vi.fn();
  const recent = await loadRecentFiles({ filePath: listPath, pending, onChange });
  const stored = async (): Promise<unknown> => {
    await pending.settled();
    return JSON.parse(await fs.readFile(listPath, 'utf8'));
  };
  return { recent, onChange, stored };
}

describe('loadRecentFiles()', () => {
  it('starts empty when nothing was kept, and from the kept list (junk dropped) when something was', async () => {
    expect((await load()).recent.list()).toEqual([]);
    await fs.writeFile(listPath, JSON.stringify(['/topics/a.cwtopic', 'relative.cwtopic', '/topics/b.cwtopic']));
    const { recent } = await load();
    expect(recent.list()).toEqual(['/topics/a.cwtopic', '/topics/b.cwtopic']);
    expect(recent.includes('/topics/b.cwtopic')).toBe(true);
    expect(recent.includes('relative.cwtopic')).toBe(false);
  });

  it('starts empty when the kept file is not JSON', async () => {
    await fs.writeFile(listPath, '["/topics/a.cwtopic"');
    expect((await load()).recent.list()).toEqual([]);
  });

  it('puts a remembered file first, tells the system list and the menu, and keeps the list on disk', async () => {
    await fs.writeFile(listPath, JSON.stringify(['/topics/a.cwtopic', '/topics/b.cwtopic']));
    const { recent, onChange, stored } = await load();
    recent.remember('/topics/b.cwtopic');
    expect(recent.list()).toEqual(['/topics/b.cwtopic', '/topics/a.cwtopic']);
    expect(app.addRecentDocument).toHaveBeenCalledWith('/topics/b.cwtopic');
    expect(onChange).toHaveBeenCalledOnce();
    expect(await stored()).toEqual(['/topics/b.cwtopic', '/topics/a.cwtopic']);
  });

  it('forgets one file without touching the system list', async () => {
    await fs.writeFile(listPath, JSON.stringify(['/topics/a.cwtopic', '/topics/b.cwtopic']));
    const { recent, onChange, stored } = await load();
    recent.forget('/topics/a.cwtopic');
    expect(recent.list()).toEqual(['/topics/b.cwtopic']);
    expect(app.addRecentDocument).not.toHaveBeenCalled();
    expect(app.clearRecentDocuments).not.toHaveBeenCalled();
    expect(onChange).toHaveBeenCalledOnce();
    expect(await stored()).toEqual(['/topics/b.cwtopic']);
  });

  it('clears the list, the system list with it', async () => {
    await fs.writeFile(listPath, JSON.stringify(['/topics/a.cwtopic']));
    const { recent, onChange, stored } = await load();
    recent.clear();
    expect(recent.list()).toEqual([]);
    expect(recent.includes('/topics/a.cwtopic')).toBe(false);
    expect(app.clearRecentDocuments).toHaveBeenCalledOnce();
    expect(onChange).toHaveBeenCalledOnce();
    expect(await stored()).toEqual([]);
  });
});
