// @vitest-environment node
// The packaged app does not run without the OS sandbox: electron-builder's AppImage launcher
// adds --no-sandbox by itself where unprivileged user namespaces are unavailable (Ubuntu 24.04's
// default AppArmor restriction; electron/electron#42510, electron-userland/electron-builder#8440).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NO_SANDBOX_TITLE, refuseWithoutSandbox, sandboxTurnedOff } from '../../../electron/main/sandbox-check.ts';
import { app, dialog, FakeBrowserWindow, protocol, resetElectronMock } from '../electron-mock.ts';

vi.mock('electron', () => import('../electron-mock.ts'));

const { runShell } = await import('../../../electron/main/shell.ts');

const facts = (isPackaged: boolean, argv: string[], environment: Record<string, string> = {}, switches: string[] = []) => ({
  isPackaged,
  argv,
  environment,
  hasSwitch: (name: string) => switches.includes(name),
});

afterEach(() => {
  app.isPackaged = false;
  resetElectronMock();
});

describe('refuseWithoutSandbox()', () => {
  it('refuses a packaged app started with --no-sandbox, and points to the .deb', () => {
    const message = refuseWithoutSandbox(facts(true, ['/tmp/.mount_Chance/chancewise', '--no-sandbox']));
    expect(message).toContain('.deb');
    expect(message).toContain('--no-sandbox');
  });

  it('sees the sandbox turned off by a switch added in code or by the environment', () => {
    expect(sandboxTurnedOff(facts(true, ['chancewise'], {}, ['no-sandbox']))).toBe(true);
    expect(sandboxTurnedOff(facts(true, ['chancewise'], { ELECTRON_DISABLE_SANDBOX: '1' }))).toBe(true);
    expect(sandboxTurnedOff(facts(true, ['chancewise', '--no-sandboxing-here.cwtopic']))).toBe(false);
  });

  it('lets a packaged app with its sandbox start, and the unpackaged build the test runner starts', () => {
    expect(refuseWithoutSandbox(facts(true, ['chancewise', '/home/a/t.cwtopic']))).toBeNull();
    expect(refuseWithoutSandbox(facts(false, ['electron', '.', '--no-sandbox']))).toBeNull();
  });
});

describe('runShell() without the sandbox', () => {
  it('opens no window, tells the person once the app is ready, and exits with status 1', async () => {
    app.isPackaged = true;
    const argv = process.argv;
    process.argv = ['/tmp/.mount_Chance/chancewise', '--no-sandbox'];
    const log = vi.fn();
    try {
      runShell(log);
    } finally {
      process.argv = argv;
    }
    await vi.waitFor(() => expect(app.exit).toHaveBeenCalledExactlyOnceWith(1));
    expect(dialog.showErrorBox).toHaveBeenCalledExactlyOnceWith(NO_SANDBOX_TITLE, expect.stringContaining('.deb'));
    expect(protocol.registerSchemesAsPrivileged).not.toHaveBeenCalled();
    expect(FakeBrowserWindow.created).toHaveLength(0);
    expect(log).toHaveBeenCalledWith(expect.stringContaining('sandbox'));
  });
});
