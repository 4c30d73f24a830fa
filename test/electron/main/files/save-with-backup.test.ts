// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { backupPathFor, leftoverTemporaryNames, saveWithBackup } from '../../../../electron/main/files/save-with-backup.ts';

let folder: string;

beforeEach(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-backup-'));
});

afterEach(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

describe('saveWithBackup()', () => {
  // Keeping the previous version as name.bak beside the file: common practice for editors.

  it('writes a new file without a backup when there was no previous version', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    expect(await saveWithBackup(target, 'first')).toEqual({ backedUp: false });
    expect(await fs.readFile(target, 'utf8')).toBe('first');
    expect(await fs.readdir(folder)).toEqual(['topic.cwtopic']);
  });

  it('keeps the previous version as name.bak', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    await saveWithBackup(target, 'first');
    expect(await saveWithBackup(target, 'second')).toEqual({ backedUp: true });
    await saveWithBackup(target, 'third');
    expect(await fs.readFile(target, 'utf8')).toBe('third');
    expect(await fs.readFile(path.join(folder, 'topic.cwtopic.bak'), 'utf8')).toBe('second');
    expect((await fs.readdir(folder)).sort()).toEqual(['topic.cwtopic', 'topic.cwtopic.bak']);
  });

  it('removes temporary files an earlier killed run left, but not other files', async () => {
    const target = path.join(folder, 'topic.cwtopic');
    await fs.writeFile(path.join(folder, '.topic.cwtopic.999999-0a1b2c.tmp'), 'torn');
    await fs.writeFile(path.join(folder, '.topic.cwtopic.bak.999999-0a1b2c.tmp'), 'torn');
    await fs.writeFile(path.join(folder, '.other.cwtopic.999999-0a1b2c.tmp'), 'not ours');
    await saveWithBackup(target, 'content', { processId: 1 });
    expect((await fs.readdir(folder)).sort()).toEqual(['.other.cwtopic.999999-0a1b2c.tmp', 'topic.cwtopic']);
  });
});

describe('backupPathFor()', () => {
  it('adds .bak to the whole name', () => {
    expect(backupPathFor('/home/a/heart.cwtopic')).toBe('/home/a/heart.cwtopic.bak');
  });
});

describe('leftoverTemporaryNames()', () => {
  it('picks temporary names of the target from other processes only', () => {
    const names = [
      '.t.cwtopic.12-ab.tmp',
      '.t.cwtopic.7-cd.tmp',
      '.t.cwtopic.7-cd.tmp.x',
      't.cwtopic',
      '.t.cwtopic.x-ab.tmp',
      '.u.cwtopic.12-ab.tmp',
    ];
    expect(leftoverTemporaryNames(names, '/f/t.cwtopic', 7)).toEqual(['.t.cwtopic.12-ab.tmp']);
  });
});
