#!/usr/bin/env node
// Entry point of the `chancewise` command. Node 20 cannot run TypeScript itself,
// so the sources are loaded through tsx's in-process loader (silent, cached).
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
const code = await main(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
});
process.exitCode = code;
