import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';

/** An open file, as `fs.promises.open` gives it. */
export interface WritableFile {
  writeFile(data: string | Uint8Array): Promise<void>;
  sync(): Promise<void>;
  close(): Promise<void>;
}

/** The file system calls an atomic write makes (`node:fs/promises` in the app; a fake in tests). */
export interface AtomicFileSystem {
  open(filePath: string, flags: string, mode?: number): Promise<WritableFile>;
  rename(from: string, to: string): Promise<void>;
  unlink(filePath: string): Promise<void>;
  stat(filePath: string): Promise<{ mode: number }>;
}

/** Settings of an atomic write; every field has a default for real use. */
export interface AtomicWriteSettings {
  readonly fileSystem?: AtomicFileSystem;
  readonly platform?: NodeJS.Platform;
  /** Waits between rename attempts on Windows. */
  readonly renameRetryDelaysMs?: readonly number[];
  readonly wait?: (milliseconds: number) => Promise<void>;
  /** Process id written into the temporary name (to tell leftovers of other runs apart). */
  readonly processId?: number;
}

/**
 * Waits before retrying a rename that Windows refused because another program (a virus
 * scanner, the search indexer, a sync client) briefly holds the file: about 1.3 s in all.
 */
export const WINDOWS_RENAME_RETRY_DELAYS_MS: readonly number[] = [10, 25, 50, 100, 200, 400, 500];

/** Rename errors Windows gives while another program holds the file; worth retrying there. */
const TRANSIENT_RENAME_CODES = new Set(['EPERM', 'EBUSY', 'EACCES']);

/** Errors of opening or syncing a folder on systems that do not support it; ignored. */
const FOLDER_SYNC_UNSUPPORTED = new Set(['EISDIR', 'EPERM', 'EINVAL', 'EBADF', 'ENOTSUP', 'EACCES']);

function errorCode(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

const nodeFileSystem: AtomicFileSystem = {
  open: (filePath, flags, mode) => fs.open(filePath, flags, mode),
  rename: (from, to) => fs.rename(from, to),
  unlink: (filePath) => fs.unlink(filePath),
  stat: (filePath) => fs.stat(filePath),
};

function sleep(milliseconds: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, milliseconds));
}

/** The prefix of every temporary file written for a target (`.name.`), followed by `pid-random.tmp`. */
export function temporaryPrefixFor(target: string): string {
  return `.${path.basename(target)}.`;
}

/** The temporary file for one write: a hidden name in the target's own folder (a rename never crosses file systems). */
export function temporaryPathFor(target: string, processId: number, random: string): string {
  return path.join(path.dirname(target), `${temporaryPrefixFor(target)}${processId}-${random}.tmp`);
}

/**
 * Rename the temporary file onto the target. On Windows a refusal with EPERM, EBUSY or
 * EACCES is retried after each of the delays; anywhere else, and for any other error, the
 * first error is final.
 */
export async function renameWithRetry(
  from: string,
  to: string,
  fileSystem: AtomicFileSystem,
  platform: NodeJS.Platform,
  delays: readonly number[],
  wait: (milliseconds: number) => Promise<void>,
): Promise<number> {
  for (let attempt = 0; ; attempt += 1) {
    try {
      await fileSystem.rename(from, to);
      return attempt;
    } catch (error) {
      const code = errorCode(error);
      const delay = delays[attempt];
      const transient = platform === 'win32' && code !== null && TRANSIENT_RENAME_CODES.has(code);
      if (!transient || delay === undefined) throw error;
      await wait(delay);
    }
  }
}

async function syncFolder(folder: string, fileSystem: AtomicFileSystem): Promise<void> {
  let handle: WritableFile;
  try {
    handle = await fileSystem.open(folder, 'r');
  } catch (error) {
    if (FOLDER_SYNC_UNSUPPORTED.has(errorCode(error) ?? '')) return;
    throw error;
  }
  try {
    await handle.sync();
  } catch (error) {
    if (!FOLDER_SYNC_UNSUPPORTED.has(errorCode(error) ?? '')) throw error;
  } finally {
    await handle.close();
  }
}

/**
 * Replace a file so that, whatever happens, it holds either its old or its new content in
 * full: write a temporary file in the same folder, flush it to the disk (fsync), rename it
 * onto the target (atomic on one file system), then flush the folder so the rename itself
 * survives a power cut (not on Windows, where folders cannot be opened for that). The file
 * keeps its permission bits. On failure the temporary file is removed and the target is
 * untouched.
 */
export async function writeFileAtomic(target: string, data: string | Uint8Array, settings: AtomicWriteSettings = {}): Promise<void> {
  const fileSystem = settings.fileSystem ?? nodeFileSystem;
  const platform = settings.platform ?? process.platform;
  const temporary = temporaryPathFor(target, settings.processId ?? process.pid, randomBytes(6).toString('hex'));
  let mode = 0o666;
  try {
    mode = (await fileSystem.stat(target)).mode & 0o777;
  } catch (error) {
    if (errorCode(error) !== 'ENOENT') throw error;
  }
  const handle = await fileSystem.open(temporary, 'wx', mode);
  try {
    try {
      await handle.writeFile(data);
      await handle.sync();
    } finally {
      await handle.close();
    }
    await renameWithRetry(
      temporary,
      target,
      fileSystem,
      platform,
      settings.renameRetryDelaysMs ?? WINDOWS_RENAME_RETRY_DELAYS_MS,
      settings.wait ?? sleep,
    );
  } catch (error) {
    await fileSystem.unlink(temporary).catch(() => undefined);
    throw error;
  }
  if (platform !== 'win32') await syncFolder(path.dirname(target), fileSystem);
}
