// @vitest-environment node
// The log never keeps a full path (a file name may hold a patient's name) and never grows past
// its cap; uncaught main-process errors are logged, shown and end the app.
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FATAL_ERROR_TITLE, installFatalErrorHandlers } from '../../../../electron/main/fatal-error.ts';
import { fileLabel, redactPaths } from '../../../../electron/main/log/log-redaction.ts';
import { createRotatingLog } from '../../../../electron/main/log/rotating-log.ts';
import { createShellLog } from '../../../../electron/main/log/shell-log.ts';

let folder: string;

beforeEach(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-log-'));
});

afterEach(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

describe('redactPaths()', () => {
  it("replaces the paths of a person's files, quoted, bare or as file:// addresses, by labels", () => {
    const line = [
      "could not open: ENOENT: no such file or directory, open '/home/gp/Ann Example heart.cwtopic'",
      'saving C:\\Users\\gp\\Ann-Example.cwtopic failed',
      'refused file:///home/gp/Ann%20Example.pdf',
    ].join(' | ');
    const redacted = redactPaths(line, '/opt/Chancewise/resources/app.asar');
    expect(redacted).not.toMatch(/Ann|\/home\/gp|Users/u);
    expect(redacted).toContain(`'${fileLabel('/home/gp/Ann Example heart.cwtopic')}'`);
    expect(fileLabel('/home/gp/Ann Example heart.cwtopic')).toMatch(/^\[file [0-9a-f]{8}\.cwtopic\]$/u);
  });

  it("keeps only the file name of the app's own files in stack frames, and leaves app addresses alone", () => {
    const frame =
      '    at open (/opt/Chancewise/resources/app.asar/dist-electron/main.cjs:120:7) loading app://chancewise/index.html';
    expect(redactPaths(frame, '/opt/Chancewise/resources/app.asar')).toBe(
      '    at open (main.cjs:120:7) loading app://chancewise/index.html',
    );
  });
});

describe('createShellLog()', () => {
  it('writes no full path to standard error or to main.log', async () => {
    const written: string[] = [];
    const shellLog = createShellLog({ getPath: () => folder, getAppPath: () => '/opt/app' }, (text) => written.push(text));
    shellLog.log("could not open '/home/gp/Patients/Ann Example.cwtopic': EACCES");
    await shellLog.flush();
    const file = await fs.readFile(path.join(folder, 'main.log'), 'utf8');
    for (const text of [file, ...written]) expect(text).not.toContain('Ann Example');
    expect(file).toMatch(/could not open '\[file [0-9a-f]{8}\.cwtopic\]': EACCES\n$/u);
    if (process.platform !== 'win32') expect((await fs.stat(path.join(folder, 'main.log'))).mode & 0o777).toBe(0o600);
  });
});

describe('createRotatingLog()', () => {
  it('sets the file aside at its cap and keeps one earlier file, so at most twice the cap is kept', async () => {
    const log = createRotatingLog({ folder, name: 'main.log', maxBytes: 1000 });
    for (let line = 0; line < 100; line += 1) void log.append(`${String(line).padStart(3, '0')} ${'x'.repeat(45)}\n`);
    await log.flush();
    expect((await fs.readdir(folder)).sort()).toEqual(['main.log', 'main.log.1']);
    const current = await fs.readFile(path.join(folder, 'main.log'), 'utf8');
    const previous = await fs.readFile(path.join(folder, 'main.log.1'), 'utf8');
    expect(Buffer.byteLength(current)).toBeLessThanOrEqual(1000);
    expect(Buffer.byteLength(previous)).toBeLessThanOrEqual(1000);
    expect(current.trimEnd().split('\n').at(-1)).toMatch(/^099 /u);
    // 50 bytes a line, 20 lines a file: lines 080-099 now, 060-079 before.
    expect(previous.split('\n')[0]).toMatch(/^060 /u);
  });

  it('cuts a single line longer than the cap', async () => {
    const log = createRotatingLog({ folder, name: 'main.log', maxBytes: 100 });
    await log.append(`${'y'.repeat(500)}\n`);
    expect(Buffer.byteLength(await fs.readFile(path.join(folder, 'main.log')))).toBe(100);
  });
});

describe('installFatalErrorHandlers()', () => {
  function setUp() {
    const listeners = new Map<string, (error: unknown) => void>();
    const settings = { log: vi.fn(), flushLog: vi.fn(async () => undefined), showErrorBox: vi.fn(), exit: vi.fn() };
    installFatalErrorHandlers({ on: (event, listener) => listeners.set(event, listener) }, settings);
    return { listeners, settings };
  }

  it('logs an uncaught exception with its stack, shows it, then exits with status 1', async () => {
    const { listeners, settings } = setUp();
    listeners.get('uncaughtException')?.(new TypeError('boom'));
    expect(settings.log).toHaveBeenCalledWith(expect.stringMatching(/^uncaught exception: TypeError: boom\n\s+at /u));
    expect(settings.showErrorBox).toHaveBeenCalledExactlyOnceWith(FATAL_ERROR_TITLE, expect.stringContaining('log file'));
    await vi.waitFor(() => expect(settings.exit).toHaveBeenCalledExactlyOnceWith(1));
    expect(settings.flushLog).toHaveBeenCalledOnce();
  });

  it('does the same for an unhandled rejection, and only logs what follows while closing', async () => {
    const { listeners, settings } = setUp();
    listeners.get('unhandledRejection')?.('not an Error');
    listeners.get('uncaughtException')?.(new Error('second'));
    expect(settings.showErrorBox).toHaveBeenCalledOnce();
    expect(settings.log).toHaveBeenNthCalledWith(1, 'unhandled rejection: not an Error');
    expect(settings.log).toHaveBeenNthCalledWith(2, expect.stringMatching(/^uncaught exception while closing: Error: second/u));
    await vi.waitFor(() => expect(settings.exit).toHaveBeenCalledOnce());
  });
});
