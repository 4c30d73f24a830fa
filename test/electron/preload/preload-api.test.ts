// @vitest-environment node
import { describe, expect, it, vi } from 'vitest';
import { COMMAND_CHANNEL, DOCUMENT_CHANNEL, INVOKE_CHANNELS } from '../../../electron/contract/ipc-contract.ts';
import { createShellApi, isIncomingDocument, isShellCommand } from '../../../electron/preload/preload-api.ts';
import type { IpcRendererLike } from '../../../electron/preload/preload-api.ts';

type Listener = (event: unknown, ...args: unknown[]) => void;

function fakeIpcRenderer() {
  const listeners = new Map<string, Set<Listener>>();
  const ipc: IpcRendererLike & { emit(channel: string, ...args: unknown[]): void } = {
    invoke: vi.fn(async () => ({ ok: true, value: null })),
    on: (channel, listener) => {
      if (!listeners.has(channel)) listeners.set(channel, new Set());
      listeners.get(channel)?.add(listener);
    },
    removeListener: (channel, listener) => {
      listeners.get(channel)?.delete(listener);
    },
    emit: (channel, ...args) => {
      const event = { sender: { send: () => undefined }, ports: [] };
      for (const listener of listeners.get(channel) ?? []) listener(event, ...args);
    },
  };
  return { ipc, listeners };
}

describe('createShellApi()', () => {
  it('exposes exactly one named function per request, plus the two listeners', () => {
    // Electron security checklist item 20: do not expose Electron APIs to untrusted content; context-isolation
    // docs: "provide one method per IPC message".
    const api = createShellApi(fakeIpcRenderer().ipc);
    expect(Object.keys(api).sort()).toEqual([
      'exportHandoutPdf',
      'newDocument',
      'onCommand',
      'onDocument',
      'openDocument',
      'openRecentDocument',
      'printHandout',
      'rendererReady',
      'saveDocument',
      'saveDocumentAs',
      'saveSnapshot',
    ]);
    for (const value of Object.values(api)) expect(typeof value).toBe('function');
  });

  it('sends each request on its own channel with exactly its arguments', async () => {
    const { ipc } = fakeIpcRenderer();
    const api = createShellApi(ipc);
    await api.saveDocument('text');
    await api.openRecentDocument('/h/t.cwtopic');
    const handout = { bytes: new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d]), suggestedName: 'h.pdf' };
    await api.printHandout(handout);
    await api.saveSnapshot({ content: { a: 1 }, keepPatient: false, hasUnsavedChanges: true });
    expect(vi.mocked(ipc.invoke).mock.calls).toEqual([
      [INVOKE_CHANNELS.saveDocument, 'text'],
      [INVOKE_CHANNELS.openRecentDocument, '/h/t.cwtopic'],
      [INVOKE_CHANNELS.printHandout, handout],
      [INVOKE_CHANNELS.saveSnapshot, { content: { a: 1 }, keepPatient: false, hasUnsavedChanges: true }],
    ]);
  });

  it('gives listeners the message only, never the IPC event', () => {
    const { ipc } = fakeIpcRenderer();
    const api = createShellApi(ipc);
    const commands = vi.fn();
    api.onCommand(commands);
    ipc.emit(COMMAND_CHANNEL, { name: 'save' });
    expect(commands.mock.calls).toEqual([[{ name: 'save' }]]);
  });

  it('drops messages of an unknown shape', () => {
    const { ipc } = fakeIpcRenderer();
    const api = createShellApi(ipc);
    const commands = vi.fn();
    const documents = vi.fn();
    api.onCommand(commands);
    api.onDocument(documents);
    ipc.emit(COMMAND_CHANNEL, { name: 'format-disk' });
    ipc.emit(COMMAND_CHANNEL, { name: 'save' }, 'extra');
    ipc.emit(DOCUMENT_CHANNEL, { kind: 'script', text: 'x' });
    expect(commands).not.toHaveBeenCalled();
    expect(documents).not.toHaveBeenCalled();
    ipc.emit(DOCUMENT_CHANNEL, { kind: 'file', text: '{}', fileName: 'a.cwtopic' });
    expect(documents).toHaveBeenCalledExactlyOnceWith({ kind: 'file', text: '{}', fileName: 'a.cwtopic' });
  });

  it('returns a function that stops listening', () => {
    const { ipc, listeners } = fakeIpcRenderer();
    const api = createShellApi(ipc);
    const stop = api.onDocument(vi.fn());
    expect(listeners.get(DOCUMENT_CHANNEL)?.size).toBe(1);
    stop();
    expect(listeners.get(DOCUMENT_CHANNEL)?.size).toBe(0);
  });
});

describe('isShellCommand() and isIncomingDocument()', () => {
  it("know the contract's shapes", () => {
    expect(isShellCommand({ name: 'open-recent', recentPath: '/a' })).toBe(true);
    expect(isShellCommand({ name: 'open-recent' })).toBe(false);
    expect(isShellCommand('save')).toBe(false);
    expect(isIncomingDocument({ kind: 'snapshot', content: {}, reason: 'renderer-crashed', fileName: null })).toBe(true);
    expect(isIncomingDocument({ kind: 'snapshot', content: {}, reason: 'other', fileName: null })).toBe(false);
    expect(isIncomingDocument({ kind: 'file', text: 1, fileName: 'a' })).toBe(false);
  });
});
