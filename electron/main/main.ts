// The main-process entry of the desktop app. It starts the shell only inside Electron, so
// tests and type-checks can load the modules without starting anything.
import { app, dialog } from 'electron';
import { installFatalErrorHandlers } from './fatal-error.ts';
import { createShellLog } from './log/shell-log.ts';
import { runShell } from './shell.ts';

if (process.versions.electron !== undefined) {
  const shellLog = createShellLog(app);
  installFatalErrorHandlers(process, {
    log: shellLog.log,
    flushLog: () => shellLog.flush(),
    showErrorBox: (title, content) => dialog.showErrorBox(title, content),
    exit: (code) => app.exit(code),
  });
  runShell(shellLog.log);
}
