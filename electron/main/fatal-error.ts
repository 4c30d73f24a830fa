import { shellMessagesEn } from './messages/en.ts';

/** What reporting a fatal error needs (Electron's `dialog.showErrorBox` and `app.exit` in the app). */
export interface FatalErrorSettings {
  readonly log: (line: string) => void;
  /** Resolves once the log is written (waited for at most `flushTimeoutMs`). */
  readonly flushLog: () => Promise<void>;
  readonly showErrorBox: (title: string, content: string) => void;
  readonly exit: (code: number) => void;
  readonly flushTimeoutMs?: number;
}

/** The title of the error box. */
export const FATAL_ERROR_TITLE = shellMessagesEn.fatalErrorTitle;

/** What the person is told. */
export const FATAL_ERROR_MESSAGE = shellMessagesEn.fatalErrorMessage;

function describe(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  return String(error);
}

/**
 * Report an error nothing else caught in the main process: write it to the log, tell the
 * person, and quit with status 1. Node's documentation warns that after an uncaught exception
 * "it is not safe to resume normal operation" (Node.js docs, process, "Warning: Using
 * 'uncaughtException' correctly"), so the app does not carry on as if nothing had happened.
 */
export function reportFatalError(kind: string, error: unknown, settings: FatalErrorSettings): Promise<void> {
  try {
    settings.log(`${kind}: ${describe(error)}`);
  } catch {
    // Nothing more can be done about a failing log; the box below still tells the person.
  }
  try {
    settings.showErrorBox(FATAL_ERROR_TITLE, FATAL_ERROR_MESSAGE);
  } catch {
    // The exit below must still happen.
  }
  const timeout = new Promise<void>((resolve) => setTimeout(resolve, settings.flushTimeoutMs ?? 2000));
  return Promise.race([settings.flushLog().catch(() => undefined), timeout]).then(() => {
    settings.exit(1);
  });
}

/** The part of `process` the handlers are installed on. */
export interface ErrorEvents {
  on(event: 'uncaughtException' | 'unhandledRejection', listener: (error: unknown) => void): unknown;
}

/**
 * Report uncaught exceptions and unhandled rejections of the main process: the first one as
 * above; any that follow while the app is closing are logged only.
 */
export function installFatalErrorHandlers(events: ErrorEvents, settings: FatalErrorSettings): void {
  let reported = false;
  const handler =
    (kind: string) =>
    (error: unknown): void => {
      if (reported) {
        settings.log(`${kind} while closing: ${describe(error)}`);
        return;
      }
      reported = true;
      void reportFatalError(kind, error, settings);
    };
  events.on('uncaughtException', handler('uncaught exception'));
  events.on('unhandledRejection', handler('unhandled rejection'));
}
