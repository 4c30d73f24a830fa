// The main-process entry of the desktop app. It starts the shell only inside Electron, so
// tests and type-checks can load the modules without starting anything.
import { runShell } from './shell.ts';

process.on('uncaughtException', (error) => {
  process.stderr.write(`[chancewise] uncaught: ${error.stack ?? error.message}\n`);
});

if (process.versions.electron !== undefined) runShell();
