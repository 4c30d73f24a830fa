import { createHash } from 'node:crypto';

/** The `format` field of a snapshot file. */
export const SNAPSHOT_FORMAT = 'chancewise-snapshot';

/** The current snapshot file version. */
export const SNAPSHOT_VERSION = 1;

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
  /** SHA-256 of `content` written as JSON, to tell a damaged snapshot from a good one. */
  readonly checksum: string;
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
    if (key === 'patient') copy[key] = null;
    else if (PATIENT_PREFIX.test(key)) copy[key] = typeof item === 'string' ? '' : null;
    else copy[key] = stripPatientFields(item);
  }
  return copy;
}

/** The SHA-256 checksum (hex) of a value written as JSON. */
export function contentChecksum(content: unknown): string {
  return createHash('sha256').update(JSON.stringify(content) ?? 'undefined').digest('hex');
}

/**
 * The text of a snapshot file. Patient fields are stripped unless the person chose to keep
 * them; the checksum covers the content as stored.
 */
export function createSnapshotText(input: SnapshotInput): string {
  const content = input.keepPatient ? input.content : stripPatientFields(input.content);
  const record: SnapshotRecord = {
    format: SNAPSHOT_FORMAT,
    version: SNAPSHOT_VERSION,
    savedAt: input.savedAt,
    documentPath: input.documentPath,
    keepsPatient: input.keepPatient,
    content,
    checksum: contentChecksum(content),
  };
  return `${JSON.stringify(record)}\n`;
}

/**
 * Read a snapshot file's text, or null when it is not a complete, undamaged snapshot of
 * this version (not JSON, wrong format or version, a field of the wrong type, or content that
 * does not match its checksum).
 */
export function parseSnapshotText(text: string): SnapshotRecord | null {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return null;
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) return null;
  const record = data as Record<string, unknown>;
  if (record.format !== SNAPSHOT_FORMAT || record.version !== SNAPSHOT_VERSION) return null;
  const { savedAt, documentPath, keepsPatient, content, checksum } = record;
  if (typeof savedAt !== 'number' || !Number.isSafeInteger(savedAt) || savedAt < 0) return null;
  if (documentPath !== null && typeof documentPath !== 'string') return null;
  if (typeof keepsPatient !== 'boolean' || typeof checksum !== 'string' || !('content' in record)) return null;
  if (contentChecksum(content) !== checksum) return null;
  return { format: SNAPSHOT_FORMAT, version: SNAPSHOT_VERSION, savedAt, documentPath, keepsPatient, content, checksum };
}
