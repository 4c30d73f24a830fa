/** The part of the Web Storage interface the app uses, so tests and the desktop shell can supply their own. */
export interface KeyValueStorage {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

/** A storage that keeps nothing beyond this page (when the browser's storage is unavailable). */
export class MemoryStorage implements KeyValueStorage {
  readonly #items = new Map<string, string>();

  getItem(key: string): string | null {
    return this.#items.get(key) ?? null;
  }

  setItem(key: string, value: string): void {
    this.#items.set(key, value);
  }

  removeItem(key: string): void {
    this.#items.delete(key);
  }
}

/** The browser's local storage when it works (it may be switched off or full), otherwise a memory store. */
export function browserStorage(): KeyValueStorage {
  try {
    const storage = globalThis.localStorage;
    const probe = '__chancewise_probe__';
    storage.setItem(probe, probe);
    storage.removeItem(probe);
    return storage;
  } catch {
    return new MemoryStorage();
  }
}
