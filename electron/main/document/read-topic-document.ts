import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { nodeRegularFileSystem, readRegularFile, RegularFileError } from '../../../src/shared/regular-file.ts';
import type { RegularFileContent, RegularFileSystem } from '../../../src/shared/regular-file.ts';
import { PAYLOAD_LIMITS } from '../ipc/ipc-payloads.ts';
import { ShellFailure } from '../ipc/shell-failure.ts';

/** A topic file read from disk and found valid. */
export interface TopicDocument {
  readonly text: string;
  /** The file's modification time (milliseconds since 1970). */
  readonly modifiedAt: number;
}

/** Whether a text is a topic file the app can read (the same reader the renderer uses). */
export function isTopicFileText(text: string): boolean {
  return readTopicFile(text).ok;
}

/** The most bytes of a topic file: its character limit at up to four UTF-8 bytes each. */
export const TOPIC_FILE_MAX_BYTES = PAYLOAD_LIMITS.documentCharacters * 4;

/**
 * Read a topic file: a regular file of at most the document size limit, valid UTF-8, and a
 * topic file the core's reader accepts. It is opened once and judged by its handle, and
 * never read past the limit, even if it grows or is swapped after being picked (a link the
 * person picked is followed: their folders may be links). Anything else fails with a
 * `ShellFailure` (`read-failed`, `too-large` or `not-a-topic-file`), so the shell never
 * takes on a file it could not save back.
 */
export async function readTopicDocument(
  filePath: string,
  fileSystem: RegularFileSystem = nodeRegularFileSystem,
): Promise<TopicDocument> {
  let content: RegularFileContent;
  try {
    content = await readRegularFile(filePath, { followLink: true, maxBytes: TOPIC_FILE_MAX_BYTES }, fileSystem);
  } catch (error) {
    if (error instanceof RegularFileError && error.reason === 'too-large') throw new ShellFailure('too-large');
    throw new ShellFailure('read-failed', error instanceof Error ? error.message : undefined);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(content.bytes);
  } catch {
    throw new ShellFailure('not-a-topic-file', 'not UTF-8 text');
  }
  if (text.length > PAYLOAD_LIMITS.documentCharacters) throw new ShellFailure('too-large');
  if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
  return { text, modifiedAt: content.info.mtimeMs };
}
