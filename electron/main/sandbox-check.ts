/**
 * The packaged app does not run without the operating system's sandbox. The AppImage
 * launcher electron-builder generates adds `--no-sandbox` when unprivileged user namespaces
 * are unavailable (as under Ubuntu 24.04's default AppArmor restriction), whatever the
 * windows' `sandbox: true` says; the renderer would then run unconfined. The .deb package
 * sets the sandbox up on install, so that is where this points.
 */

/** What start-up knows about how the process was launched. */
export interface LaunchFacts {
  readonly isPackaged: boolean;
  readonly argv: readonly string[];
  readonly environment: Readonly<Record<string, string | undefined>>;
  /** `app.commandLine.hasSwitch`: switches given on the command line or appended in code. */
  hasSwitch(name: string): boolean;
}

/** The title of the refusal. */
export const NO_SANDBOX_TITLE = 'Chancewise cannot start without the system sandbox';

/** What the person is told, and how to fix it. */
export const NO_SANDBOX_MESSAGE = [
  'This copy of Chancewise was started with the sandbox turned off (--no-sandbox). The AppImage does that by',
  'itself on systems that restrict user namespaces, such as Ubuntu 24.04. Without the sandbox a page could reach',
  'your files, so Chancewise does not run this way.',
  '',
  'Install the .deb package instead (sudo apt install ./chancewise_<version>_amd64.deb): it sets the sandbox up.',
  'Or start the AppImage without --no-sandbox on a system that allows unprivileged user namespaces.',
].join('\n');

/** Whether the command line or the environment turns the renderer sandbox off. */
export function sandboxTurnedOff(facts: LaunchFacts): boolean {
  const onCommandLine = facts.argv.some((argument) => argument === '--no-sandbox' || argument.startsWith('--no-sandbox='));
  // ELECTRON_DISABLE_SANDBOX makes Electron add --no-sandbox itself (from memory; checked here too).
  const fromEnvironment = (facts.environment.ELECTRON_DISABLE_SANDBOX ?? '') !== '';
  return onCommandLine || fromEnvironment || facts.hasSwitch('no-sandbox');
}

/**
 * Null when the app may start; otherwise the reason it must not. Only a packaged app is
 * held to it: the unpackaged build is started by the test runner, which turns the sandbox
 * off where it runs as root in a container (Playwright's Electron launcher does).
 */
export function refuseWithoutSandbox(facts: LaunchFacts): string | null {
  if (!facts.isPackaged || !sandboxTurnedOff(facts)) return null;
  return NO_SANDBOX_MESSAGE;
}
