import { describe, expect, test } from 'vitest';
import { blankDraft } from '../../../src/ui/draft/draft-edits.ts';
import { AUTOSAVE_KEY, Autosave } from '../../../src/ui/state/autosave.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import type { KeyValueStorage } from '../../../src/ui/state/key-value-storage.ts';
import { RecentFiles } from '../../../src/ui/state/recent-files.ts';

const record = {
  draft: { ...blankDraft(), title: 'Work in progress', patientName: 'Ann Example', patientReference: 'NHS 000' },
  fileName: 'work.chancewise.json',
  savedAt: '2026-11-03T09:30:00.000Z',
  unsaved: true,
};

describe('Autosave', () => {
  test('stores and restores the draft, leaving out the patient’s name and reference', () => {
    const storage = new MemoryStorage();
    const autosave = new Autosave(storage);
    expect(autosave.save(record)).toBe(true);
    expect(storage.getItem(AUTOSAVE_KEY)).not.toContain('Ann Example');
    expect(autosave.load()).toEqual({ ...record, draft: { ...record.draft, patientName: '', patientReference: '' } });
  });

  test('refuses a damaged or foreign copy', () => {
    const storage = new MemoryStorage();
    const autosave = new Autosave(storage);
    storage.setItem(AUTOSAVE_KEY, '{"draft": {"title": 3}');
    expect(autosave.load()).toBeNull();
    storage.setItem(AUTOSAVE_KEY, JSON.stringify({ ...record, draft: { title: 'only a title' } }));
    expect(autosave.load()).toBeNull();
  });

  test('reports a full storage instead of throwing', () => {
    const full: KeyValueStorage = {
      getItem: () => null,
      setItem: () => {
        throw new Error('QuotaExceededError');
      },
      removeItem: () => undefined,
    };
    expect(new Autosave(full).save(record)).toBe(false);
  });
});

describe('RecentFiles', () => {
  test('lists names newest first, once each, up to its limit', () => {
    const recent = new RecentFiles(new MemoryStorage(), 3);
    for (const name of ['a.json', 'b.json', 'a.json', 'c.json', 'd.json']) recent.add(name);
    expect(recent.list()).toEqual(['d.json', 'c.json', 'a.json']);
  });

  test('ignores a damaged list', () => {
    const storage = new MemoryStorage();
    storage.setItem('chancewise.recent-files.v1', '{not json');
    expect(new RecentFiles(storage).list()).toEqual([]);
  });
});
