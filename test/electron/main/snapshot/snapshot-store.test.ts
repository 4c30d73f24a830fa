// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createSnapshotStore, isSnapshotName, newestFirst } from '../../../../electron/main/snapshot/snapshot-store.ts';

let base: string;
// A fixed key for the tests (the app makes a random one, see snapshot-key.ts).
const key = Buffer.alloc(32, 7);

beforeEach(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-snapshots-'));
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

describe('createSnapshotStore()', () => {
  // Snapshots apart from the person's files, kept to the newest few: common practice for editors'
  // crash recovery ("hot exit" backups); patient details stay out unless the person keeps them.

  it('writes snapshots into its own folder, without patient details, keeping the newest three', async () => {
    const folder = path.join(base, 'userData', 'snapshots');
    const store = createSnapshotStore({ folder, key });
    for (const savedAt of [10, 20, 30, 40]) {
      await store.write({ content: { savedAt, patientName: 'Ann Example' }, keepPatient: false, documentPath: null, savedAt });
    }
    const stored = await store.list();
    expect(stored.map((item) => item.record?.savedAt)).toEqual([40, 30, 20]);
    expect(stored[0]?.record?.content).toEqual({ savedAt: 40, patientName: '' });
    for (const name of await fs.readdir(folder))
      expect(await fs.readFile(path.join(folder, name), 'utf8')).not.toContain('Ann Example');
    if (process.platform !== 'win32') expect((await fs.stat(folder)).mode & 0o777).toBe(0o700);
  });

  it('lists a damaged snapshot with no record, and clears every snapshot', async () => {
    const folder = path.join(base, 'snapshots');
    const store = createSnapshotStore({ folder, key });
    await store.write({ content: { a: 1 }, keepPatient: false, documentPath: '/h/t.cwtopic', savedAt: 100 });
    await fs.writeFile(path.join(folder, 'snapshot-200-9.json'), '{"format":"chancewise-snap');
    await fs.writeFile(path.join(folder, 'notes.txt'), 'not a snapshot');
    expect((await store.list()).map((item) => [item.name, item.record === null])).toEqual([
      ['snapshot-200-9.json', true],
      ['snapshot-100-1.json', false],
    ]);
    await store.clear();
    expect(await fs.readdir(folder)).toEqual(['notes.txt']);
  });

  it('lists nothing when the folder does not exist yet', async () => {
    expect(await createSnapshotStore({ folder: path.join(base, 'none'), key }).list()).toEqual([]);
  });

  it('runs writes one after another, so concurrent writes all land and pruning keeps the newest', async () => {
    const store = createSnapshotStore({ folder: path.join(base, 's'), key, keep: 2 });
    await Promise.all(
      [1, 2, 3, 4, 5].map((savedAt) => store.write({ content: { savedAt }, keepPatient: false, documentPath: null, savedAt })),
    );
    expect((await store.list()).map((item) => item.record?.savedAt)).toEqual([5, 4]);
  });
});

describe('newestFirst() and isSnapshotName()', () => {
  it('orders by time then sequence, numerically, and ignores other names', () => {
    expect(newestFirst(['snapshot-9-1.json', 'snapshot-10-1.json', 'snapshot-10-2.json', 'x.json'])).toEqual([
      'snapshot-10-2.json',
      'snapshot-10-1.json',
      'snapshot-9-1.json',
    ]);
    expect(isSnapshotName('snapshot-1-1.json')).toBe(true);
    expect(isSnapshotName('../snapshot-1-1.json')).toBe(false);
    expect(isSnapshotName('.snapshot-1-1.json.123-ab.tmp')).toBe(false);
  });
});
