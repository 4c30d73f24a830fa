import fs from 'node:fs/promises';
import { writeFileAtomic } from './atomic-write.ts';

/** Read a small JSON file, or null when it is missing, unreadable, too large or not JSON. */
export async function readJsonFile(filePath: string, maxCharacters = 100_000): Promise<unknown> {
  try {
    const text = await fs.readFile(filePath, 'utf8');
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
