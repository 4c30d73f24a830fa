#!/usr/bin/env node
// `npm run build:cli` (also run by `npm ci` through the prepare script): bundles the command
// line's TypeScript (src/cli/main.ts and what it imports) into ES modules in dist-cli/, so
// it starts without compiling anything: main.mjs, and a chunk for what only some commands load
// (the chart and handout code, jsPDF), so `compute` does not load them. Packages stay imports of node_modules; the fonts and
// demo topics are read from where they are installed. Next to the bundle, a record of every
// source it was made from and when the build started, which the entry point checks.
import { mkdirSync, readdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { cliLayout } from './cli-build-state.mjs';

const THIS_FILE = fileURLToPath(import.meta.url);

/** Write a file by renaming a finished copy over it, so no reader ever sees half of it. */
function writeAtomically(path, contents) {
  mkdirSync(dirname(path), { recursive: true });
  const partial = `${path}.${process.pid}.partial`;
  writeFileSync(partial, contents);
  renameSync(partial, path);
}

/**
 * Build the command line of `layout` (see cliLayout). Chunks have content-hashed names and are
 * written first, the entry module and the record last; chunks of earlier builds are removed.
 * Returns the size of what was written and the number of sources.
 */
export async function buildCli(layout) {
  const startedAt = Date.now();
  const folder = dirname(layout.outFile);
  const result = await build({
    absWorkingDir: layout.root,
    entryPoints: { [basename(layout.outFile, '.mjs')]: layout.entry },
    outdir: folder,
    outExtension: { '.js': '.mjs' },
    chunkNames: 'chunk-[hash]',
    splitting: true,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    write: false,
    metafile: true,
    logLevel: 'silent',
  });
  const inputs = [...Object.keys(result.metafile.inputs).map((input) => resolve(layout.root, input)), THIS_FILE];
  const entry = result.outputFiles.find((file) => file.path === layout.outFile);
  if (entry === undefined) throw new Error(`esbuild wrote no ${layout.outFile}`);
  const chunks = result.outputFiles.filter((file) => file !== entry);
  for (const chunk of chunks) writeAtomically(chunk.path, chunk.contents);
  writeAtomically(layout.outFile, entry.contents);
  writeAtomically(layout.stampFile, `${JSON.stringify({ startedAt, inputs }, null, 1)}\n`);
  const current = new Set(chunks.map((chunk) => basename(chunk.path)));
  for (const name of readdirSync(folder)) {
    if (/^chunk-.*\.mjs$/.test(name) && !current.has(name)) rmSync(join(folder, name), { force: true });
  }
  return { bytes: result.outputFiles.reduce((sum, file) => sum + file.contents.length, 0), sources: inputs.length };
}

if (process.argv[1] !== undefined && resolve(process.argv[1]) === THIS_FILE) {
  const layout = cliLayout(join(dirname(THIS_FILE), '..'));
  try {
    const { bytes, sources } = await buildCli(layout);
    process.stdout.write(
      `Built ${relative(layout.root, layout.outFile)} (${Math.round(bytes / 1024)} KiB) from ${sources} sources.\n`,
    );
  } catch (error) {
    process.stderr.write(`build-cli: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 1;
  }
}
