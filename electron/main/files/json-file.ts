import { readRegularFile } from '../../../src/shared/regular-file.ts';
import { writeFileAtomic } from './atomic-write.ts';

/**
 * Read a small JSON file of the app's own (in its user-data folder), or null when it is
 * missing, unreadable, not a regular file, a symbolic link, too large or not JSON. At most
 * four bytes per allowed character are ever read.
 */
export async function readJsonFile(filePath: string, maxCharacters = 100_000): Promise<unknown> {
  try {
    const { bytes } = await readRegularFile(filePath, { followLink: false, maxBytes: maxCharacters * 4 });
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    if (text.length > maxCharacters) return null;
    return JSON.parse(text) as unknown;
  } catch {
    return null;
  }
}

/** Write a small JSON file atomically. */
export async function writeJsonFile(filePath: string, value: unknown): Promise<void> {
  await writeFileAtomic(filePath, `${JSON.stringify(value, null, 2)}\n`);
}
