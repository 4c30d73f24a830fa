/**
 * The autosaved copy of the work in progress, kept in the browser's storage so that a
 * closed tab or a crash loses nothing. Patient-identifying details are never stored.
 */
import { parseDraft } from '../draft/draft-schema.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';
import type { KeyValueStorage } from './key-value-storage.ts';

/** What is kept: the draft, the file it came from, when, and whether it had unsaved changes. */
export interface AutosaveRecord {
  readonly draft: TopicDraft;
  readonly fileName: string | null;
  readonly savedAt: string;
  readonly unsaved: boolean;
}

export const AUTOSAVE_KEY = 'chancewise.autosave.v1';

/** The draft without the patient's name and reference. */
export function withoutPatient(draft: TopicDraft): TopicDraft {
  return { ...draft, patientName: '', patientReference: '' };
}

export class Autosave {
  readonly #storage: KeyValueStorage;
  readonly #key: string;

  constructor(storage: KeyValueStorage, key = AUTOSAVE_KEY) {
    this.#storage = storage;
    this.#key = key;
  }

  /** Store a copy; returns false when the storage refused it (full or switched off). */
  save(record: AutosaveRecord): boolean {
    const stored = { ...record, draft: withoutPatient(record.draft) };
    try {
      this.#storage.setItem(this.#key, JSON.stringify(stored));
      return true;
    } catch {
      return false;
    }
  }

  /** The stored copy, or null when there is none or it is damaged. */
  load(): AutosaveRecord | null {
    let data: unknown;
    try {
      const text = this.#storage.getItem(this.#key);
      if (text === null) return null;
      data = JSON.parse(text);
    } catch {
      return null;
    }
    if (typeof data !== 'object' || data === null) return null;
    const record = data as Record<string, unknown>;
    const draft = parseDraft(record.draft);
    if (draft === null || typeof record.savedAt !== 'string' || typeof record.unsaved !== 'boolean') return null;
    const fileName = typeof record.fileName === 'string' ? record.fileName : null;
    return { draft, fileName, savedAt: record.savedAt, unsaved: record.unsaved };
  }

  clear(): void {
    try {
      this.#storage.removeItem(this.#key);
    } catch {
      // Nothing to do: a storage that cannot remove has nothing we can reach.
    }
  }
}
