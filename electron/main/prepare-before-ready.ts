import { APP_SCHEME, APP_SCHEME_PRIVILEGES } from './web/app-origin.ts';

/** The parts of Electron's `app` used before it is ready. */
export interface EarlyApp {
  readonly isPackaged: boolean;
  enableSandbox(): void;
  setPath(name: 'userData', value: string): void;
  requestSingleInstanceLock(): boolean;
}

/** The part of Electron's `protocol` used before the app is ready. */
export interface EarlyProtocol {
  registerSchemesAsPrivileged(schemes: { scheme: string; privileges: typeof APP_SCHEME_PRIVILEGES }[]): void;
}

/** The environment variable that points an unpackaged run (tests) at its own user-data folder. */
export const USER_DATA_VARIABLE = 'CHANCEWISE_USER_DATA_DIR';

/**
 * Everything that must happen before the app is ready, in order: register the app scheme
 * as privileged, turn on the sandbox for every renderer, move the user-data folder when an
 * unpackaged test run asks for it, and take the single-instance lock. Returns whether this
 * process holds the lock (if not, another copy is running and this one must quit).
 */
export function prepareBeforeReady(
  app: EarlyApp,
  protocol: EarlyProtocol,
  environment: Readonly<Record<string, string | undefined>>,
): boolean {
  protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: APP_SCHEME_PRIVILEGES }]);
  app.enableSandbox();
  const userData = environment[USER_DATA_VARIABLE];
  if (!app.isPackaged && userData !== undefined && userData !== '') app.setPath('userData', userData);
  return app.requestSingleInstanceLock();
}
