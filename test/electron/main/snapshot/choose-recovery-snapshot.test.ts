// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { chooseRecoverySnapshot } from '../../../../electron/main/snapshot/choose-recovery-snapshot.ts';
import type { SnapshotCandidate } from '../../../../electron/main/snapshot/choose-recovery-snapshot.ts';
import type { SnapshotRecord } from '../../../../electron/main/snapshot/snapshot-record.ts';

function record(savedAt: number, documentPath: string | null = '/h/t.cwtopic'): SnapshotRecord {
  return {
    format: 'chancewise-snapshot',
    version: 2,
    savedAt,
    documentPath,
    keepsPatient: false,
    content: { at: savedAt },
    seal: 'x',
  };
}

function candidate(name: string, snapshot: SnapshotRecord | null, documentSavedAt: number | null): SnapshotCandidate {
  return { name, record: snapshot, documentSavedAt };
}

describe('chooseRecoverySnapshot()', () => {
  // Offer the newest intact snapshot that is newer than the saved file: common practice for crash
  // recovery (a snapshot older than the file holds nothing the file lacks).

  it('offers nothing when there are no snapshots', () => {
    expect(chooseRecoverySnapshot([])).toBeNull();
  });

  it('picks the newest valid snapshot taken after the file was last saved', () => {
    const chosen = chooseRecoverySnapshot([
      candidate('snapshot-100-1.json', record(100), 50),
      candidate('snapshot-300-3.json', record(300), 50),
      candidate('snapshot-200-2.json', record(200), 50),
    ]);
    expect(chosen?.name).toBe('snapshot-300-3.json');
  });

  it('skips a damaged newest snapshot and falls back to the newest good one', () => {
    const chosen = chooseRecoverySnapshot([
      candidate('snapshot-300-3.json', null, 50),
      candidate('snapshot-200-2.json', record(200), 50),
    ]);
    expect(chosen?.name).toBe('snapshot-200-2.json');
  });

  it('offers nothing when the file was saved after every snapshot (the file already has it all)', () => {
    expect(
      chooseRecoverySnapshot([
        candidate('snapshot-100-1.json', record(100), 100),
        candidate('snapshot-90-2.json', record(90), 100),
      ]),
    ).toBeNull();
  });

  it('offers a snapshot of a topic never saved, or whose file is gone', () => {
    expect(chooseRecoverySnapshot([candidate('snapshot-10-1.json', record(10, null), null)])?.name).toBe('snapshot-10-1.json');
    expect(chooseRecoverySnapshot([candidate('snapshot-10-1.json', record(10), null)])?.name).toBe('snapshot-10-1.json');
  });

  it('orders snapshots of the same millisecond by name', () => {
    const chosen = chooseRecoverySnapshot([
      candidate('snapshot-5-1.json', record(5), null),
      candidate('snapshot-5-2.json', record(5), null),
    ]);
    expect(chosen?.name).toBe('snapshot-5-2.json');
  });

  it("compares each snapshot with its own file's save time", () => {
    const chosen = chooseRecoverySnapshot([
      candidate('snapshot-500-2.json', record(500, '/h/saved-later.cwtopic'), 600),
      candidate('snapshot-400-1.json', record(400, '/h/other.cwtopic'), 100),
    ]);
    expect(chosen?.name).toBe('snapshot-400-1.json');
  });
});
