#!/usr/bin/env node
// Makes sure the system programs the checks need are present: Debian's Chromium (browser
// tests) and poppler-utils (PDF checks). When one is missing and this process may install
// packages (root with apt-get), it installs them; otherwise it stops with the exact command.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const needed = [
  { program: '/usr/bin/chromium', debianPackage: 'chromium' },
  { program: '/usr/bin/pdfinfo', debianPackage: 'poppler-utils' },
  { program: '/usr/bin/pdftotext', debianPackage: 'poppler-utils' },
  { program: '/usr/bin/pdftoppm', debianPackage: 'poppler-utils' },
];

const missing = [...new Set(needed.filter((item) => !existsSync(item.program)).map((item) => item.debianPackage))];
if (missing.length === 0) process.exit(0);

const command = `apt-get update && apt-get install -y ${missing.join(' ')}`;
const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
const hasApt = spawnSync('sh', ['-c', 'command -v apt-get'], { stdio: 'ignore' }).status === 0;
if (!isRoot || !hasApt) {
  console.error(`The checks need ${missing.join(' and ')}. Install with: sudo ${command}`);
  process.exit(1);
}
console.error(`Installing ${missing.join(' ')} for the checks (${command})`);
execFileSync('sh', ['-c', `DEBIAN_FRONTEND=noninteractive ${command}`], { stdio: ['ignore', 'ignore', 'inherit'] });
