import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { MAX_NAME_BYTES, nameWithin } from './file-name-fit.ts';
import { permissionBitsFor } from './file-mode-rule.ts';

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
  /**
   * Permission bits for the written file, when they come from another file than the one
   * replaced (a backup takes its original's); by default the replaced file's, or 0600.
   */
  readonly mode?: number;
}

/** Why a write was refused before anything was written. */
export type WriteRefusal = 'not-a-file' | 'dangling-link';

const WRITE_REFUSAL_TEXT: Readonly<Record<WriteRefusal, string>> = {
  'not-a-file': 'the name belongs to something that is not a regular file (a folder, a pipe or a device); choose another name',
  'dangling-link': 'the name is a symbolic link to a file that does not exist; choose another name or remove the link',
};

/** A write refused because of what the target is; nothing was written. */
export class FileWriteRefusal extends Error {
  readonly reason: WriteRefusal;

  constructor(reason: WriteRefusal) {
    super(`Not written: ${WRITE_REFUSAL_TEXT[reason]}.`);
    this.name = 'FileWriteRefusal';
    this.reason = reason;
  }
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

/** The longest end of a temporary name: a process id of up to 10 digits, `-`, 12 hex digits and `.tmp`. */
const TEMPORARY_SUFFIX_BYTES = 10 + 1 + 12 + 4;

/**
 * The prefix of every temporary file written for a target (`.name.`), followed by
 * `pid-random.tmp`; a name too long for that is shortened (see `nameWithin`), so the
 * temporary name never passes the 255-byte limit a legal target name is held to.
 */
export function temporaryPrefixFor(target: string): string {
  return nameWithin('.', path.basename(target), '.', MAX_NAME_BYTES - TEMPORARY_SUFFIX_BYTES);
}

/**
 * Where a write to `target` lands. A regular file or a new name is written as named; a
 * symbolic link is followed, so the file it points to gets the new content and the link
 * stays a link (as `write-file-atomic` does, npm/write-file-atomic lib/index.js: realpath
 * before writing). A folder, a pipe, a device or a link to nothing is refused with
 * `FileWriteRefusal` before anything is opened, so a save can never hang on a pipe.
 */
export async function resolveWriteTarget(target: string): Promise<string> {
  let entry: Awaited<ReturnType<typeof fs.lstat>>;
  try {
    entry = await fs.lstat(target);
  } catch (error) {
    if (errorCode(error) === 'ENOENT') return target;
    throw error;
  }
  if (!entry.isSymbolicLink()) {
    if (!entry.isFile()) throw new FileWriteRefusal('not-a-file');
    return target;
  }
  let real: string;
  try {
    real = await fs.realpath(target);
  } catch (error) {
    if (errorCode(error) === 'ENOENT') throw new FileWriteRefusal('dangling-link');
    throw error;
  }
  if (!(await fs.stat(real)).isFile()) throw new FileWriteRefusal('not-a-file');
  return real;
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
 * and its temporary file get their permission bits by the one rule (`permissionBitsFor`:
 * the replaced file's, or 0600 for a new one). A link is written through, anything but a
 * regular file refused (`resolveWriteTarget`). On failure the temporary file is removed and
 * the target is untouched.
 */
export async function writeFileAtomic(
  named: string,
  data: string | Uint8Array,
  settings: AtomicWriteSettings = {},
): Promise<void> {
  const fileSystem = settings.fileSystem ?? nodeFileSystem;
  const platform = settings.platform ?? process.platform;
  const target = await resolveWriteTarget(named);
  const temporary = temporaryPathFor(target, settings.processId ?? process.pid, randomBytes(6).toString('hex'));
  let originalMode: number | null = null;
  try {
    originalMode = (await fileSystem.stat(target)).mode;
  } catch (error) {
    if (errorCode(error) !== 'ENOENT') throw error;
  }
  const mode = settings.mode === undefined ? permissionBitsFor(originalMode) : permissionBitsFor(settings.mode);
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
