import path from 'node:path';

/** How many recent files the menu lists. */
export const MAX_RECENT_FILES = 10;

/** The recent list with one file put first (moved if it was already there), cut to the maximum. */
export function addRecentFile(list: readonly string[], filePath: string): string[] {
  return [filePath, ...list.filter((item) => item !== filePath)].slice(0, MAX_RECENT_FILES);
}

/**
 * Read a stored recent list from parsed JSON: absolute paths only, without NUL, no repeats,
 * at most the maximum; anything else is dropped.
 */
export function parseRecentFiles(value: unknown): string[] {
  if (!Array.isArray(value)) return [];
  const paths: string[] = [];
  for (const item of value) {
    if (typeof item !== 'string' || item.length === 0 || item.length > 4096 || item.includes('\u0000')) continue;
    if (!path.isAbsolute(item) || paths.includes(item)) continue;
    paths.push(item);
    if (paths.length === MAX_RECENT_FILES) break;
  }
  return paths;
}
