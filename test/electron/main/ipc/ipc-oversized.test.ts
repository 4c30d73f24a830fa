// @vitest-environment node
// Oversized and uninspectable payloads are refused cheaply, and the renderer always gets a
// result value (never a rejected promise).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { INVOKE_CHANNELS } from '../../../../electron/contract/ipc-contract.ts';
import type { ShellResult } from '../../../../electron/contract/ipc-contract.ts';
import { registerIpcHandlers } from '../../../../electron/main/ipc/ipc-handlers.ts';
import type { IpcMainLike, ShellActions } from '../../../../electron/main/ipc/ipc-handlers.ts';
import type { IpcEventLike } from '../../../../electron/main/ipc/ipc-guard.ts';
import {
  checkDocumentText,
  checkPlainJson,
  checkSnapshotRequest,
  PAYLOAD_LIMITS,
} from '../../../../electron/main/ipc/ipc-payloads.ts';

const own = { id: 1 };
const trusted: IpcEventLike = { sender: own, senderFrame: { url: 'app://chancewise/index.html', parent: null } };

function saveSnapshotHandler() {
  let handler: ((event: IpcEventLike, ...args: unknown[]) => Promise<unknown>) | undefined;
  const ipcMain: IpcMainLike = {
    handle: (channel, listener) => {
      if (channel === INVOKE_CHANNELS.saveSnapshot) handler = listener;
    },
  };
  const saveSnapshot = vi.fn(async () => ({ savedAt: 1 }));
  const actions = { saveSnapshot } as unknown as ShellActions<typeof own>;
  registerIpcHandlers(ipcMain, { isOwnContents: (contents): contents is typeof own => contents === own, actions });
  return { saveSnapshot, call: async (...args: unknown[]) => (await handler?.(trusted, ...args)) as ShellResult<unknown> };
}

afterEach(() => {
  vi.restoreAllMocks();
});

describe('oversized snapshots', () => {
  it('refuses 100 million characters as too large without writing the content out as JSON', async () => {
    const { call, saveSnapshot } = saveSnapshotHandler();
    const huge = 'x'.repeat(100_000_000);
    const stringify = vi.spyOn(JSON, 'stringify');
    const result = await call({ content: { title: huge }, keepPatient: false, hasUnsavedChanges: true });
    expect(result).toMatchObject({ ok: false, error: { code: 'too-large' } });
    expect(stringify).not.toHaveBeenCalled();
    expect(saveSnapshot).not.toHaveBeenCalled();
  });

  it('counts every string and key together, so many medium strings are too large too', () => {
    const third = 'y'.repeat(Math.ceil(PAYLOAD_LIMITS.snapshotCharacters / 3));
    expect(checkPlainJson([third, third, third, 'z'])).toBe('too-large');
    expect(checkPlainJson({ [third]: 1, [`${third}a`]: 2, [`${third}b`]: 3 })).toBe('too-large');
    expect(checkSnapshotRequest([{ content: [third, third], keepPatient: false, hasUnsavedChanges: true }]).ok).toBe(true);
  });

  it('gives a result, not a rejection, when inspecting the payload throws', async () => {
    const { call, saveSnapshot } = saveSnapshotHandler();
    const content = {
      get title(): string {
        throw new RangeError('Invalid string length');
      },
    };
    await expect(call({ content, keepPatient: false, hasUnsavedChanges: true })).resolves.toMatchObject({
      ok: false,
      error: { code: 'invalid-request' },
    });
    expect(saveSnapshot).not.toHaveBeenCalled();
  });
});

describe('oversized texts', () => {
  it('refuses a huge text by its length before scanning it for NUL', () => {
    const huge = `${'x'.repeat(PAYLOAD_LIMITS.documentCharacters)}\u0000`;
    const includes = vi.spyOn(String.prototype, 'includes');
    expect(checkDocumentText([huge])).toEqual({ ok: false, code: 'too-large' });
    expect(includes).not.toHaveBeenCalled();
  });
});
