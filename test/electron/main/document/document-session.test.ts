// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { IncomingDocument } from '../../../../electron/contract/ipc-contract.ts';
import { createDocumentSession } from '../../../../electron/main/document/document-session.ts';
import type { RecentFiles } from '../../../../electron/main/document/recent-files-store.ts';
import { createPendingWork } from '../../../../electron/main/pending-work.ts';
import type { ValidSnapshotCandidate } from '../../../../electron/main/snapshot/choose-recovery-snapshot.ts';
import { loadSnapshotKey } from '../../../../electron/main/snapshot/snapshot-key.ts';
import { createSnapshotStore } from '../../../../electron/main/snapshot/snapshot-store.ts';
import type { ShellDialogs } from '../../../../electron/main/window/shell-dialogs.ts';

const demo = fileURLToPath(new URL('../../../../assets/demo/01-kidney-stone.json', import.meta.url));
let base: string;
let demoText: string;

beforeEach(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-session-'));
  demoText = await fs.readFile(demo, 'utf8');
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

/** The window as the session sees it: every call recorded. */
function fakeWindow() {
  const delivered: IncomingDocument[] = [];
  const titles: (string | null)[] = [];
  return {
    delivered,
    titles,
    isDestroyed: () => false,
    showFile: (filePath: string | null) => {
      titles.push(filePath);
    },
    markEdited: vi.fn(),
    deliver: (document: IncomingDocument) => {
      delivered.push(document);
    },
    saved: vi.fn(),
    saveCancelled: vi.fn(),
  };
}

/** Dialogs that answer as each test says; by default every question is declined or cancelled. */
function fakeDialogs() {
  return {
    chooseTopicToOpen: vi.fn(async (_near: string | null): Promise<string | null> => null),
    chooseTopicSavePath: vi.fn(async (_suggested: string): Promise<string | null> => null),
    chooseHandoutSavePath: vi.fn(async () => null),
    confirmRecovery: vi.fn(async () => false),
    confirmReplace: vi.fn(async () => false),
    chooseOnClose: vi.fn(async () => 'cancel' as const),
    showOpenFailure: vi.fn(),
    showCrashLoop: vi.fn(),
  } satisfies ShellDialogs;
}

/** A recent list in memory. */
function fakeRecentFiles(initial: string[] = []): RecentFiles & { files: string[] } {
  const recent = {
    files: [...initial],
    list: () => recent.files,
    includes: (filePath: string) => recent.files.includes(filePath),
    remember: (filePath: string) => {
      recent.files = [filePath, ...recent.files.filter((item) => item !== filePath)];
    },
    forget: (filePath: string) => {
      recent.files = recent.files.filter((item) => item !== filePath);
    },
    clear: () => {
      recent.files = [];
    },
  };
  return recent;
}

async function session(options: { recent?: string[]; recovery?: ValidSnapshotCandidate | null; launchFiles?: string[] } = {}) {
  const window = fakeWindow();
  const dialogs = fakeDialogs();
  const recentFiles = fakeRecentFiles(options.recent);
  const snapshotFolder = path.join(base, 'snapshots');
  const snapshots = createSnapshotStore({ folder: snapshotFolder, key: await loadSnapshotKey(base) });
  const created = createDocumentSession({
    window,
    dialogs,
    snapshots,
    recentFiles,
    pending: createPendingWork((error) => {
      throw error;
    }),
    recovery: options.recovery ?? null,
    launchFiles: options.launchFiles ?? [],
    documentsFolder: () => path.join(base, 'Documents'),
    log: () => undefined,
  });
  const snapshotFiles = async () => (await fs.readdir(snapshotFolder).catch(() => [])).length;
  return { session: created, window, dialogs, recentFiles, snapshots, snapshotFiles };
}

const draft = { title: 'Illustrative topic', patientName: 'Ann Example' };

function leftBehind(documentPath: string | null): ValidSnapshotCandidate {
  return {
    name: 'snapshot-1700000000000-1.json',
    documentSavedAt: 1_600_000_000_000,
    record: {
      format: 'chancewise-snapshot',
      version: 2,
      savedAt: 1_700_000_000_000,
      documentPath,
      keepsPatient: false,
      content: draft,
      seal: '',
    },
  };
}

describe('opening', () => {
  it('opens the chosen file, names it in the title and puts it first on the recent list', async () => {
    const { session: open, window, dialogs, recentFiles } = await session();
    dialogs.chooseTopicToOpen.mockResolvedValueOnce(demo);
    expect(await open.openDocument()).toEqual({ text: demoText, fileName: '01-kidney-stone.json' });
    expect(window.titles).toEqual([demo]);
    expect(recentFiles.files).toEqual([demo]);
    // The next open dialog starts beside the open file.
    await open.openDocument();
    expect(dialogs.chooseTopicToOpen).toHaveBeenLastCalledWith(demo);
  });

  it('opens nothing when the dialog is cancelled', async () => {
    const { session: open, window } = await session();
    expect(await open.openDocument()).toBeNull();
    expect(window.titles).toEqual([]);
  });

  it('opens from the recent list only, and drops a listed file that cannot be read', async () => {
    const gone = path.join(base, 'gone.cwtopic');
    const { session: open, recentFiles } = await session({ recent: [gone, demo] });
    await expect(open.openRecentDocument('/etc/passwd')).rejects.toMatchObject({ code: 'not-in-recent-list' });
    await expect(open.openRecentDocument(gone)).rejects.toMatchObject({ code: 'read-failed' });
    expect(recentFiles.files).toEqual([demo]);
    expect((await open.openRecentDocument(demo)).fileName).toBe('01-kidney-stone.json');
  });

  it('asks before a file from the system replaces unsaved changes, and opens nothing when declined', async () => {
    const { session: open, window, dialogs } = await session();
    await open.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    open.openFromSystem(demo);
    await vi.waitFor(() => expect(dialogs.confirmReplace).toHaveBeenCalledWith('01-kidney-stone.json'));
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window.delivered).toEqual([]);
    dialogs.confirmReplace.mockResolvedValueOnce(true);
    open.openFromSystem(demo);
    await vi.waitFor(() =>
      expect(window.delivered).toEqual([{ kind: 'file', text: demoText, fileName: '01-kidney-stone.json' }]),
    );
  });

  it('tells the person when a file from the system cannot be opened', async () => {
    const { session: open, dialogs } = await session();
    open.openFromSystem(path.join(base, 'missing.cwtopic'));
    await vi.waitFor(() => expect(dialogs.showOpenFailure).toHaveBeenCalledOnce());
    expect(dialogs.showOpenFailure.mock.calls[0]?.[0]).toBe('missing.cwtopic');
  });
});

