// @vitest-environment node
import { describe, expect, it, vi } from 'vitest';
import { INVOKE_CHANNELS } from '../../../../electron/contract/ipc-contract.ts';
import type { ShellResult } from '../../../../electron/contract/ipc-contract.ts';
import { registerIpcHandlers } from '../../../../electron/main/ipc/ipc-handlers.ts';
import type { IpcMainLike, ShellActions } from '../../../../electron/main/ipc/ipc-handlers.ts';
import type { IpcEventLike } from '../../../../electron/main/ipc/ipc-guard.ts';
import { PAYLOAD_LIMITS } from '../../../../electron/main/ipc/ipc-payloads.ts';
import { ShellFailure } from '../../../../electron/main/ipc/shell-failure.ts';

interface FakeContents {
  readonly id: number;
}

const own: FakeContents = { id: 1 };
const stranger: FakeContents = { id: 2 };

type Handler = (event: IpcEventLike, ...args: unknown[]) => Promise<unknown>;

function setUp() {
  const handlers = new Map<string, Handler>();
  const ipcMain: IpcMainLike = {
    handle: (channel, listener) => {
      if (handlers.has(channel)) throw new Error(`second handler for ${channel}`);
      handlers.set(channel, listener);
    },
  };
  const actions: ShellActions<FakeContents> = {
    rendererReady: vi.fn(async () => null),
    newDocument: vi.fn(async () => null),
    openDocument: vi.fn(async () => ({ text: '{}', fileName: 'a.cwtopic' })),
    openRecentDocument: vi.fn(async () => null),
    saveDocument: vi.fn(async () => ({ fileName: 'a.cwtopic', savedAt: 5 })),
    saveDocumentAs: vi.fn(async () => null),
    saveSnapshot: vi.fn(async () => ({ savedAt: 7 })),
    exportHandoutPdf: vi.fn(async () => ({ fileName: 'h.pdf' })),
    printHandout: vi.fn(async () => ({ fileName: 'h.pdf' })),
  };
  const report = vi.fn();
  registerIpcHandlers(ipcMain, { isOwnContents: (contents): contents is FakeContents => contents === own, actions, report });
  const call = async (channel: string, event: IpcEventLike, ...args: unknown[]): Promise<ShellResult<unknown>> => {
    const handler = handlers.get(channel);
    if (handler === undefined) throw new Error(`no handler for ${channel}`);
    return (await handler(event, ...args)) as ShellResult<unknown>;
  };
  return { handlers, actions, report, call };
}

const trusted: IpcEventLike = { sender: own, senderFrame: { url: 'app://chancewise/index.html', parent: null } };

