import { createHmac, timingSafeEqual } from 'node:crypto';

/** The `format` field of a snapshot file. */
export const SNAPSHOT_FORMAT = 'chancewise-snapshot';

/** The current snapshot file version (2: sealed with a secret key; 1 had a plain checksum and is not read). */
export const SNAPSHOT_VERSION = 2;

/** The secret key snapshots are sealed with (32 random bytes, see `snapshot-key.ts`). */
export type SnapshotKey = Uint8Array;

/** One autosave snapshot as stored in `userData/snapshots`. */
export interface SnapshotRecord {
  readonly format: typeof SNAPSHOT_FORMAT;
  readonly version: typeof SNAPSHOT_VERSION;
  /** When the snapshot was taken (milliseconds since 1970). */
  readonly savedAt: number;
  /** The file the editor's topic belongs to, or null for a topic never saved. */
  readonly documentPath: string | null;
  /** Whether patient details were kept (the person chose to keep them in the topic). */
  readonly keepsPatient: boolean;
  /** The editor's state (plain JSON). */
  readonly content: unknown;
  /**
   * HMAC-SHA-256, under the app's secret key, of every other field written as JSON: a
   * damaged snapshot fails it, and so does one written by anyone without the key (a
   * plain checksum would let them write a snapshot that points Save at any file).
   */
  readonly seal: string;
}

/** What a new snapshot is made from. */
export interface SnapshotInput {
  readonly content: unknown;
  readonly keepPatient: boolean;
  readonly documentPath: string | null;
  readonly savedAt: number;
}

const PATIENT_PREFIX = /^patient(?:[A-Z_]|$)/u;

/**
 * A copy of plain JSON data with patient-identifying fields blanked: a property named
 * `patient` becomes null, and one named `patient…` (such as `patientName`,
 * `patientReference`) becomes an empty string when it held text, null otherwise. Works at
 * any depth, so it covers both a topic file (`topic.patient`) and the editor's draft.
 */
export function stripPatientFields(value: unknown): unknown {
  if (Array.isArray(value)) return value.map((item) => stripPatientFields(item));
  if (typeof value !== 'object' || value === null) return value;
  const copy: Record<string, unknown> = {};
  for (const [key, item] of Object.entries(value)) {
    let kept: unknown;
    if (key === 'patient') kept = null;
    else if (PATIENT_PREFIX.test(key)) kept = typeof item === 'string' ? '' : null;
    else kept = stripPatientFields(item);
    // Defined, not assigned: an own "__proto__" key (JSON.parse makes one) would otherwise
    // set the copy's prototype and its subtree would silently vanish from the snapshot.
    Object.defineProperty(copy, key, { value: kept, enumerable: true, writable: true, configurable: true });
  }
  return copy;
}

/** HMAC-SHA-256 (RFC 2104, FIPS 198-1) of a text under a key, as hex. */
export function sealOf(key: SnapshotKey, text: string): string {
  return createHmac('sha256', key).update(text).digest('hex');
}

/** The text a snapshot's seal covers: every field but the seal, in a fixed order. */
function sealedText(record: Omit<SnapshotRecord, 'seal'>): string {
  return JSON.stringify([
    record.format,
    record.version,
    record.savedAt,
    record.documentPath,
    record.keepsPatient,
    record.content ?? null,
  ]);
}

function sealMatches(expected: string, given: string): boolean {
  const wanted = Buffer.from(expected, 'hex');
  const found = /^[0-9a-f]{64}$/u.test(given) ? Buffer.from(given, 'hex') : Buffer.alloc(0);
  return found.byteLength === wanted.byteLength && timingSafeEqual(found, wanted);
}

/**
 * The text of a snapshot file. Patient fields are stripped unless the person chose to keep
 * them; the seal covers every field as stored.
 */
export function createSnapshotText(input: SnapshotInput, key: SnapshotKey): string {
  const content = input.keepPatient ? input.content : stripPatientFields(input.content);
  const unsealed = {
    format: SNAPSHOT_FORMAT,
    version: SNAPSHOT_VERSION,
    savedAt: input.savedAt,
    documentPath: input.documentPath,
    keepsPatient: input.keepPatient,
    content,
  } as const;
  const record: SnapshotRecord = { ...unsealed, seal: sealOf(key, sealedText(unsealed)) };
  return `${JSON.stringify(record)}\n`;
}

/**
 * Read a snapshot file's text, or null when it is not a complete, genuine snapshot of this
 * version (not JSON, wrong format or version, a field of the wrong type, or a seal that does
 * not match under this key: damaged, or written by someone without the key).
 */
export function parseSnapshotText(text: string, key: SnapshotKey): SnapshotRecord | null {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return null;
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) return null;
  const record = data as Record<string, unknown>;
  if (record.format !== SNAPSHOT_FORMAT || record.version !== SNAPSHOT_VERSION) return null;
  const { savedAt, documentPath, keepsPatient, content, seal } = record;
  if (typeof savedAt !== 'number' || !Number.isSafeInteger(savedAt) || savedAt < 0) return null;
  if (documentPath !== null && typeof documentPath !== 'string') return null;
  if (typeof keepsPatient !== 'boolean' || typeof seal !== 'string' || !Object.hasOwn(record, 'content')) return null;
  const unsealed = { format: SNAPSHOT_FORMAT, version: SNAPSHOT_VERSION, savedAt, documentPath, keepsPatient, content } as const;
  if (!sealMatches(sealOf(key, sealedText(unsealed)), seal)) return null;
  return { ...unsealed, seal };
}