describe('saving', () => {
  it('asks where to save a topic never saved, starting in the documents folder', async () => {
    const { session: save, window, dialogs } = await session();
    expect(await save.saveDocument(demoText)).toBeNull();
    expect(dialogs.chooseTopicSavePath).toHaveBeenCalledWith(path.join(base, 'Documents', 'topic.cwtopic'));
    expect(window.saveCancelled).toHaveBeenCalledOnce();
    expect(window.saved).not.toHaveBeenCalled();
  });

  it('saves where chosen, then saves there again without asking, clearing the snapshots', async () => {
    const target = path.join(base, 'heart.cwtopic');
    const { session: save, window, dialogs, recentFiles, snapshotFiles } = await session();
    dialogs.chooseTopicSavePath.mockResolvedValueOnce(target);
    await save.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    expect(await snapshotFiles()).toBe(1);
    expect(save.hasUnsavedChanges()).toBe(true);
    const saved = await save.saveDocument(demoText);
    expect(saved?.fileName).toBe('heart.cwtopic');
    expect(saved?.savedAt).toBe((await fs.stat(target)).mtimeMs);
    expect(await fs.readFile(target, 'utf8')).toBe(demoText);
    expect(await snapshotFiles()).toBe(0);
    expect(save.hasUnsavedChanges()).toBe(false);
    expect(recentFiles.files).toEqual([target]);
    expect(window.titles).toEqual([target]);
    expect(window.markEdited).toHaveBeenLastCalledWith(false);
    expect(window.saved).toHaveBeenCalledOnce();
    await save.saveDocument(demoText.replace('illustrative example', 'illustrative case'));
    expect(dialogs.chooseTopicSavePath).toHaveBeenCalledOnce();
    expect(await fs.readFile(`${target}.bak`, 'utf8')).toBe(demoText);
  });

  it('runs saves one after another: the last one asked for is the one on disk', async () => {
    const target = path.join(base, 'heart.cwtopic');
    const { session: save, dialogs } = await session();
    dialogs.chooseTopicSavePath.mockResolvedValue(target);
    const second = demoText.replace('illustrative example', 'illustrative case');
    await Promise.all([save.saveDocumentAs(demoText), save.saveDocumentAs(second)]);
    expect(await fs.readFile(target, 'utf8')).toBe(second);
    expect(await fs.readFile(`${target}.bak`, 'utf8')).toBe(demoText);
  });

  it('refuses text that is not a topic file before any dialog', async () => {
    const { session: save, dialogs } = await session();
    await expect(save.saveDocument('{"format":"chancewise-topic","version":2}')).rejects.toMatchObject({
      code: 'not-a-topic-file',
    });
    await expect(save.saveDocumentAs('not json')).rejects.toMatchObject({ code: 'not-a-topic-file' });
    expect(dialogs.chooseTopicSavePath).not.toHaveBeenCalled();
  });

  it('reports a file that cannot be written as write-failed, and tells no one it was saved', async () => {
    const { session: save, window, dialogs } = await session();
    dialogs.chooseTopicSavePath.mockResolvedValueOnce(path.join(base, 'no-such-folder', 'heart.cwtopic'));
    await expect(save.saveDocument(demoText)).rejects.toMatchObject({ code: 'write-failed' });
    expect(window.saved).not.toHaveBeenCalled();
  });
});