describe('registerIpcHandlers()', () => {
  it('registers one handler for every channel of the contract, and nothing else', () => {
    const { handlers } = setUp();
    expect([...handlers.keys()].sort()).toEqual(Object.values(INVOKE_CHANNELS).sort());
  });

  it('runs the action for a trusted sender with a valid payload and wraps its value', async () => {
    const { actions, call } = setUp();
    const text = '{"format":"chancewise-topic"}';
    expect(await call(INVOKE_CHANNELS.saveDocument, trusted, text)).toEqual({
      ok: true,
      value: { fileName: 'a.cwtopic', savedAt: 5 },
    });
    expect(actions.saveDocument).toHaveBeenCalledExactlyOnceWith(own, text);
  });

  it('refuses every channel from another web contents before reading the payload', async () => {
    const { actions, call, report } = setUp();
    const event: IpcEventLike = { sender: stranger, senderFrame: { url: 'app://chancewise/index.html', parent: null } };
    for (const channel of Object.values(INVOKE_CHANNELS)) {
      const result = await call(channel, event);
      expect(result.ok, channel).toBe(false);
      expect(!result.ok && result.error.code).toBe('untrusted-sender');
    }
    for (const action of Object.values(actions)) expect(action).not.toHaveBeenCalled();
    expect(report).toHaveBeenCalledTimes(Object.values(INVOKE_CHANNELS).length);
  });

  it('refuses a frame on another origin and a sub-frame of the app', async () => {
    const { actions, call } = setUp();
    const foreign: IpcEventLike = { sender: own, senderFrame: { url: 'https://evil.test/', parent: null } };
    const subFrame: IpcEventLike = {
      sender: own,
      senderFrame: { url: 'app://chancewise/index.html', parent: { url: 'app://chancewise/' } },
    };
    expect(await call(INVOKE_CHANNELS.openDocument, foreign)).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    expect(await call(INVOKE_CHANNELS.openDocument, subFrame)).toMatchObject({ ok: false, error: { code: 'untrusted-sender' } });
    expect(actions.openDocument).not.toHaveBeenCalled();
  });

  it('refuses payloads of the wrong type without running the action', async () => {
    const { actions, call } = setUp();
    expect(await call(INVOKE_CHANNELS.saveDocument, trusted, 42)).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(await call(INVOKE_CHANNELS.saveSnapshot, trusted, { content: 1 })).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(await call(INVOKE_CHANNELS.openRecentDocument, trusted, { path: '/etc/passwd' })).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(await call(INVOKE_CHANNELS.printHandout, trusted, 'extra')).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    // The handout to print must be a PDF under a plain file name, as for saving it.
    expect(
      await call(INVOKE_CHANNELS.printHandout, trusted, { bytes: new TextEncoder().encode('not a pdf'), suggestedName: 'h.pdf' }),
    ).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(
      await call(INVOKE_CHANNELS.printHandout, trusted, {
        bytes: new TextEncoder().encode('%PDF-1.7'),
        suggestedName: '../h.pdf',
      }),
    ).toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(actions.saveDocument).not.toHaveBeenCalled();
    expect(actions.saveSnapshot).not.toHaveBeenCalled();
    expect(actions.openRecentDocument).not.toHaveBeenCalled();
    expect(actions.printHandout).not.toHaveBeenCalled();
  });

  it('refuses oversized payloads as too large', async () => {
    const { actions, call } = setUp();
    const huge = 'x'.repeat(PAYLOAD_LIMITS.documentCharacters + 1);
    expect(await call(INVOKE_CHANNELS.saveDocumentAs, trusted, huge)).toMatchObject({ ok: false, error: { code: 'too-large' } });
    const bytes = new Uint8Array(PAYLOAD_LIMITS.pdfBytes + 1);
    bytes.set([0x25, 0x50, 0x44, 0x46, 0x2d]);
    expect(await call(INVOKE_CHANNELS.exportHandoutPdf, trusted, { bytes, suggestedName: 'h.pdf' })).toMatchObject({
      ok: false,
      error: { code: 'too-large' },
    });
    expect(actions.saveDocumentAs).not.toHaveBeenCalled();
    expect(actions.exportHandoutPdf).not.toHaveBeenCalled();
  });

  it('turns a failure of the action into an error value, never a thrown exception', async () => {
    const { actions, call } = setUp();
    vi.mocked(actions.openRecentDocument).mockRejectedValueOnce(new ShellFailure('not-in-recent-list'));
    expect(await call(INVOKE_CHANNELS.openRecentDocument, trusted, '/x.cwtopic')).toEqual({
      ok: false,
      error: { code: 'not-in-recent-list', message: 'That file is no longer in the list of recent files.' },
    });
    vi.mocked(actions.saveDocument).mockRejectedValueOnce(new Error('EIO: i/o error'));
    expect(await call(INVOKE_CHANNELS.saveDocument, trusted, 'x')).toMatchObject({ ok: false, error: { code: 'write-failed' } });
    vi.mocked(actions.openDocument).mockRejectedValueOnce(new Error('EACCES'));
    expect(await call(INVOKE_CHANNELS.openDocument, trusted)).toMatchObject({ ok: false, error: { code: 'read-failed' } });
  });

  it('replies with values that survive structured cloning (what IPC does to them)', async () => {
    const { call } = setUp();
    const result = await call(INVOKE_CHANNELS.saveSnapshot, trusted, {
      content: { a: 1 },
      keepPatient: false,
      hasUnsavedChanges: true,
    });
    expect(structuredClone(result)).toEqual({ ok: true, value: { savedAt: 7 } });
  });
});

describe('the print channel', () => {
  it('hands a checked handout PDF to the print action and replies with the file it opened', async () => {
    const { actions, call } = setUp();
    const request = { bytes: new TextEncoder().encode('%PDF-1.7'), suggestedName: 'heart-handout.pdf' };
    expect(await call(INVOKE_CHANNELS.printHandout, trusted, request)).toEqual({ ok: true, value: { fileName: 'h.pdf' } });
    expect(actions.printHandout).toHaveBeenCalledWith(own, request);
  });
});
