import fs from 'node:fs/promises';
import path from 'node:path';
import { readRegularFile, RegularFileError } from '../../../src/shared/regular-file.ts';
import { resolveWriteTarget, temporaryPrefixFor, writeFileAtomic } from './atomic-write.ts';
import type { AtomicWriteSettings } from './atomic-write.ts';
import { nameWithin } from './file-name-fit.ts';

/**
 * The backup of a file's previous version: the same name with `.bak` added (a name too
 * long for that is shortened, see `nameWithin`).
 */
export function backupPathFor(target: string): string {
  return path.join(path.dirname(target), nameWithin('', path.basename(target), '.bak'));
}

/** The largest previous version copied to the backup (far above any topic file). */
export const MAX_BACKUP_BYTES = 64 * 1024 * 1024;

/** Tidying calls besides the atomic write's own. */
export interface BackupFileSystem {
  readdir(folder: string): Promise<string[]>;
  unlink(filePath: string): Promise<void>;
}

/** Settings of a save with backup. */
export interface SaveWithBackupSettings extends AtomicWriteSettings {
  readonly backupFileSystem?: BackupFileSystem;
}

/** What a save did. */
export interface SaveOutcome {
  /** Whether a previous version existed and was kept as `name.bak`. */
  readonly backedUp: boolean;
}

const nodeBackupFileSystem: BackupFileSystem = {
  readdir: (folder) => fs.readdir(folder),
  unlink: (filePath) => fs.unlink(filePath),
};

/**
 * Names of temporary files left beside a target by an earlier run that was killed in the
 * middle of a save (same prefix, a process id other than this one, `.tmp` at the end).
 */
export function leftoverTemporaryNames(names: readonly string[], target: string, processId: number): string[] {
  const prefix = temporaryPrefixFor(target);
  return names.filter((name) => {
    if (!name.startsWith(prefix) || !name.endsWith('.tmp')) return false;
    const match = /^(\d+)-[0-9a-f]+\.tmp$/u.exec(name.slice(prefix.length));
    return match !== null && Number(match[1]) !== processId;
  });
}

/** The previous version of a target, or null when there is none (read through the one reading primitive). */
async function previousVersion(target: string): Promise<{ bytes: Uint8Array; mode: number } | null> {
  try {
    const { bytes, info } = await readRegularFile(target, { followLink: false, maxBytes: MAX_BACKUP_BYTES });
    return { bytes, mode: info.mode };
  } catch (error) {
    if (error instanceof RegularFileError && error.reason === 'missing') return null;
    throw error;
  }
}

/**
 * Save a file safely: the current version (if any) is first copied to `name.bak` with an
 * atomic write, then the new content replaces the file with an atomic write. A crash at any
 * moment leaves the file with its old or its new content in full, and `name.bak` with the
 * version before; the backup has the permission bits of the file it copies. A symbolic link
 * is saved through: the file it points to is replaced and backed up beside itself, and the
 * link stays. A pipe, a folder or a device is refused at once (`FileWriteRefusal`), never
 * opened for writing. Temporary files left by an earlier killed run are removed afterwards.
 */
export async function saveWithBackup(
  named: string,
  data: string | Uint8Array,
  settings: SaveWithBackupSettings = {},
): Promise<SaveOutcome> {
  const files = settings.backupFileSystem ?? nodeBackupFileSystem;
  const target = await resolveWriteTarget(named);
  const previous = await previousVersion(target);
  if (previous !== null) await writeFileAtomic(backupPathFor(target), previous.bytes, { ...settings, mode: previous.mode });
  await writeFileAtomic(target, data, settings);
  const folder = path.dirname(target);
  try {
    const names = await files.readdir(folder);
    const processId = settings.processId ?? process.pid;
    const leftovers = [
      ...leftoverTemporaryNames(names, target, processId),
      ...leftoverTemporaryNames(names, backupPathFor(target), processId),
    ];
    await Promise.all(leftovers.map((name) => files.unlink(path.join(folder, name)).catch(() => undefined)));
  } catch {
    // Tidying is a courtesy; the save itself has succeeded.
  }
  return { backedUp: previous !== null };
}
