import fs from 'node:fs/promises';
import { chooseRecoverySnapshot } from './choose-recovery-snapshot.ts';
import type { SnapshotCandidate, ValidSnapshotCandidate } from './choose-recovery-snapshot.ts';
import type { SnapshotStore } from './snapshot-store.ts';

/** A file's modification time (milliseconds since 1970), or null when there is no such file. */
export async function modificationTime(filePath: string | null): Promise<number | null> {
  if (filePath === null) return null;
  try {
    return (await fs.stat(filePath)).mtimeMs;
  } catch {
    return null;
  }
}

/**
 * At start-up, the snapshot to offer for recovery (see `chooseRecoverySnapshot`), each
 * compared with its own file's modification time. When none is worth offering, the stale
 * snapshots are removed.
 */
export async function findRecoverySnapshot(store: SnapshotStore): Promise<ValidSnapshotCandidate | null> {
  const candidates: SnapshotCandidate[] = await Promise.all(
    (await store.list()).map(async (stored) => ({
      name: stored.name,
      record: stored.record,
      documentSavedAt: await modificationTime(stored.record?.documentPath ?? null),
    })),
  );
  const chosen = chooseRecoverySnapshot(candidates);
  if (chosen === null && candidates.length > 0) await store.clear();
  return chosen;
}
