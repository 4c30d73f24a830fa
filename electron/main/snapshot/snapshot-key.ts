import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { readRegularFile } from '../../../src/shared/regular-file.ts';
import type { RegularFileInfo } from '../../../src/shared/regular-file.ts';
import { writeFileAtomic } from '../files/atomic-write.ts';
import { OWNER_ONLY_MODE } from '../files/file-mode-rule.ts';
import type { SnapshotKey } from './snapshot-record.ts';

/** The key's file in the user-data folder. */
export const SNAPSHOT_KEY_FILE = 'snapshot-key';

/** Bytes of the key: 256 bits, the HMAC-SHA-256 block's own output size (RFC 2104 §3: at least that long). */
const KEY_BYTES = 32;

/** Who may trust a key file: on POSIX systems it must be the user's own and closed to everyone else. */
export interface KeyOwner {
  readonly platform: NodeJS.Platform;
  /** The user id of this process (`process.getuid()`); null where there is none (Windows). */
  readonly userId: number | null;
}

const thisProcess: KeyOwner = { platform: process.platform, userId: process.getuid?.() ?? null };

/** Whether a key file can be trusted: owned by this user and not readable or writable by others (POSIX). */
export function isPrivateKeyFile(info: Pick<RegularFileInfo, 'mode' | 'uid'>, owner: KeyOwner): boolean {
  if (owner.platform === 'win32') return true;
  return (info.mode & 0o077) === 0 && (owner.userId === null || info.uid === owner.userId);
}

async function readKey(keyPath: string, owner: KeyOwner): Promise<SnapshotKey | null> {
  try {
    const { bytes, info } = await readRegularFile(keyPath, { followLink: false, maxBytes: KEY_BYTES * 2 + 1 });
    const text = new TextDecoder().decode(bytes).trim();
    if (!isPrivateKeyFile(info, owner) || !/^[0-9a-f]{64}$/u.test(text)) return null;
    return Buffer.from(text, 'hex');
  } catch {
    return null;
  }
}

/**
 * The secret key that seals snapshots, kept in the user-data folder in a file only its
 * owner can read and write (0600). A missing, damaged or untrustworthy key file (a link,
 * readable by others, someone else's) is removed and replaced by a new random key (a link
 * is never written through), so snapshots sealed
 * under the old one are no longer offered: safer than trusting a key others may have read.
 */
export async function loadSnapshotKey(userDataPath: string, owner: KeyOwner = thisProcess): Promise<SnapshotKey> {
  const keyPath = path.join(userDataPath, SNAPSHOT_KEY_FILE);
  const existing = await readKey(keyPath, owner);
  if (existing !== null) return existing;
  const key = randomBytes(KEY_BYTES);
  // Whatever stood there goes first: a link is removed, never written through.
  await fs.rm(keyPath, { force: true });
  await writeFileAtomic(keyPath, `${key.toString('hex')}\n`, { mode: OWNER_ONLY_MODE });
  return key;
}
