import { INVOKE_CHANNELS } from '../../contract/ipc-contract.ts';
import type {
  ExportedHandout,
  HandoutPdfRequest,
  InvokeChannel,
  OpenedDocument,
  PrintOutcome,
  SavedDocument,
  ShellErrorCode,
  ShellResult,
  SnapshotRequest,
  SnapshotSaved,
} from '../../contract/ipc-contract.ts';
import { isTrustedSender } from './ipc-guard.ts';
import type { IpcEventLike } from './ipc-guard.ts';
import {
  checkDocumentText,
  checkHandoutPdfRequest,
  checkNoArguments,
  checkRecentPath,
  checkSnapshotRequest,
} from './ipc-payloads.ts';
import type { PayloadCheck } from './ipc-payloads.ts';
import { SHELL_MESSAGES, ShellFailure } from './shell-failure.ts';

/**
 * What the shell does for each request, once the sender and the payload have been checked.
 * `sender` is the web contents the request came from. An action reports a failure by
 * throwing `ShellFailure`.
 */
export interface ShellActions<Sender> {
  rendererReady(sender: Sender): Promise<null>;
  newDocument(sender: Sender): Promise<null>;
  openDocument(sender: Sender): Promise<OpenedDocument | null>;
  openRecentDocument(sender: Sender, recentPath: string): Promise<OpenedDocument | null>;
  saveDocument(sender: Sender, text: string): Promise<SavedDocument | null>;
  saveDocumentAs(sender: Sender, text: string): Promise<SavedDocument | null>;
  saveSnapshot(sender: Sender, snapshot: SnapshotRequest): Promise<SnapshotSaved>;
  exportHandoutPdf(sender: Sender, request: HandoutPdfRequest): Promise<ExportedHandout | null>;
  printHandout(sender: Sender, request: HandoutPdfRequest): Promise<PrintOutcome>;
}

/** The part of Electron's `ipcMain` used: `handle` only (every channel is request and reply). */
export interface IpcMainLike {
  handle(channel: string, listener: (event: IpcEventLike, ...args: unknown[]) => Promise<unknown>): void;
}

/** What the IPC layer needs besides the actions. */
export interface IpcHandlerSettings<Sender> {
  /** Whether a web contents is one the app created (its main window). */
  readonly isOwnContents: (contents: unknown) => contents is Sender;
  readonly actions: ShellActions<Sender>;
  /** Where refused and failed requests are reported (the app's log). */
  readonly report?: (channel: InvokeChannel, code: ShellErrorCode, detail: string) => void;
  /** The code of an unexpected failure, per channel (a read or a write). */
  readonly fallbackCode?: (channel: InvokeChannel) => ShellErrorCode;
}

function failure(code: ShellErrorCode): ShellResult<never> {
  return { ok: false, error: { code, message: SHELL_MESSAGES[code] } };
}

function defaultFallback(channel: InvokeChannel): ShellErrorCode {
  if (channel === INVOKE_CHANNELS.openDocument || channel === INVOKE_CHANNELS.openRecentDocument) return 'read-failed';
  if (channel === INVOKE_CHANNELS.printHandout) return 'print-failed';
  return 'write-failed';
}

/**
 * Register every IPC handler of the app; the only place `ipcMain.handle` is called. Each
 * handler first checks the sender (main frame of the app's own window, on the app origin),
 * then the arguments (sizes first, then type guards), and only then runs the action. Every
 * reply is a `ShellResult` value: refusals and failures cross as data, never as exceptions,
 * even when a check itself throws.
 */
export function registerIpcHandlers<Sender>(ipcMain: IpcMainLike, settings: IpcHandlerSettings<Sender>): void {
  const report = settings.report ?? (() => undefined);
  const fallbackCode = settings.fallbackCode ?? defaultFallback;

  const register = <Payload, Value>(
    channel: InvokeChannel,
    check: (args: readonly unknown[]) => PayloadCheck<Payload>,
    run: (sender: Sender, payload: Payload) => Promise<Value>,
  ): void => {
    ipcMain.handle(channel, async (event, ...args): Promise<ShellResult<Value>> => {
      if (!isTrustedSender(event, settings.isOwnContents)) {
        report(channel, 'untrusted-sender', event.senderFrame?.url ?? 'no frame');
        return failure('untrusted-sender');
      }
      const sender = event.sender as Sender;
      try {
        let checked: PayloadCheck<Payload>;
        try {
          checked = check(args);
        } catch (error) {
          // A payload the checks could not even inspect is refused like any malformed one.
          report(channel, 'invalid-request', `the check failed: ${error instanceof Error ? error.message : String(error)}`);
          return failure('invalid-request');
        }
        if (!checked.ok) {
          report(channel, checked.code, `${args.length} argument(s)`);
          return failure(checked.code);
        }
        return { ok: true, value: await run(sender, checked.value) };
      } catch (error) {
        const code = error instanceof ShellFailure ? error.code : fallbackCode(channel);
        report(channel, code, error instanceof Error ? error.message : String(error));
        return { ok: false, error: { code, message: error instanceof ShellFailure ? error.message : SHELL_MESSAGES[code] } };
      }
    });
  };

  const { actions } = settings;
  register(INVOKE_CHANNELS.rendererReady, checkNoArguments, (sender) => actions.rendererReady(sender));
  register(INVOKE_CHANNELS.newDocument, checkNoArguments, (sender) => actions.newDocument(sender));
  register(INVOKE_CHANNELS.openDocument, checkNoArguments, (sender) => actions.openDocument(sender));
  register(INVOKE_CHANNELS.openRecentDocument, checkRecentPath, (sender, path) => actions.openRecentDocument(sender, path));
  register(INVOKE_CHANNELS.saveDocument, checkDocumentText, (sender, text) => actions.saveDocument(sender, text));
  register(INVOKE_CHANNELS.saveDocumentAs, checkDocumentText, (sender, text) => actions.saveDocumentAs(sender, text));
  register(INVOKE_CHANNELS.saveSnapshot, checkSnapshotRequest, (sender, snapshot) => actions.saveSnapshot(sender, snapshot));
  register(INVOKE_CHANNELS.exportHandoutPdf, checkHandoutPdfRequest, (sender, request) =>
    actions.exportHandoutPdf(sender, request),
  );
  register(INVOKE_CHANNELS.printHandout, checkHandoutPdfRequest, (sender, request) => actions.printHandout(sender, request));
}
