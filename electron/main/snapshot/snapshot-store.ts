import fs from 'node:fs/promises';
import path from 'node:path';
import { readRegularFile } from '../../../src/shared/regular-file.ts';
import { writeFileAtomic } from '../files/atomic-write.ts';
import type { AtomicWriteSettings } from '../files/atomic-write.ts';
import { PAYLOAD_LIMITS } from '../ipc/ipc-payloads.ts';
import { createSnapshotText, parseSnapshotText } from './snapshot-record.ts';
import type { SnapshotInput, SnapshotKey, SnapshotRecord } from './snapshot-record.ts';

/** File calls of the store besides the atomic write's and the reader's own. */
export interface SnapshotFileSystem {
  mkdir(folder: string, options: { recursive: true; mode: number }): Promise<unknown>;
  readdir(folder: string): Promise<string[]>;
  unlink(filePath: string): Promise<void>;
}

/**
 * The most bytes of a snapshot file: its content and path limits at up to three UTF-8
 * bytes per UTF-16 unit, and room for the other fields. A larger file is refused unread.
 */
export const SNAPSHOT_FILE_MAX_BYTES = 3 * (PAYLOAD_LIMITS.snapshotCharacters + PAYLOAD_LIMITS.pathCharacters) + 1024;

/** A snapshot file read back from the folder. */
export interface StoredSnapshot {
  readonly name: string;
  /** Null when the file is damaged. */
  readonly record: SnapshotRecord | null;
}

/** The autosave snapshots of the open topic, in a folder of their own (never beside the person's files). */
export interface SnapshotStore {
  /** Write a snapshot and drop all but the newest few; resolves with its file name. */
  write(input: SnapshotInput): Promise<string>;
  /** Every snapshot file, damaged ones with a null record. */
  list(): Promise<StoredSnapshot[]>;
  /** Remove every snapshot (after a save, or when the topic is replaced or discarded). */
  clear(): Promise<void>;
}

/** Settings of the store. */
export interface SnapshotStoreSettings {
  readonly folder: string;
  /** The secret key snapshots are sealed with (`loadSnapshotKey`). */
  readonly key: SnapshotKey;
  /** How many snapshots to keep (a damaged newest one still leaves older good ones). */
  readonly keep?: number;
  readonly fileSystem?: SnapshotFileSystem;
  readonly atomicWrite?: AtomicWriteSettings;
}

const SNAPSHOT_NAME = /^snapshot-(\d{1,16})-(\d{1,9})\.json$/u;

/** Whether a file name is one of the store's snapshot names. */
export function isSnapshotName(name: string): boolean {
  return SNAPSHOT_NAME.test(name);
}

/** Snapshot names from newest to oldest (by time taken, then by sequence number). */
export function newestFirst(names: readonly string[]): string[] {
  const keyed = names.flatMap((name) => {
    const match = SNAPSHOT_NAME.exec(name);
    return match === null ? [] : [{ name, time: Number(match[1]), sequence: Number(match[2]) }];
  });
  keyed.sort((first, second) => second.time - first.time || second.sequence - first.sequence);
  return keyed.map((item) => item.name);
}

const nodeSnapshotFileSystem: SnapshotFileSystem = {
  mkdir: (folder, options) => fs.mkdir(folder, options),
  readdir: (folder) => fs.readdir(folder),
  unlink: (filePath) => fs.unlink(filePath),
};

/** A snapshot file's record, or null when it is damaged, not genuine, a link, not a regular file or too large. */
async function readSnapshot(filePath: string, key: SnapshotKey): Promise<SnapshotRecord | null> {
  try {
    const { bytes } = await readRegularFile(filePath, { followLink: false, maxBytes: SNAPSHOT_FILE_MAX_BYTES });
    return parseSnapshotText(new TextDecoder('utf-8', { fatal: true }).decode(bytes), key);
  } catch {
    return null;
  }
}

/**
 * Open the snapshot store of a folder. Operations run one after another (never two writes
 * at once), so pruning never races a write.
 */
export function createSnapshotStore(settings: SnapshotStoreSettings): SnapshotStore {
  const files = settings.fileSystem ?? nodeSnapshotFileSystem;
  const keep = Math.max(1, settings.keep ?? 3);
  let sequence = 0;
  let queue: Promise<unknown> = Promise.resolve();

  const serial = <T>(task: () => Promise<T>): Promise<T> => {
    const run = queue.then(task, task);
    queue = run.catch(() => undefined);
    return run;
  };

  const names = async (): Promise<string[]> => {
    try {
      return newestFirst((await files.readdir(settings.folder)).filter(isSnapshotName));
    } catch (error) {
      if (typeof error === 'object' && error !== null && 'code' in error && error.code === 'ENOENT') return [];
      throw error;
    }
  };

  return {
    write: (input) =>
      serial(async () => {
        await files.mkdir(settings.folder, { recursive: true, mode: 0o700 });
        sequence += 1;
        const name = `snapshot-${input.savedAt}-${sequence}.json`;
        await writeFileAtomic(path.join(settings.folder, name), createSnapshotText(input, settings.key), settings.atomicWrite);
        const old = (await names()).filter((item) => item !== name).slice(keep - 1);
        await Promise.all(old.map((item) => files.unlink(path.join(settings.folder, item)).catch(() => undefined)));
        return name;
      }),
    list: () =>
      serial(async () => {
        const stored: StoredSnapshot[] = [];
        for (const name of await names()) {
          stored.push({ name, record: await readSnapshot(path.join(settings.folder, name), settings.key) });
        }
        return stored;
      }),
    clear: () =>
      serial(async () => {
        const all = await names();
        await Promise.all(all.map((item) => files.unlink(path.join(settings.folder, item)).catch(() => undefined)));
      }),
  };
}
