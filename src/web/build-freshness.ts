/**
 * Whether the built app is missing or older than its sources, so `npm run web` can
 * rebuild only when needed.
 */
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

function newestChange(path: string): number {
  let info;
  try {
    info = statSync(path);
  } catch {
    return 0;
  }
  if (!info.isDirectory()) return info.mtimeMs;
  let newest = info.mtimeMs;
  for (const entry of readdirSync(path)) {
    if (entry === 'node_modules' || entry.startsWith('.')) continue;
    newest = Math.max(newest, newestChange(join(path, entry)));
  }
  return newest;
}

/** True when `builtFile` does not exist or any of `sources` (files or folders) changed after it. */
export function isBuildStale(builtFile: string, sources: readonly string[]): boolean {
  let built: number;
  try {
    built = statSync(builtFile).mtimeMs;
  } catch {
    return true;
  }
  return sources.some((source) => newestChange(source) > built);
}
