/**
 * The one way the desktop shell and the web server open a file that someone else could
 * have placed or swapped: open it once, then judge the opened handle (not the name), and
 * read at most a limit from it. A name checked first and opened later can be swapped in
 * between (a small file for a huge one, a file for a link or a pipe); a handle cannot.
 */
import { constants } from 'node:fs';
import fs from 'node:fs/promises';
import type { FileHandle } from 'node:fs/promises';

/** Why a file was not read. */
export type RegularFileRefusal = 'missing' | 'not-a-file' | 'link' | 'too-large' | 'unreadable';

const REFUSAL_TEXT: Readonly<Record<RegularFileRefusal, string>> = {
  missing: 'there is no such file',
  'not-a-file': 'it is not a regular file (a folder, a pipe or a device)',
  link: 'it is a symbolic link where a plain file was expected',
  'too-large': 'it is larger than the app accepts',
  unreadable: 'it cannot be read (check its permissions)',
};

/** A refusal to read a file, with the reason as a code and as words. */
export class RegularFileError extends Error {
  readonly reason: RegularFileRefusal;
  /** The system's error code (ENOENT, EACCES...), when the system refused. */
  readonly systemCode: string | null;

  constructor(reason: RegularFileRefusal, systemCode: string | null = null) {
    super(`The file was not read: ${REFUSAL_TEXT[reason]}.`);
    this.name = 'RegularFileError';
    this.reason = reason;
    this.systemCode = systemCode;
  }
}

/** What is known about an opened file (from fstat on its handle). */
export interface RegularFileInfo {
  readonly size: number;
  readonly mtimeMs: number;
  readonly mode: number;
  readonly uid: number;
  readonly dev: number;
  readonly ino: number;
  isFile(): boolean;
}

/** An open file handle, as `fs.promises.open` gives it. */
export interface ReadableHandle {
  stat(): Promise<RegularFileInfo>;
  read(buffer: Uint8Array, offset: number, length: number, position: number | null): Promise<{ bytesRead: number }>;
  close(): Promise<void>;
}

/** The file calls the reader makes (`node:fs/promises` in the app; a fake in tests). */
export interface RegularFileSystem<Handle extends ReadableHandle = ReadableHandle> {
  open(filePath: string, flags: number): Promise<Handle>;
  lstat(
    filePath: string,
  ): Promise<{ readonly dev: number; readonly ino: number; isSymbolicLink(): boolean; isDirectory(): boolean }>;
}

/** How a file may be opened. */
export interface OpenRules {
  /**
   * Whether the name itself may be a symbolic link: yes for a file the person picked (their
   * documents folder may be a link), no for the app's own files in its user-data folder.
   */
  readonly followLink: boolean;
}

/** How a file may be read. */
export interface ReadRules extends OpenRules {
  /** The most bytes accepted; one byte more is never read. */
  readonly maxBytes: number;
}

/** A file opened and found to be a regular file. */
export interface OpenedRegularFile<Handle extends ReadableHandle = ReadableHandle> {
  readonly handle: Handle;
  readonly info: RegularFileInfo;
}

/** A file read in full. */
export interface RegularFileContent {
  readonly bytes: Uint8Array;
  readonly info: RegularFileInfo;
}

export const nodeRegularFileSystem: RegularFileSystem<FileHandle> = {
  open: (filePath, flags) => fs.open(filePath, flags),
  lstat: (filePath) => fs.lstat(filePath),
};

/**
 * Read-only, and never waiting: O_NONBLOCK makes opening a named pipe return at once
 * (POSIX open(2): "O_NONBLOCK ... an open() for reading-only shall return without delay"),
 * so the handle check can refuse it instead of the open hanging until a writer comes.
 * O_NOFOLLOW refuses a link as the last part of the name (open(2): "If path names a
 * symbolic link, fail and set errno to [ELOOP]"). Windows has neither flag; there the
 * name is compared with the handle instead (below).
 */
function openFlags(followLink: boolean): number {
  const noFollow = followLink ? 0 : (constants.O_NOFOLLOW ?? 0);
  return constants.O_RDONLY | (constants.O_NONBLOCK ?? 0) | noFollow;
}

function systemCodeOf(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

function refusalFor(code: string | null): RegularFileRefusal {
  if (code === 'ENOENT' || code === 'ENOTDIR') return 'missing';
  if (code === 'ELOOP' || code === 'EMLINK') return 'link';
  if (code === 'EISDIR' || code === 'ENXIO' || code === 'ENODEV' || code === 'EOPNOTSUPP') return 'not-a-file';
  return 'unreadable';
}

/**
 * Open a file for reading and check the handle: a regular file (not a folder, pipe,
 * device or socket), and, unless links are allowed, not reached through a link as the
 * last part of its name. Throws `RegularFileError`. The caller closes the handle.
 */
export async function openRegularFile<Handle extends ReadableHandle = FileHandle>(
  filePath: string,
  rules: OpenRules,
  fileSystem: RegularFileSystem<Handle> = nodeRegularFileSystem as unknown as RegularFileSystem<Handle>,
): Promise<OpenedRegularFile<Handle>> {
  let handle: Handle;
  try {
    handle = await fileSystem.open(filePath, openFlags(rules.followLink));
  } catch (error) {
    const code = systemCodeOf(error);
    throw new RegularFileError(refusalFor(code), code);
  }
  try {
    const info = await handle.stat();
    if (!info.isFile()) throw new RegularFileError('not-a-file');
    if (!rules.followLink) {
      // Where O_NOFOLLOW does not exist, the name must still be the very file opened.
      const named = await fileSystem.lstat(filePath);
      if (named.isSymbolicLink() || named.dev !== info.dev || named.ino !== info.ino) throw new RegularFileError('link');
    }
    return { handle, info };
  } catch (error) {
    await handle.close().catch(() => undefined);
    if (error instanceof RegularFileError) throw error;
    const code = systemCodeOf(error);
    throw new RegularFileError(refusalFor(code), code);
  }
}

const CHUNK_BYTES = 64 * 1024;

/**
 * Read up to `maxBytes + 1` bytes from an open handle: the content, or a `too-large`
 * refusal when there is more than `maxBytes`, whatever size the file claimed when checked.
 */
export async function readAtMost(handle: ReadableHandle, maxBytes: number): Promise<Uint8Array> {
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const wanted = Math.min(CHUNK_BYTES, maxBytes + 1 - total);
    const chunk = new Uint8Array(wanted);
    let bytesRead: number;
    try {
      ({ bytesRead } = await handle.read(chunk, 0, wanted, null));
    } catch (error) {
      const code = systemCodeOf(error);
      throw new RegularFileError(code === 'EISDIR' ? 'not-a-file' : 'unreadable', code);
    }
    if (bytesRead === 0) break;
    chunks.push(bytesRead === wanted ? chunk : chunk.subarray(0, bytesRead));
    total += bytesRead;
    if (total > maxBytes) throw new RegularFileError('too-large');
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/**
 * Read a whole regular file of at most `maxBytes`: opened once, checked by its handle,
 * refused by its claimed size before any read, and never read past the limit.
 */
export async function readRegularFile(
  filePath: string,
  rules: ReadRules,
  fileSystem: RegularFileSystem = nodeRegularFileSystem,
): Promise<RegularFileContent> {
  const { handle, info } = await openRegularFile(filePath, rules, fileSystem);
  try {
    if (info.size > rules.maxBytes) throw new RegularFileError('too-large');
    return { bytes: await readAtMost(handle, rules.maxBytes), info };
  } finally {
    await handle.close().catch(() => undefined);
  }
}
