import type { SnapshotRecord } from './snapshot-record.ts';

/** One snapshot file found at start-up, with what is known about its topic's file. */
export interface SnapshotCandidate {
  /** The snapshot's file name (used to order snapshots taken in the same millisecond). */
  readonly name: string;
  /** The snapshot, or null when its file was damaged or unreadable. */
  readonly record: SnapshotRecord | null;
  /**
   * When the topic's file was last saved (its modification time), or null when the topic
   * was never saved or its file is gone.
   */
  readonly documentSavedAt: number | null;
}

/** A candidate known to hold a valid snapshot. */
export type ValidSnapshotCandidate = SnapshotCandidate & { readonly record: SnapshotRecord };

/**
 * The snapshot to offer for recovery after the app closed unexpectedly: the newest valid
 * snapshot taken after its topic's file was last saved (a snapshot older than the saved
 * file has nothing the file lacks). Null when there is none.
 */
export function chooseRecoverySnapshot(candidates: readonly SnapshotCandidate[]): ValidSnapshotCandidate | null {
  let best: ValidSnapshotCandidate | null = null;
  for (const candidate of candidates) {
    const { record } = candidate;
    if (record === null) continue;
    if (candidate.documentSavedAt !== null && record.savedAt <= candidate.documentSavedAt) continue;
    const valid: ValidSnapshotCandidate = { ...candidate, record };
    if (
      best === null ||
      record.savedAt > best.record.savedAt ||
      (record.savedAt === best.record.savedAt && candidate.name > best.name)
    ) {
      best = valid;
    }
  }
  return best;
}
