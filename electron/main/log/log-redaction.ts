import { createHash } from 'node:crypto';
import path from 'node:path';

/**
 * A file named in the log without its path, which may hold a patient's name: `[file
 * 1a2b3c4d.cwtopic]`, eight hex digits of the SHA-256 of the full path and the extension.
 * The same file gets the same label, so log lines about it can still be told together.
 */
export function fileLabel(filePath: string): string {
  const extension = path.extname(filePath);
  const shown = /^\.[A-Za-z0-9]{1,8}$/u.test(extension) ? extension : '';
  return `[file ${createHash('sha256').update(filePath).digest('hex').slice(0, 8)}${shown}]`;
}

/** Quoted absolute paths, as Node's file errors give them: `open '/home/a/x.cwtopic'`. */
const QUOTED_PATH = /(['"`])((?:\/|[A-Za-z]:[\\/]|\\\\)[^'"`\n]*)\1/gu;
/** file:// addresses. */
const FILE_URL = /file:\/\/[^\s'"`)]+/gu;
/** Unquoted absolute paths (POSIX, drive letter, UNC), after a space, a bracket, `=` or `,` or at the start. */
const BARE_PATH = /(^|[\s(=,])((?:\/|[A-Za-z]:\\|\\\\)[^\s'"`),]+)/gu;

/**
 * A log line with every absolute path replaced: a path inside the app's own folder (a stack
 * frame) by its file name, any other path (a person's file) by `fileLabel`.
 */
export function redactPaths(line: string, appFolder: string | null): string {
  const replace = (found: string): string => {
    const own = appFolder !== null && appFolder !== '' && found.startsWith(appFolder);
    return own ? path.basename(found.replaceAll('\\', '/')) : fileLabel(found);
  };
  return line
    .replace(FILE_URL, (found) => replace(found))
    .replace(QUOTED_PATH, (_whole, quote: string, found: string) => `${quote}${replace(found)}${quote}`)
    .replace(BARE_PATH, (_whole, before: string, found: string) => `${before}${replace(found)}`);
}
