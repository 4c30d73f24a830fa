// @vitest-environment node
// Reads of files others could place or swap, through the one reading primitive: each case is
// an attack that got through before (a file grown after its size check, huge app files read
// whole before refusal, links followed out of the snapshot folder).
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { ReadableHandle, RegularFileSystem } from '../../../src/shared/regular-file.ts';
import { PICKED_FILE_MAX_BYTES } from '../../../src/shared/picked-file-limit.ts';
import { readJsonFile } from '../../../electron/main/files/json-file.ts';
import { readTopicDocument, TOPIC_FILE_MAX_BYTES } from '../../../electron/main/document/read-topic-document.ts';
import { createSnapshotText } from '../../../electron/main/snapshot/snapshot-record.ts';
import { createSnapshotStore } from '../../../electron/main/snapshot/snapshot-store.ts';

let base: string;
const key = Buffer.alloc(32, 9);

beforeEach(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-reads-'));
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

/** One file that claims 2 KB when checked and gives 314 MB when read; counts the bytes asked for. */
function growingFile() {
  let asked = 0;
  const handle: ReadableHandle = {
    stat: async () => ({ size: 2000, mtimeMs: 1, mode: 0o100644, uid: 0, dev: 1, ino: 1, isFile: () => true }),
    async read(buffer, offset, length) {
      asked += length;
      buffer.fill(0x20, offset, offset + length);
      return { bytesRead: asked > 314_000_000 ? 0 : length };
    },
    close: async () => undefined,
  };
  const fileSystem: RegularFileSystem = {
    open: async () => handle,
    lstat: async () => ({ dev: 1, ino: 1, isSymbolicLink: () => false, isDirectory: () => false }),
  };
  return { fileSystem, asked: () => asked };
}

describe('readTopicDocument() against a swapped file', () => {
  it('stops at the 4 MB limit when the file grows to 314 MB after its size was checked', async () => {
    const file = growingFile();
    await expect(readTopicDocument('/home/a/topic.cwtopic', file.fileSystem)).rejects.toMatchObject({ code: 'too-large' });
    expect(file.asked()).toBe(TOPIC_FILE_MAX_BYTES + 1);
  });

  it('uses the same limit as the browser version when a file is picked', () => {
    expect(TOPIC_FILE_MAX_BYTES).toBe(PICKED_FILE_MAX_BYTES);
  });
});

describe('readJsonFile() (the recent list, the window state)', () => {
  it('refuses a 400 MB recent list from its size, unread', async () => {
    const big = path.join(base, 'recent-files.json');
    await fs.writeFile(big, '[');
    await fs.truncate(big, 400_000_000); // sparse: no disk used
    const started = performance.now();
    expect(await readJsonFile(big)).toBeNull();
    expect(performance.now() - started).toBeLessThan(1000);
  });

  it('does not follow a symbolic link in the user-data folder', async () => {
    const elsewhere = path.join(base, 'elsewhere.json');
    await fs.writeFile(elsewhere, '["/home/a/planted.cwtopic"]');
    const link = path.join(base, 'recent-files.json');
    await fs.symlink(elsewhere, link);
    expect(await readJsonFile(link)).toBeNull();
    expect(await readJsonFile(elsewhere)).toEqual(['/home/a/planted.cwtopic']);
  });
});

describe('the snapshot store', () => {
  it('does not follow a symbolic link placed among the snapshots', async () => {
    const folder = path.join(base, 'snapshots');
    await fs.mkdir(folder);
    const planted = path.join(base, 'planted.json');
    await fs.writeFile(
      planted,
      createSnapshotText({ content: { a: 1 }, keepPatient: false, documentPath: null, savedAt: 10 }, key),
    );
    await fs.symlink(planted, path.join(folder, 'snapshot-10-1.json'));
    expect(await createSnapshotStore({ folder, key }).list()).toEqual([{ name: 'snapshot-10-1.json', record: null }]);
  });

  it('refuses a 600 MB snapshot from its size, unread', async () => {
    const folder = path.join(base, 'snapshots');
    await fs.mkdir(folder);
    const big = path.join(folder, 'snapshot-20-1.json');
    await fs.writeFile(big, '{');
    await fs.truncate(big, 600_000_000);
    const started = performance.now();
    expect(await createSnapshotStore({ folder, key }).list()).toEqual([{ name: 'snapshot-20-1.json', record: null }]);
    expect(performance.now() - started).toBeLessThan(1000);
  });
});
