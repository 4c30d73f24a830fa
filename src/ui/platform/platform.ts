/**
 * What the interface needs from where it runs: picking a file to open, saving a file,
 * and a place to keep small settings. The browser build provides it with a file input,
 * a download and local storage; the desktop shell provides it over its preload bridge.
 */
import type { KeyValueStorage } from '../state/key-value-storage.ts';

export interface OpenedFile {
  readonly name: string;
  readonly text: string;
}

export interface Platform {
  readonly kind: 'browser' | 'desktop';
  /** Ask for a file to open; null when the person cancels. */
  pickTextFile(accept: string): Promise<OpenedFile | null>;
  /** Save bytes or text under a suggested name; returns the name used, or null when cancelled. */
  saveFile(suggestedName: string, contents: string | Uint8Array, type: string): Promise<string | null>;
  readonly storage: KeyValueStorage;
  /** True when a recent file can be reopened by name without asking (the desktop shell). */
  readonly reopensByName: boolean;
}
