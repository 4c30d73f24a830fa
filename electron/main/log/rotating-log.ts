import fs from 'node:fs/promises';
import path from 'node:path';
import { startWithin } from '../files/file-name-fit.ts';
import { OWNER_ONLY_MODE } from '../files/file-mode-rule.ts';

/** The size at which the log file is set aside and a new one begun: 1 MiB. */
export const LOG_MAX_BYTES = 1024 * 1024;

/** Settings of a rotating log. */
export interface RotatingLogSettings {
  readonly folder: string;
  readonly name: string;
  readonly maxBytes?: number;
}

/** A log file that never grows past its cap. */
export interface RotatingLog {
  /** Append one line (with its newline); writes run in order, and a failure is dropped (the log is a convenience). */
  append(line: string): Promise<void>;
  /** Resolves once every line given so far is written. */
  flush(): Promise<void>;
}

function errorCode(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

/**
 * A log in `folder/name` that holds at most `maxBytes`: when a line would take it past the
 * cap, the file is renamed to `name.1` (replacing the one before) and a new file begun, so
 * at most twice the cap is ever kept (a single line longer than the cap is cut). The folder is the owner's only (0700), the files 0600.
 */
export function createRotatingLog(settings: RotatingLogSettings): RotatingLog {
  const maxBytes = settings.maxBytes ?? LOG_MAX_BYTES;
  const current = path.join(settings.folder, settings.name);
  const previous = `${current}.1`;
  let queue: Promise<void> = Promise.resolve();

  const write = async (given: string): Promise<void> => {
    const line = Buffer.byteLength(given) > maxBytes ? `${startWithin(given, maxBytes - 1)}\n` : given;
    await fs.mkdir(settings.folder, { recursive: true, mode: 0o700 });
    let size = 0;
    try {
      size = (await fs.stat(current)).size;
    } catch (error) {
      if (errorCode(error) !== 'ENOENT') throw error;
    }
    if (size > 0 && size + Buffer.byteLength(line) > maxBytes) await fs.rename(current, previous);
    await fs.appendFile(current, line, { mode: OWNER_ONLY_MODE });
  };

  return {
    append(line) {
      queue = queue.then(() => write(line)).catch(() => undefined);
      return queue;
    },
    flush: () => queue,
  };
}
