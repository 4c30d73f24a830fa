// Where the built command line lives and whether it is up to date with its sources. Kept
// apart from the build itself so that `bin/chancewise.mjs` loads no bundler on a normal start.
import { readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { pathToFileURL } from 'node:url';

/** The files of the command line's build under a project root. */
export function cliLayout(root) {
  return {
    root,
    entry: join(root, 'src', 'cli', 'main.ts'),
    // One folder down, as src/cli is, so the sources' paths to assets/ hold in the bundle too.
    outFile: join(root, 'dist-cli', 'cli', 'main.mjs'),
    stampFile: join(root, 'dist-cli', 'cli', 'build-inputs.json'),
  };
}

/**
 * Why the build cannot be run as it is (not built yet, a source changed or went since it was
 * built), or null when it is up to date. A source counts as changed when its modification
 * time is later than the moment the build started reading.
 */
export function staleReason(layout) {
  let stamp;
  try {
    stamp = JSON.parse(readFileSync(layout.stampFile, 'utf8'));
    statSync(layout.outFile);
  } catch {
    return 'it has not been built yet';
  }
  if (typeof stamp?.startedAt !== 'number' || !Array.isArray(stamp.inputs)) return 'its build record is unreadable';
  for (const input of stamp.inputs) {
    let modified;
    try {
      modified = statSync(input).mtimeMs;
    } catch {
      return `${relative(layout.root, input)} is gone`;
    }
    if (modified > stamp.startedAt) return `${relative(layout.root, input)} changed since it was built`;
  }
  return null;
}

/** The URL of the built command line's module, building it first when it is missing or stale. */
export async function builtCli(layout) {
  const reason = staleReason(layout);
  if (reason !== null) {
    const { buildCli } = await import('./build-cli.mjs');
    try {
      await buildCli(layout);
    } catch (error) {
      const detail = error instanceof Error ? error.message.split('\n')[0] : String(error);
      throw new Error(`the built command line is out of date (${reason}) and could not be rebuilt: ${detail}`, { cause: error });
    }
  }
  return pathToFileURL(layout.outFile).href;
}
