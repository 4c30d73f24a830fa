/**
 * The contract between the desktop shell and the renderer: channel names, the shapes that
 * cross them, and the API the preload puts on `window.chancewise`. The renderer imports this
 * file for types only (`import type`); the shell and the preload import its constants.
 */

/** Channels the renderer invokes (request and reply). */
export const INVOKE_CHANNELS = {
  rendererReady: 'chancewise:renderer-ready',
  newDocument: 'chancewise:new-document',
  openDocument: 'chancewise:open-document',
  openRecentDocument: 'chancewise:open-recent-document',
  saveDocument: 'chancewise:save-document',
  saveDocumentAs: 'chancewise:save-document-as',
  saveSnapshot: 'chancewise:save-snapshot',
  exportHandoutPdf: 'chancewise:export-handout-pdf',
  printHandout: 'chancewise:print-handout',
} as const;

/** One of the invoke channels. */
export type InvokeChannel = (typeof INVOKE_CHANNELS)[keyof typeof INVOKE_CHANNELS];

/** The one channel on which menu commands reach the renderer. */
export const COMMAND_CHANNEL = 'chancewise:command';

/** The channel on which the shell hands the renderer a document to show. */
export const DOCUMENT_CHANNEL = 'chancewise:document';

/** Menu commands that carry nothing but their name. */
export const PLAIN_COMMANDS = ['new', 'open', 'save', 'save-as', 'export-handout', 'print-handout'] as const;

/** A menu command's name. */
export type PlainCommandName = (typeof PLAIN_COMMANDS)[number];

/**
 * A command from the application menu. The renderer decides (for instance asks about unsaved
 * changes) and then calls the matching API function; `open-recent` names a file from the
 * shell's own recent list, which is the only place `openRecentDocument` accepts paths from.
 */
export type ShellCommand = { readonly name: PlainCommandName } | { readonly name: 'open-recent'; readonly recentPath: string };

/** Why a request failed. */
export type ShellErrorCode =
  | 'untrusted-sender'
  | 'invalid-request'
  | 'too-large'
  | 'not-a-topic-file'
  | 'not-in-recent-list'
  | 'read-failed'
  | 'write-failed'
  | 'print-failed';

/** Every reply: a value, or an error as plain data (an exception would lose all but its message). */
export type ShellResult<T> =
  | { readonly ok: true; readonly value: T }
  | { readonly ok: false; readonly error: { readonly code: ShellErrorCode; readonly message: string } };

/** A topic file the person opened. */
export interface OpenedDocument {
  /** The file's text (a topic file; read it with `readTopicFile`). */
  readonly text: string;
  /** The file's name without its folder, for the title bar. */
  readonly fileName: string;
}

/** A topic file just written. */
export interface SavedDocument {
  readonly fileName: string;
  /** When it was written (milliseconds since 1970). */
  readonly savedAt: number;
}

/**
 * An autosave snapshot of the editor's state. `content` is any plain JSON value (the
 * editor's draft); properties named `patient` or starting with `patient` (such as
 * `patientName`) are blanked before it is written to disk unless `keepPatient` is true.
 */
export interface SnapshotRequest {
  readonly content: unknown;
  readonly keepPatient: boolean;
  /** Whether the editor holds changes not yet saved to a file (asked about on closing). */
  readonly hasUnsavedChanges: boolean;
}

/** A snapshot the shell stored. */
export interface SnapshotSaved {
  readonly savedAt: number;
}

/** The handout as PDF bytes (made in the renderer), with the name to suggest. */
export interface HandoutPdfRequest {
  readonly bytes: Uint8Array;
  /** A file name without folder, e.g. "statin-handout.pdf". */
  readonly suggestedName: string;
}

/** A handout PDF just written. */
export interface ExportedHandout {
  readonly fileName: string;
}

/** The handout opened in the system's PDF viewer for printing. */
export interface PrintOutcome {
  /** The name of the file the viewer was opened on. */
  readonly fileName: string;
}

/** A document the shell hands the renderer without being asked for it right then. */
export type IncomingDocument =
  | {
      /** A file given on the command line, opened from the system, or a second launch. */
      readonly kind: 'file';
      readonly text: string;
      readonly fileName: string;
    }
  | {
      /** The editor's last snapshot: after a renderer crash, or after the app closed unexpectedly. */
      readonly kind: 'snapshot';
      readonly content: unknown;
      readonly reason: 'renderer-crashed' | 'unexpected-exit';
      /** The file the snapshot belongs to, or null for an unsaved topic. */
      readonly fileName: string | null;
    };

/**
 * The API on `window.chancewise` in the desktop app (absent in the browser version).
 * Subscribe with `onCommand` and `onDocument` first, then call `rendererReady()`: the
 * shell holds documents (a file to open, a restored snapshot) until then.
 */
export interface ChancewiseShellApi {
  /** Tell the shell the page can receive documents and commands. */
  rendererReady(): Promise<ShellResult<null>>;
  /** The topic is now a new, unsaved one (the shell forgets the current file). */
  newDocument(): Promise<ShellResult<null>>;
  /** Ask for a topic file with the system's open dialog; null when cancelled. */
  openDocument(): Promise<ShellResult<OpenedDocument | null>>;
  /** Open a file from the recent list (as given in an `open-recent` command). */
  openRecentDocument(recentPath: string): Promise<ShellResult<OpenedDocument | null>>;
  /** Save the topic file text to the current file (asks for a name the first time). */
  saveDocument(text: string): Promise<ShellResult<SavedDocument | null>>;
  /** Save the topic file text under a new name; null when cancelled. */
  saveDocumentAs(text: string): Promise<ShellResult<SavedDocument | null>>;
  /** Store an autosave snapshot (call a second or two after the last edit). */
  saveSnapshot(snapshot: SnapshotRequest): Promise<ShellResult<SnapshotSaved>>;
  /** Save the handout PDF where the person chooses; null when cancelled. */
  exportHandoutPdf(request: HandoutPdfRequest): Promise<ShellResult<ExportedHandout | null>>;
  /**
   * Print the handout: the shell writes the PDF to a private folder and opens it in the
   * system's PDF viewer, whose Print prints the handout itself (not the app's window).
   */
  printHandout(request: HandoutPdfRequest): Promise<ShellResult<PrintOutcome>>;
  /** Listen to menu commands; returns the function that stops listening. */
  onCommand(listener: (command: ShellCommand) => void): () => void;
  /** Listen to documents the shell hands over; returns the function that stops listening. */
  onDocument(listener: (document: IncomingDocument) => void): () => void;
}

/** The name of the API on `window`. */
export const SHELL_API_KEY = 'chancewise';

declare global {
  interface Window {
    /** Present only in the desktop app. */
    readonly chancewise?: ChancewiseShellApi;
  }
}
