// @vitest-environment node
import { execFileSync } from 'node:child_process';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { nodeRegularFileSystem, openRegularFile, readRegularFile } from '../../src/shared/regular-file.ts';
import type { ReadableHandle, RegularFileSystem } from '../../src/shared/regular-file.ts';

let folder: string;
const posix = process.platform !== 'win32';

beforeAll(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-regular-'));
  await fs.writeFile(path.join(folder, 'plain.txt'), 'plain text');
  await fs.symlink(path.join(folder, 'plain.txt'), path.join(folder, 'link.txt'));
  await fs.mkdir(path.join(folder, 'sub'));
  if (posix) execFileSync('mkfifo', [path.join(folder, 'pipe')]);
});

afterAll(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

/**
 * A file system whose one file claims `claimedSize` bytes when checked but yields `actualSize`
 * when read: a file swapped or grown between its check and its read. Counts the bytes asked for.
 */
function swappingFileSystem(claimedSize: number, actualSize: number) {
  const asked = { bytes: 0, reads: 0 };
  const info = { size: claimedSize, mtimeMs: 1, mode: 0o100600, uid: 0, dev: 1, ino: 2, isFile: () => true };
  const handle: ReadableHandle = {
    stat: async () => info,
    async read(buffer, offset, length) {
      asked.bytes += length;
      asked.reads += 1;
      const given = Math.min(length, actualSize - (asked.bytes - length));
      buffer.fill(0x20, offset, offset + Math.max(0, given));
      return { bytesRead: Math.max(0, given) };
    },
    close: async () => undefined,
  };
  const fileSystem: RegularFileSystem = {
    open: async () => handle,
    lstat: async () => ({ dev: 1, ino: 2, isSymbolicLink: () => false, isDirectory: () => false }),
  };
  return { asked, fileSystem };
}

const race = <T>(task: Promise<T>, milliseconds: number): Promise<T | 'still waiting'> =>
  Promise.race([task, new Promise<'still waiting'>((resolve) => setTimeout(() => resolve('still waiting'), milliseconds))]);

describe('readRegularFile()', () => {
  it('reads a regular file with what fstat says about it', async () => {
    const { bytes, info } = await readRegularFile(path.join(folder, 'plain.txt'), { followLink: false, maxBytes: 100 });
    expect(new TextDecoder().decode(bytes)).toBe('plain text');
    expect(info.size).toBe(10);
  });

  it('never reads past the limit, whatever size the file claimed when it was checked', async () => {
    // A file that said 1 KB at its check and is 314 MB when read.
    const { asked, fileSystem } = swappingFileSystem(1000, 314_000_000);
    await expect(readRegularFile('/x', { followLink: false, maxBytes: 4_000_000 }, fileSystem)).rejects.toMatchObject({
      reason: 'too-large',
    });
    expect(asked.bytes).toBe(4_000_001);
  });

  it('refuses a file whose size is over the limit before reading any of it', async () => {
    const { asked, fileSystem } = swappingFileSystem(600_000_000, 600_000_000);
    await expect(readRegularFile('/x', { followLink: false, maxBytes: 4_000_000 }, fileSystem)).rejects.toMatchObject({
      reason: 'too-large',
    });
    expect(asked.reads).toBe(0);
  });

  it.runIf(process.platform === 'linux')('caps a file that reports size 0 but has content (Linux /proc)', async () => {
    // proc(5): files under /proc report a size of 0 although reading them gives text.
    await expect(readRegularFile('/proc/self/status', { followLink: true, maxBytes: 100 })).rejects.toMatchObject({
      reason: 'too-large',
    });
  });

  it('refuses a symbolic link where links are not expected, and follows it where they are', async () => {
    await expect(readRegularFile(path.join(folder, 'link.txt'), { followLink: false, maxBytes: 100 })).rejects.toMatchObject({
      reason: 'link',
    });
    const { bytes } = await readRegularFile(path.join(folder, 'link.txt'), { followLink: true, maxBytes: 100 });
    expect(new TextDecoder().decode(bytes)).toBe('plain text');
  });

  it('refuses a folder and a missing file with their own reasons', async () => {
    await expect(readRegularFile(path.join(folder, 'sub'), { followLink: false, maxBytes: 100 })).rejects.toMatchObject({
      reason: 'not-a-file',
    });
    await expect(readRegularFile(path.join(folder, 'none'), { followLink: false, maxBytes: 100 })).rejects.toMatchObject({
      reason: 'missing',
    });
  });

  it.runIf(posix)('refuses a named pipe at once instead of waiting for a writer', async () => {
    const outcome = await race(
      readRegularFile(path.join(folder, 'pipe'), { followLink: false, maxBytes: 100 }).catch((error: unknown) => error),
      2000,
    );
    expect(outcome).toMatchObject({ reason: 'not-a-file' });
  });

  it('says what is wrong in words', async () => {
    await expect(readRegularFile(path.join(folder, 'sub'), { followLink: false, maxBytes: 100 })).rejects.toThrow(
      'The file was not read: it is not a regular file (a folder, a pipe or a device).',
    );
  });
});

describe('openRegularFile()', () => {
  it('refuses a name that is not the file opened (a link swapped in where O_NOFOLLOW is unknown)', async () => {
    const real = await nodeRegularFileSystem.open(path.join(folder, 'plain.txt'), 0);
    const fileSystem: RegularFileSystem = {
      open: async () => real,
      lstat: async () => ({ dev: 0, ino: 0, isSymbolicLink: () => false, isDirectory: () => false }),
    };
    await expect(openRegularFile(path.join(folder, 'plain.txt'), { followLink: false }, fileSystem)).rejects.toMatchObject({
      reason: 'link',
    });
  });
});
