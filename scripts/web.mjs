#!/usr/bin/env node
// `npm run web -- --port PORT`: serves the built app in a browser, with the app's security
// headers. The sources are TypeScript, loaded through tsx's in-process loader.
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';
import { register } from 'tsx/esm/api';

register();
const { parseServeArguments, serveApp } = await import('../src/web/serve-app.ts');
const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..');
try {
  await serveApp(projectRoot, parseServeArguments(process.argv.slice(2)), (line) => process.stdout.write(`${line}\n`));
} catch (error) {
  process.stderr.write(`chancewise web: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 1;
}
