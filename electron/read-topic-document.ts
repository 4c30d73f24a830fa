import fs from 'node:fs/promises';
import { readTopicFile } from '../src/core/topic/topic-file.ts';
import { PAYLOAD_LIMITS } from './ipc-payloads.ts';
import { ShellFailure } from './shell-messages.ts';

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

/** File calls of the reader. */
export interface DocumentFileSystem {
  stat(filePath: string): Promise<{ size: number; mtimeMs: number; isFile(): boolean }>;
  readFile(filePath: string): Promise<Uint8Array>;
}

const nodeDocumentFileSystem: DocumentFileSystem = {
  stat: (filePath) => fs.stat(filePath),
  readFile: (filePath) => fs.readFile(filePath),
};

/**
 * Read a topic file: a regular file of at most the document size limit, valid UTF-8, and a
 * topic file the core's reader accepts. Anything else fails with a `ShellFailure`
 * (`read-failed`, `too-large` or `not-a-topic-file`), so the shell never takes on a file
 * it could not save back.
 */
export async function readTopicDocument(filePath: string, fileSystem: DocumentFileSystem = nodeDocumentFileSystem): Promise<TopicDocument> {
  let info: { size: number; mtimeMs: number; isFile(): boolean };
  try {
    info = await fileSystem.stat(filePath);
  } catch (error) {
    throw new ShellFailure('read-failed', error instanceof Error ? error.message : undefined);
  }
  if (!info.isFile()) throw new ShellFailure('read-failed', 'not a file');
  if (info.size > PAYLOAD_LIMITS.documentCharacters * 4) throw new ShellFailure('too-large');
  let bytes: Uint8Array;
  try {
    bytes = await fileSystem.readFile(filePath);
  } catch (error) {
    throw new ShellFailure('read-failed', error instanceof Error ? error.message : undefined);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new ShellFailure('not-a-topic-file', 'not UTF-8 text');
  }
  if (text.length > PAYLOAD_LIMITS.documentCharacters) throw new ShellFailure('too-large');
  if (!isTopicFileText(text)) throw new ShellFailure('not-a-topic-file');
  return { text, modifiedAt: info.mtimeMs };
}
