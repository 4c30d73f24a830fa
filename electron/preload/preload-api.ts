import { COMMAND_CHANNEL, DOCUMENT_CHANNEL, INVOKE_CHANNELS, PLAIN_COMMANDS } from '../contract/ipc-contract.ts';
import type { ChancewiseShellApi, IncomingDocument, ShellCommand, ShellResult } from '../contract/ipc-contract.ts';

/** The part of Electron's `ipcRenderer` the API is built on. */
export interface IpcRendererLike {
  invoke(channel: string, ...args: unknown[]): Promise<unknown>;
  on(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
  removeListener(channel: string, listener: (event: unknown, ...args: unknown[]) => void): unknown;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Whether a message on the command channel is a command the contract knows. */
export function isShellCommand(value: unknown): value is ShellCommand {
  if (!isRecord(value)) return false;
  if (value.name === 'open-recent') return typeof value.recentPath === 'string';
  return (PLAIN_COMMANDS as readonly unknown[]).includes(value.name);
}

/** Whether a message on the document channel is a document the contract knows. */
export function isIncomingDocument(value: unknown): value is IncomingDocument {
  if (!isRecord(value)) return false;
  if (value.kind === 'file') return typeof value.text === 'string' && typeof value.fileName === 'string';
  if (value.kind !== 'snapshot') return false;
  const reasonKnown = value.reason === 'renderer-crashed' || value.reason === 'unexpected-exit';
  return reasonKnown && (value.fileName === null || typeof value.fileName === 'string') && 'content' in value;
}

/**
 * Build the API the preload exposes on `window.chancewise`: one named function per channel,
 * never `ipcRenderer` itself. Listeners get only the message, never the IPC event (which
 * would lead back to `ipcRenderer`), and only messages of the expected shape.
 */
export function createShellApi(ipc: IpcRendererLike): ChancewiseShellApi {
  const invoke = <T>(channel: string, ...args: unknown[]): Promise<ShellResult<T>> =>
    ipc.invoke(channel, ...args) as Promise<ShellResult<T>>;

  const subscribe = <T>(channel: string, accepts: (value: unknown) => value is T, listener: (value: T) => void): (() => void) => {
    const wrapped = (_event: unknown, ...args: unknown[]): void => {
      const [message] = args;
      if (args.length === 1 && accepts(message)) listener(message);
    };
    ipc.on(channel, wrapped);
    return () => {
      ipc.removeListener(channel, wrapped);
    };
  };

  return {
    rendererReady: () => invoke(INVOKE_CHANNELS.rendererReady),
    newDocument: () => invoke(INVOKE_CHANNELS.newDocument),
    openDocument: () => invoke(INVOKE_CHANNELS.openDocument),
    openRecentDocument: (recentPath) => invoke(INVOKE_CHANNELS.openRecentDocument, recentPath),
    saveDocument: (text) => invoke(INVOKE_CHANNELS.saveDocument, text),
    saveDocumentAs: (text) => invoke(INVOKE_CHANNELS.saveDocumentAs, text),
    saveSnapshot: (snapshot) => invoke(INVOKE_CHANNELS.saveSnapshot, snapshot),
    exportHandoutPdf: (request) => invoke(INVOKE_CHANNELS.exportHandoutPdf, request),
    printHandout: (request) => invoke(INVOKE_CHANNELS.printHandout, request),
    onCommand: (listener) => subscribe(COMMAND_CHANNEL, isShellCommand, listener),
    onDocument: (listener) => subscribe(DOCUMENT_CHANNEL, isIncomingDocument, listener),
  };
}
