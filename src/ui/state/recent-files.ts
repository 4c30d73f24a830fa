/**
 * The names of recently opened or saved topic files, newest first. In the browser only
 * the names are known (a page cannot reopen a file by itself); the desktop shell can
 * keep full paths in the same list.
 */
import type { KeyValueStorage } from './key-value-storage.ts';

export const RECENT_FILES_KEY = 'chancewise.recent-files.v1';

export class RecentFiles {
  readonly #storage: KeyValueStorage;
  readonly #limit: number;

  constructor(storage: KeyValueStorage, limit = 6) {
    this.#storage = storage;
    this.#limit = limit;
  }

  /** The names, newest first. */
  list(): string[] {
    try {
      const data: unknown = JSON.parse(this.#storage.getItem(RECENT_FILES_KEY) ?? '[]');
      return Array.isArray(data) ? data.filter((item): item is string => typeof item === 'string').slice(0, this.#limit) : [];
    } catch {
      return [];
    }
  }

  /** Put a name first (once), keeping at most the limit; returns the new list. */
  add(name: string): string[] {
    const names = [name, ...this.list().filter((item) => item !== name)].slice(0, this.#limit);
    try {
      this.#storage.setItem(RECENT_FILES_KEY, JSON.stringify(names));
    } catch {
      // A full or switched-off storage only loses the list, never the work.
    }
    return names;
  }

  clear(): void {
    try {
      this.#storage.removeItem(RECENT_FILES_KEY);
    } catch {
      // As above.
    }
  }
}
