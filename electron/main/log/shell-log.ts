import { redactPaths } from './log-redaction.ts';
import { createRotatingLog } from './rotating-log.ts';
import type { RotatingLog } from './rotating-log.ts';

/** The part of Electron's `app` the log needs. */
export interface LogApp {
  getPath(name: 'logs'): string;
  getAppPath(): string;
}

/** The shell's log: standard error and `main.log` in the app's log folder. */
export interface ShellLog {
  /** Write one line, stamped with the time, with every path redacted (see `redactPaths`). */
  readonly log: (line: string) => void;
  /** Resolves once the lines so far are in the file. */
  flush(): Promise<void>;
}

/** The longest line kept (a stack trace is plenty). */
const MAX_LINE_CHARACTERS = 8000;

/**
 * The shell's log. Lines never carry a full path: a person's file names may hold a patient's
 * name, so their paths become labels, and paths of the app's own files (stack frames) become
 * file names. The file rotates at 1 MiB (`createRotatingLog`).
 */
export function createShellLog(app: LogApp, write: (text: string) => void = (text) => process.stderr.write(text)): ShellLog {
  let file: RotatingLog | null = null;
  let appFolder: string | null = null;
  return {
    log(line) {
      try {
        appFolder ??= app.getAppPath();
      } catch {
        appFolder = null;
      }
      const stamped = `${new Date().toISOString()} ${redactPaths(line.slice(0, MAX_LINE_CHARACTERS), appFolder)}\n`;
      write(`[chancewise] ${stamped}`);
      try {
        file ??= createRotatingLog({ folder: app.getPath('logs'), name: 'main.log' });
        void file.append(stamped);
      } catch {
        // The log file is a convenience; standard error already has the line.
      }
    },
    flush: () => file?.flush() ?? Promise.resolve(),
  };
}