describe('snapshots and a new topic', () => {
  it('keeps a snapshot only while there are unsaved changes, and marks the window edited to match', async () => {
    const { session: edit, window, snapshotFiles } = await session();
    await edit.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    expect(await snapshotFiles()).toBe(1);
    expect(window.markEdited).toHaveBeenLastCalledWith(true);
    await edit.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: false });
    expect(await snapshotFiles()).toBe(0);
    expect(window.markEdited).toHaveBeenLastCalledWith(false);
  });

  it('forgets the open file on a new topic, so the next save asks', async () => {
    const { session: edit, window, dialogs, snapshotFiles } = await session();
    dialogs.chooseTopicToOpen.mockResolvedValueOnce(demo);
    await edit.openDocument();
    await edit.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    expect(await edit.newDocument()).toBeNull();
    expect(window.titles.at(-1)).toBeNull();
    expect(await snapshotFiles()).toBe(0);
    expect(edit.hasUnsavedChanges()).toBe(false);
    await edit.saveDocument(demoText);
    expect(dialogs.chooseTopicSavePath).toHaveBeenCalledOnce();
  });

  it('drops the snapshots when the person closes without saving', async () => {
    const { session: edit, snapshotFiles } = await session();
    await edit.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    await edit.discardChanges();
    expect(await snapshotFiles()).toBe(0);
  });
});

describe('handing the topic back after a crash', () => {
  it('hands back the last snapshot in full, patient details included', async () => {
    const { session: crashed, window } = await session();
    await crashed.saveSnapshot({ content: draft, keepPatient: false, hasUnsavedChanges: true });
    crashed.handBack();
    expect(window.delivered).toEqual([{ kind: 'snapshot', content: draft, reason: 'renderer-crashed', fileName: null }]);
  });

  it('reads the open file again when there is no snapshot', async () => {
    const { session: crashed, window, dialogs } = await session();
    dialogs.chooseTopicToOpen.mockResolvedValueOnce(demo);
    await crashed.openDocument();
    crashed.handBack();
    await vi.waitFor(() =>
      expect(window.delivered).toEqual([{ kind: 'file', text: demoText, fileName: '01-kidney-stone.json' }]),
    );
  });

  it('hands back nothing for an empty new topic', async () => {
    const { session: crashed, window } = await session();
    crashed.handBack();
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(window.delivered).toEqual([]);
  });
});

describe('start-up', () => {
  it('opens the launch file when nothing was left behind', async () => {
    const { session: start, window } = await session({ launchFiles: [demo] });
    await start.start();
    await vi.waitFor(() =>
      expect(window.delivered).toEqual([{ kind: 'file', text: demoText, fileName: '01-kidney-stone.json' }]),
    );
  });

  it('restores an accepted snapshot, saving back only to a file on the recent list', async () => {
    const topicPath = path.join(base, 'heart.cwtopic');
    const {
      session: start,
      window,
      dialogs,
    } = await session({ recovery: leftBehind(topicPath), recent: [topicPath], launchFiles: [demo] });
    dialogs.confirmRecovery.mockResolvedValueOnce(true);
    await start.start();
    expect(dialogs.confirmRecovery).toHaveBeenCalledWith({
      savedAt: 1_700_000_000_000,
      topicPath,
      asksWhereToSave: false,
      skippedFile: '01-kidney-stone.json',
    });
    expect(window.titles).toEqual([topicPath]);
    expect(window.delivered).toEqual([
      { kind: 'snapshot', content: draft, reason: 'unexpected-exit', fileName: 'heart.cwtopic' },
    ]);
    expect(start.hasUnsavedChanges()).toBe(true);
  });

  it('after restoring a snapshot whose file is not on the recent list, Save asks where', async () => {
    const topicPath = path.join(base, 'elsewhere.cwtopic');
    const { session: start, window, dialogs } = await session({ recovery: leftBehind(topicPath) });
    dialogs.confirmRecovery.mockResolvedValueOnce(true);
    await start.start();
    expect(dialogs.confirmRecovery).toHaveBeenCalledWith(expect.objectContaining({ asksWhereToSave: true, skippedFile: null }));
    expect(window.delivered).toEqual([{ kind: 'snapshot', content: draft, reason: 'unexpected-exit', fileName: null }]);
    await start.saveDocument(demoText);
    expect(dialogs.chooseTopicSavePath).toHaveBeenCalledWith(path.join(base, 'Documents', 'topic.cwtopic'));
  });

  it('clears a declined snapshot and opens the launch file instead', async () => {
    const {
      session: start,
      window,
      snapshots,
      snapshotFiles,
    } = await session({ recovery: leftBehind(null), launchFiles: [demo] });
    await snapshots.write({ content: draft, keepPatient: false, documentPath: null, savedAt: 1_700_000_000_000 });
    expect(await snapshotFiles()).toBe(1);
    await start.start();
    expect(await snapshotFiles()).toBe(0);
    await vi.waitFor(() => expect(window.delivered.map((document) => document.kind)).toEqual(['file']));
  });
});
