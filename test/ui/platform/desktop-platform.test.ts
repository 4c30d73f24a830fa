import { describe, expect, test } from 'vitest';
import type { ChancewiseShellApi, IncomingDocument, ShellCommand } from '../../../electron/contract/ipc-contract.ts';
import { desktopPlatform } from '../../../src/ui/platform/desktop-platform.ts';
import type { PlatformCommand, PlatformDocument } from '../../../src/ui/platform/platform.ts';

/** A stand-in for the shell's preload API that records every call. */
function fakeShell(overrides: Partial<ChancewiseShellApi> = {}) {
  const calls: [string, unknown][] = [];
  let commandListener: ((command: ShellCommand) => void) | null = null;
  let documentListener: ((document: IncomingDocument) => void) | null = null;
  const ok = <T>(value: T) => Promise.resolve({ ok: true as const, value });
  const shell: ChancewiseShellApi = {
    rendererReady: () => (calls.push(['rendererReady', null]), ok(null)),
    newDocument: () => (calls.push(['newDocument', null]), ok(null)),
    openDocument: () => ok({ text: '{}', fileName: 'a.chancewise.json' }),
    openRecentDocument: (path) => (calls.push(['openRecentDocument', path]), ok(null)),
    saveDocument: (text) => (calls.push(['saveDocument', text]), ok({ fileName: 'a.chancewise.json', savedAt: 1 })),
    saveDocumentAs: (text) => (calls.push(['saveDocumentAs', text]), ok(null)),
    saveSnapshot: (snapshot) => (calls.push(['saveSnapshot', snapshot]), ok({ savedAt: 1 })),
    exportHandoutPdf: (request) => (calls.push(['exportHandoutPdf', request.suggestedName]), ok({ fileName: 'h.pdf' })),
    printHandout: (request) => (calls.push(['printHandout', request.suggestedName]), ok({ fileName: request.suggestedName })),
    onCommand: (listener) => ((commandListener = listener), () => undefined),
    onDocument: (listener) => ((documentListener = listener), () => undefined),
    ...overrides,
  };
  return {
    shell,
    calls,
    send: { command: (c: ShellCommand) => commandListener?.(c), document: (d: IncomingDocument) => documentListener?.(d) },
  };
}

describe('desktopPlatform', () => {
  test('prints the handout by sending its PDF to the shell, which opens it in the system’s viewer', async () => {
    const { shell, calls } = fakeShell();
    const platform = desktopPlatform(shell);
    expect(await platform.printHandout('topic-handout.pdf', async () => new Uint8Array([37, 80, 68, 70, 45]))).toBe(
      'topic-handout.pdf',
    );
    expect(await platform.printHandout('nothing.pdf', async () => null)).toBeNull();
    expect(calls).toEqual([['printHandout', 'topic-handout.pdf']]);
  });

  test('opens and saves through the shell, which names the files itself', async () => {
    const { shell, calls } = fakeShell();
    const platform = desktopPlatform(shell);
    expect(platform.namesFilesItself).toBe(true);
    expect(await platform.openTopicFile()).toEqual({ name: 'a.chancewise.json', text: '{}' });
    expect(await platform.saveTopicFile('text', 'ignored.json', 'save')).toBe('a.chancewise.json');
    expect(await platform.saveTopicFile('text', 'ignored.json', 'save-as')).toBeNull();
    expect(await platform.saveHandout('topic-handout.pdf', new Uint8Array([37]))).toBe('h.pdf');
    expect(calls.map(([name]) => name)).toEqual(['saveDocument', 'saveDocumentAs', 'exportHandoutPdf']);
  });

  test('turns a refused request into an error carrying the shell’s sentence', async () => {
    const { shell } = fakeShell({
      openDocument: () =>
        Promise.resolve({ ok: false, error: { code: 'not-a-topic-file', message: 'That file is not a topic.' } }),
    });
    await expect(desktopPlatform(shell).openTopicFile()).rejects.toThrow('That file is not a topic.');
  });

  test('keeps crash-recovery snapshots without the patient’s details', () => {
    const { shell, calls } = fakeShell();
    desktopPlatform(shell).snapshot({ title: 'x' }, true);
    expect(calls).toEqual([['saveSnapshot', { content: { title: 'x' }, keepPatient: false, hasUnsavedChanges: true }]]);
  });

  test('passes menu commands and handed-over documents on, after subscribing and then saying it is ready', () => {
    const { shell, calls, send } = fakeShell();
    const commands: PlatformCommand[] = [];
    const documents: PlatformDocument[] = [];
    desktopPlatform(shell).connect({ command: (c) => commands.push(c), document: (d) => documents.push(d) });
    expect(calls).toEqual([['rendererReady', null]]);
    send.command({ name: 'open-recent', recentPath: '/home/a/b.chancewise.json' });
    send.document({ kind: 'file', text: '{}', fileName: 'b.chancewise.json' });
    send.document({ kind: 'snapshot', content: { title: 'y' }, reason: 'renderer-crashed', fileName: null });
    expect(commands).toEqual([{ name: 'open-recent', recentPath: '/home/a/b.chancewise.json' }]);
    expect(documents).toEqual([
      { kind: 'file', file: { name: 'b.chancewise.json', text: '{}' } },
      { kind: 'snapshot', content: { title: 'y' }, fileName: null },
    ]);
  });
});
