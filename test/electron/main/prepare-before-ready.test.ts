// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { prepareBeforeReady } from '../../../electron/main/prepare-before-ready.ts';

function fakes(isPackaged: boolean, lock = true) {
  const calls: string[] = [];
  const app = {
    isPackaged,
    enableSandbox: () => calls.push('enableSandbox'),
    setPath: (name: string, value: string) => calls.push(`setPath ${name} ${value}`),
    requestSingleInstanceLock: () => {
      calls.push('requestSingleInstanceLock');
      return lock;
    },
  };
  const schemes: unknown[] = [];
  const protocol = {
    registerSchemesAsPrivileged: (list: unknown[]) => {
      calls.push('registerSchemesAsPrivileged');
      schemes.push(...list);
    },
  };
  return { app, protocol, calls, schemes };
}

describe('prepareBeforeReady()', () => {
  it('registers the app scheme as standard and secure, enables the sandbox, then takes the lock', () => {
    // Electron docs: protocol.registerSchemesAsPrivileged "can only be used before the ready event";
    // sandbox.md "Enabling the sandbox globally": app.enableSandbox() before ready; security checklist 18.
    const { app, protocol, calls, schemes } = fakes(true);
    expect(prepareBeforeReady(app, protocol, {})).toBe(true);
    expect(calls).toEqual(['registerSchemesAsPrivileged', 'enableSandbox', 'requestSingleInstanceLock']);
    expect(schemes).toEqual([{ scheme: 'app', privileges: { standard: true, secure: true, supportFetchAPI: true } }]);
  });

  it('moves the user-data folder for an unpackaged test run before taking the lock', () => {
    const { app, protocol, calls } = fakes(false);
    prepareBeforeReady(app, protocol, { CHANCEWISE_USER_DATA_DIR: '/tmp/run-1' });
    expect(calls).toEqual([
      'registerSchemesAsPrivileged',
      'enableSandbox',
      'setPath userData /tmp/run-1',
      'requestSingleInstanceLock',
    ]);
  });

  it('ignores that variable in a packaged app', () => {
    const { app, protocol, calls } = fakes(true);
    prepareBeforeReady(app, protocol, { CHANCEWISE_USER_DATA_DIR: '/tmp/elsewhere' });
    expect(calls).not.toContain('setPath userData /tmp/elsewhere');
  });

  it('reports when another copy holds the lock', () => {
    const { app, protocol } = fakes(true, false);
    expect(prepareBeforeReady(app, protocol, {})).toBe(false);
  });
});
