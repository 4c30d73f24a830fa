import path from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The file extension of topic files in the desktop app. A single extension (not
 * `.chancewise.json`): Windows, macOS and Linux desktops associate files by their last
 * extension only, so a double one would claim every `.json` file. The content is the same
 * JSON topic file the command line reads; `.json` files are opened too.
 */
export const TOPIC_EXTENSION = 'cwtopic';

/** The media type registered for topic files on Linux. */
export const TOPIC_MEDIA_TYPE = 'application/x-chancewise-topic';

/** Extensions the open dialog and the command line accept. */
export const OPENABLE_EXTENSIONS = [TOPIC_EXTENSION, 'json'] as const;

/** Filters of the open dialog. */
export const OPEN_DIALOG_FILTERS = [{ name: 'Chancewise topic', extensions: [...OPENABLE_EXTENSIONS] }];

/** Filters of the save dialog. */
export const SAVE_DIALOG_FILTERS = [{ name: 'Chancewise topic', extensions: [TOPIC_EXTENSION] }];

/** Whether a file name has one of the openable extensions (any letter case). */
export function hasOpenableExtension(fileName: string): boolean {
  const lower = fileName.toLowerCase();
  return OPENABLE_EXTENSIONS.some((extension) => lower.endsWith(`.${extension}`));
}

/** A save path with the topic extension added when the person typed a name without an openable one. */
export function withTopicExtension(filePath: string): string {
  return hasOpenableExtension(filePath) ? filePath : `${filePath}.${TOPIC_EXTENSION}`;
}

/**
 * The topic file named on a command line (of this launch, or of a second launch passed on by
 * the single-instance lock), made absolute against that launch's working folder; null when
 * there is none. Skips the executable (and, unpackaged, the app folder after it), every
 * switch (`--flag`, `-r` and its value are not topic files), and anything without an
 * openable extension; `file://` addresses (as Linux desktops pass them) are converted.
 */
export function topicPathFromCommandLine(argv: readonly string[], workingDirectory: string, isPackaged: boolean): string | null {
  const rest = argv.slice(isPackaged ? 1 : 2);
  for (const argument of rest) {
    if (argument.startsWith('-') || argument.includes('\u0000')) continue;
    let candidate = argument;
    if (argument.startsWith('file://')) {
      try {
        candidate = fileURLToPath(argument);
      } catch {
        continue;
      }
    }
    if (hasOpenableExtension(candidate)) return path.resolve(workingDirectory, candidate);
  }
  return null;
}
