// @vitest-environment node
// Saving onto names that are not plain files, and onto long legal names; and the one rule for
// the permission bits of what is written (any of it can hold patient details).
import { execFileSync } from 'node:child_process';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { temporaryPathFor, writeFileAtomic } from '../../../../electron/main/files/atomic-write.ts';
import type { AtomicFileSystem } from '../../../../electron/main/files/atomic-write.ts';
import { permissionBitsFor } from '../../../../electron/main/files/file-mode-rule.ts';
import { backupPathFor, saveWithBackup } from '../../../../electron/main/files/save-with-backup.ts';

let folder: string;
const posix = process.platform !== 'win32';

beforeEach(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-targets-'));
});

afterEach(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

const race = <T>(task: Promise<T>, milliseconds: number): Promise<T | 'still waiting'> =>
  Promise.race([task, new Promise<'still waiting'>((resolve) => setTimeout(() => resolve('still waiting'), milliseconds))]);

const bits = async (filePath: string): Promise<number> => (await fs.stat(filePath)).mode & 0o777;

describe('saving onto a name that is not a plain file', () => {
  it.runIf(posix)('refuses a named pipe at once, and the next save still works', async () => {
    const pipe = path.join(folder, 'topic.cwtopic');
    execFileSync('mkfifo', [pipe]);
    const outcome = await race(
      saveWithBackup(pipe, 'new').catch((error: unknown) => error),
      2000,
    );
    expect(outcome).toMatchObject({ name: 'FileWriteRefusal', reason: 'not-a-file' });
    expect((await fs.lstat(pipe)).isFIFO()).toBe(true);
    const other = path.join(folder, 'other.cwtopic');
    await saveWithBackup(other, 'fine');
    expect(await fs.readFile(other, 'utf8')).toBe('fine');
  });

  it('refuses a folder, and says to choose another name', async () => {
    const inside = path.join(folder, 'a-folder.cwtopic');
    await fs.mkdir(inside);
    await expect(saveWithBackup(inside, 'x')).rejects.toThrow(/not a regular file .*choose another name/u);
    await expect(writeFileAtomic(inside, 'x')).rejects.toMatchObject({ reason: 'not-a-file' });
  });

  it.runIf(posix)(
    'saves through a symbolic link: the file it points to gets the content and its backup, the link stays',
    async () => {
      const real = path.join(folder, 'real.cwtopic');
      const link = path.join(folder, 'link.cwtopic');
      await fs.writeFile(real, 'old');
      await fs.symlink(real, link);
      expect(await saveWithBackup(link, 'new')).toEqual({ backedUp: true });
      expect((await fs.lstat(link)).isSymbolicLink()).toBe(true);
      expect(await fs.readFile(real, 'utf8')).toBe('new');
      expect(await fs.readFile(`${real}.bak`, 'utf8')).toBe('old');
      expect((await fs.readdir(folder)).sort()).toEqual(['link.cwtopic', 'real.cwtopic', 'real.cwtopic.bak']);
    },
  );

  it.runIf(posix)('refuses a link to nothing instead of replacing the link', async () => {
    const link = path.join(folder, 'dangling.cwtopic');
    await fs.symlink(path.join(folder, 'gone.cwtopic'), link);
    await expect(saveWithBackup(link, 'x')).rejects.toMatchObject({ reason: 'dangling-link' });
    expect((await fs.lstat(link)).isSymbolicLink()).toBe(true);
  });
});

describe('long legal names', () => {
  // NAME_MAX is 255 bytes on ext4, XFS and APFS (common practice); the app must save any legal name.
  for (const length of [240, 255]) {
    it(`saves a ${length}-byte name twice (temporary and backup names stay within 255 bytes)`, async () => {
      const target = path.join(folder, `${'a'.repeat(length - 8)}.cwtopic`);
      await saveWithBackup(target, 'first');
      await saveWithBackup(target, 'second');
      expect(await fs.readFile(target, 'utf8')).toBe('second');
      expect(await fs.readFile(backupPathFor(target), 'utf8')).toBe('first');
      for (const name of await fs.readdir(folder)) expect(Buffer.byteLength(name)).toBeLessThanOrEqual(255);
    });
  }

  it('shortens a long temporary name the same way every time, with a mark of the full name', () => {
    const long = `/f/${'é'.repeat(120)}.cwtopic`; // 248 bytes of UTF-8
    const temporary = path.basename(temporaryPathFor(long, 4_294_967_295, 'a'.repeat(12)));
    expect(Buffer.byteLength(temporary)).toBeLessThanOrEqual(255);
    expect(temporary).toMatch(/^\.é+~[0-9a-f]{8}\.4294967295-a{12}\.tmp$/u);
    expect(path.basename(temporaryPathFor(long, 4_294_967_295, 'a'.repeat(12)))).toBe(temporary);
  });
});

describe("permission bits (one rule: the original's, else owner-only)", () => {
  it('gives the backup of a 0600 file mode 0600, not the default 0644', async () => {
    const target = path.join(folder, 'private.cwtopic');
    await fs.writeFile(target, 'patient details');
    await fs.chmod(target, 0o600);
    await saveWithBackup(target, 'new');
    expect(await bits(backupPathFor(target))).toBe(0o600);
    expect(await bits(target)).toBe(0o600);
  });

  it("gives the backup the original's bits even when an older backup was more open", async () => {
    const target = path.join(folder, 'private.cwtopic');
    await fs.writeFile(target, 'v1');
    await fs.chmod(target, 0o600);
    await fs.writeFile(backupPathFor(target), 'v0');
    await fs.chmod(backupPathFor(target), 0o644);
    await saveWithBackup(target, 'v2');
    expect(await bits(backupPathFor(target))).toBe(0o600);
  });

  it('writes a new file, and its temporary file, owner-only', async () => {
    const modes: number[] = [];
    const recording: AtomicFileSystem = {
      open: async (filePath, flags, mode) => {
        if (mode !== undefined) modes.push(mode);
        return fs.open(filePath, flags, mode);
      },
      rename: (from, to) => fs.rename(from, to),
      unlink: (filePath) => fs.unlink(filePath),
      stat: (filePath) => fs.stat(filePath),
    };
    const target = path.join(folder, 'handout.pdf');
    await writeFileAtomic(target, '%PDF-1.7', { fileSystem: recording });
    expect(modes).toEqual([0o600]);
    if (posix) expect(await bits(target)).toBe(0o600);
  });

  it('keeps the bits of a file that is replaced', () => {
    expect(permissionBitsFor(0o100640)).toBe(0o640);
    expect(permissionBitsFor(null)).toBe(0o600);
  });
});
