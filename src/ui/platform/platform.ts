/**
 * What the interface needs from where it runs. The browser build provides it with a file
 * input, downloads and local storage (`browser-platform.ts`); the desktop shell provides it
 * over its preload bridge, `window.chancewise` (`desktop-platform.ts`).
 */
import type { KeyValueStorage } from '../state/key-value-storage.ts';

export interface OpenedFile {
  readonly name: string;
  readonly text: string;
}

/** Something the desktop shell asks of the page (from its menu). */
export type PlatformCommand =
  | { readonly name: 'new' | 'open' | 'save' | 'save-as' | 'export-handout' | 'print-handout' }
  | { readonly name: 'open-recent'; readonly recentPath: string };

/** A document the desktop shell hands over unasked: a file opened from the system, or the last snapshot after a crash. */
export type PlatformDocument =
  | { readonly kind: 'file'; readonly file: OpenedFile }
  | { readonly kind: 'snapshot'; readonly content: unknown; readonly fileName: string | null };

export interface PlatformEvents {
  command(command: PlatformCommand): void;
  document(document: PlatformDocument): void;
}

export interface Platform {
  readonly kind: 'browser' | 'desktop';
  readonly storage: KeyValueStorage;
  /** True when the platform asks for the file name itself (a save dialog); the browser needs one from the app. */
  readonly namesFilesItself: boolean;
  /** Ask for a topic file to open; null when the person cancels. */
  openTopicFile(): Promise<OpenedFile | null>;
  /** Open a recent file by the name or path the platform gave it; the browser can only ask again. */
  openRecentTopicFile(nameOrPath: string): Promise<OpenedFile | null>;
  /** Save topic file text; returns the file name used, or null when cancelled. */
  saveTopicFile(text: string, suggestedName: string, mode: 'save' | 'save-as'): Promise<string | null>;
  /** Ask for any text file (not a topic: for instance a teaching set); null when cancelled. */
  pickTextFile(accept: string): Promise<OpenedFile | null>;
  /** Save bytes or text under a suggested name (an exported chart); returns the name used, or null when cancelled. */
  saveFile(suggestedName: string, contents: string | Uint8Array, type: string): Promise<string | null>;
  /** Save the handout PDF; returns the name used, or null when cancelled. */
  saveHandout(suggestedName: string, pdf: Uint8Array): Promise<string | null>;
  /**
   * Print the handout `make` gives (called once; null: nothing to print): the desktop opens it
   * in the system's PDF viewer, a browser in a new tab. Returns the name shown, or null.
   */
  printHandout(suggestedName: string, make: () => Promise<Uint8Array | null>): Promise<string | null>;
  /** The editor now holds a new, unsaved topic (the desktop shell forgets its current file). */
  topicReplaced(): void;
  /** Keep a crash-recovery copy of the draft (the desktop shell; the browser keeps its own autosave). */
  snapshot(content: unknown, hasUnsavedChanges: boolean): void;
  /** Start receiving commands and documents (the desktop shell); nothing happens in the browser. */
  connect(events: PlatformEvents): void;
}
