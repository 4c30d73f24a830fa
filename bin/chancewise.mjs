#!/usr/bin/env node
// Entry point of the `chancewise` command. It runs the command line built into dist-cli/
// (by `npm ci`, through the prepare script, or `npm run build:cli`), so nothing is compiled
// at start. When a source is newer than that build, or there is none, it builds first: the
// command never runs stale code.
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { builtCli, cliLayout } from '../scripts/cli-build-state.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
let moduleUrl = null;
try {
  moduleUrl = await builtCli(cliLayout(root));
} catch (error) {
  process.stderr.write(
    `chancewise: ${error instanceof Error ? error.message : String(error)}; run "npm run build:cli" to see why.\n`,
  );
  process.exitCode = 1;
}
if (moduleUrl !== null) {
  const { main } = await import(moduleUrl);
  process.exitCode = await main(process.argv.slice(2), {
    stdout: (text) => process.stdout.write(text),
    stderr: (text) => process.stderr.write(text),
  });
}
