// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { renameWithRetry, temporaryPathFor, writeFileAtomic } from '../../../../electron/main/files/atomic-write.ts';
import type { AtomicFileSystem, WritableFile } from '../../../../electron/main/files/atomic-write.ts';

let folder: string;

beforeEach(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-atomic-'));
});

afterEach(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

function failure(code: string): NodeJS.ErrnoException {
  return Object.assign(new Error(`${code}: simulated`), { code });
}

/** The real file system, with every call written down and renames that fail a given number of times. */
function recordingFileSystem(renameFailures: string[] = []) {
  const calls: string[] = [];
  const remaining = [...renameFailures];
  const fileSystem: AtomicFileSystem = {
    async open(filePath, flags, mode) {
      calls.push(`open ${path.basename(filePath)} ${flags}`);
      const handle = await fs.open(filePath, flags, mode);
      const wrapped: WritableFile = {
        async writeFile(data) {
          calls.push(`write ${path.basename(filePath)}`);
          await handle.writeFile(data);
        },
        async sync() {
          calls.push(`sync ${path.basename(filePath)}`);
          await handle.sync();
        },
        async close() {
          calls.push(`close ${path.basename(filePath)}`);
          await handle.close();
        },
      };
      return wrapped;
    },
    async rename(from, to) {
      calls.push(`rename ${path.basename(from)} -> ${path.basename(to)}`);
      const code = remaining.shift();
      if (code !== undefined) throw failure(code);
      await fs.rename(from, to);
    },
    async unlink(filePath) {
      calls.push(`unlink ${path.basename(filePath)}`);
      await fs.unlink(filePath);
    },
    stat: (filePath) => fs.stat(filePath),
  };
  return { calls, fileSystem };
}

const noWait = async (): Promise<void> => undefined;

describe('writeFileAtomic()', () => {
  it('writes a temporary file in the same folder, flushes it, renames it, then flushes the folder', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    const { calls, fileSystem } = recordingFileSystem();
    await writeFileAtomic(target, 'new content', { fileSystem, platform: 'linux', processId: 4242 });
    expect(await fs.readFile(target, 'utf8')).toBe('new content');
    // The order of write-file-atomic (npm/write-file-atomic lib/index.js: open, write, fsync, close,
    // rename) plus the folder fsync after the rename that POSIX needs for the new name to survive a power
    // loss (fsync(2), Linux man-pages: "fsync() on the file does not necessarily ensure that the entry in
    // the directory containing the file has also reached disk").
    const temporary = calls[0]?.split(' ')[1] ?? '';
    expect(temporary).toMatch(/^\.topic\.cwtopic\.4242-[0-9a-f]{12}\.tmp$/u);
    expect(calls).toEqual([
      `open ${temporary} wx`,
      `write ${temporary}`,
      `sync ${temporary}`,
      `close ${temporary}`,
      `rename ${temporary} -> topic.cwtopic`,
      `open ${path.basename(folder)} r`,
      `sync ${path.basename(folder)}`,
      `close ${path.basename(folder)}`,
    ]);
    expect(await fs.readdir(folder)).toEqual(['topic.cwtopic']);
  });

  it('replaces an existing file and keeps its permission bits', async () => {
    const target = path.join(folder, 'private.cwtopic');
    await fs.writeFile(target, 'old', { mode: 0o600 });
    await fs.chmod(target, 0o600);
    await writeFileAtomic(target, 'new');
    expect(await fs.readFile(target, 'utf8')).toBe('new');
    expect((await fs.stat(target)).mode & 0o777).toBe(0o600);
  });

  it('does not flush the folder on Windows, where a folder cannot be opened for it', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    const { calls, fileSystem } = recordingFileSystem();
    await writeFileAtomic(target, 'x', { fileSystem, platform: 'win32' });
    expect(calls.some((call) => call.startsWith(`open ${path.basename(folder)}`))).toBe(false);
  });

  it('retries a rename that Windows refuses with EPERM, EBUSY or EACCES, and then succeeds', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    await fs.writeFile(target, 'old');
    const { calls, fileSystem } = recordingFileSystem(['EPERM', 'EBUSY', 'EACCES', 'EPERM']);
    const waits: number[] = [];
    await writeFileAtomic(target, 'new', {
      fileSystem,
      platform: 'win32',
      renameRetryDelaysMs: [1, 2, 4, 8, 16],
      wait: async (milliseconds) => {
        waits.push(milliseconds);
      },
    });
    expect(await fs.readFile(target, 'utf8')).toBe('new');
    expect(calls.filter((call) => call.startsWith('rename'))).toHaveLength(5);
    expect(waits).toEqual([1, 2, 4, 8]);
    expect(await fs.readdir(folder)).toEqual(['topic.cwtopic']);
  });

  it('gives up after the last retry, removes the temporary file and leaves the old content', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    await fs.writeFile(target, 'old');
    const { fileSystem } = recordingFileSystem(['EPERM', 'EPERM', 'EPERM', 'EPERM']);
    await expect(
      writeFileAtomic(target, 'new', { fileSystem, platform: 'win32', renameRetryDelaysMs: [1, 1], wait: noWait }),
    ).rejects.toMatchObject({ code: 'EPERM' });
    expect(await fs.readFile(target, 'utf8')).toBe('old');
    expect(await fs.readdir(folder)).toEqual(['topic.cwtopic']);
  });

  it('does not retry EPERM on Linux, nor errors that never pass (ENOENT, EXDEV) on Windows', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    for (const [platform, code] of [
      ['linux', 'EPERM'],
      ['win32', 'ENOENT'],
      ['win32', 'EXDEV'],
    ] as const) {
      const { calls, fileSystem } = recordingFileSystem([code, code, code]);
      await expect(
        writeFileAtomic(target, 'new', { fileSystem, platform, renameRetryDelaysMs: [1, 1], wait: noWait }),
      ).rejects.toMatchObject({
        code,
      });
      expect(
        calls.filter((call) => call.startsWith('rename')),
        `${platform} ${code}`,
      ).toHaveLength(1);
    }
    expect(await fs.readdir(folder)).toEqual([]);
  });

  it('removes the temporary file when writing it fails', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    const { fileSystem } = recordingFileSystem();
    const failing: AtomicFileSystem = {
      ...fileSystem,
      async open(filePath, flags, mode) {
        const handle = await fileSystem.open(filePath, flags, mode);
        return { ...handle, writeFile: async () => Promise.reject(failure('ENOSPC')), close: handle.close, sync: handle.sync };
      },
    };
    await expect(writeFileAtomic(target, 'x', { fileSystem: failing, platform: 'linux' })).rejects.toMatchObject({
      code: 'ENOSPC',
    });
    expect(await fs.readdir(folder)).toEqual([]);
  });
});

describe('renameWithRetry()', () => {
  it('reports how many retries a rename needed', async () => {
    const from = path.join(folder, 'a');
    await fs.writeFile(from, 'a');
    const { fileSystem } = recordingFileSystem(['EBUSY']);
    expect(await renameWithRetry(from, path.join(folder, 'b'), fileSystem, 'win32', [1], noWait)).toBe(1);
  });
});

describe('temporaryPathFor()', () => {
  it('names a hidden file beside the target', () => {
    expect(temporaryPathFor('/home/a/topic.cwtopic', 12, 'ab12')).toBe('/home/a/.topic.cwtopic.12-ab12.tmp');
  });
});
