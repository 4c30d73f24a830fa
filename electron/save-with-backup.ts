import fs from 'node:fs/promises';
import path from 'node:path';
import { temporaryPrefixFor, writeFileAtomic } from './atomic-write.ts';
import type { AtomicWriteSettings } from './atomic-write.ts';

/** The backup of a file's previous version: the same name with `.bak` added. */
export function backupPathFor(target: string): string {
  return `${target}.bak`;
}

/** Reading and tidying calls besides the atomic write's own. */
export interface BackupFileSystem {
  readFile(filePath: string): Promise<Uint8Array>;
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

function errorCode(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

const nodeBackupFileSystem: BackupFileSystem = {
  readFile: (filePath) => fs.readFile(filePath),
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

/**
 * Save a file safely: the current version (if any) is first copied to `name.bak` with an
 * atomic write, then the new content replaces the file with an atomic write. A crash at any
 * moment leaves the file with its old or its new content in full, and `name.bak` with the
 * version before. Temporary files left by an earlier killed run are removed afterwards.
 */
export async function saveWithBackup(target: string, data: string | Uint8Array, settings: SaveWithBackupSettings = {}): Promise<SaveOutcome> {
  const files = settings.backupFileSystem ?? nodeBackupFileSystem;
  let previous: Uint8Array | null = null;
  try {
    previous = await files.readFile(target);
  } catch (error) {
    if (errorCode(error) !== 'ENOENT') throw error;
  }
  if (previous !== null) await writeFileAtomic(backupPathFor(target), previous, settings);
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
