#!/usr/bin/env node
// `npm run scan:electron`: the electronegativity scanner on the desktop shell (electron/), held
// against the reviewed findings in electron/security-scan-accepted.json. Fails on any finding
// not in that list. Works offline: the check that downloads Electron release data is left out,
// and the scanner goes on without its online translations.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(join(root, 'package.json'));
const run = require('@doyensec/electronegativity');
const electronVersion = JSON.parse(readFileSync(join(root, 'node_modules', 'electron', 'package.json'), 'utf8')).version;
const { accepted } = JSON.parse(readFileSync(join(root, 'electron', 'security-scan-accepted.json'), 'utf8'));

const result = await run({
  input: join(root, 'electron'),
  isRelative: true,
  excludeFromScan: ['AvailableSecurityFixesGlobalCheck'],
  electronVersionOverride: electronVersion,
  parserPlugins: [],
});

const used = new Set();
const unexpected = [];
for (const issue of result.issues) {
  const sample = typeof issue.sample === 'string' ? issue.sample : '';
  const match = accepted.findIndex(
    (entry) =>
      entry.check === issue.id &&
      entry.file === issue.file &&
      (entry.snippet === '' ? sample === '' || sample === 'N/A' : sample.includes(entry.snippet)),
  );
  if (match === -1) unexpected.push(issue);
  else used.add(match);
}

for (const error of result.errors) process.stderr.write(`could not scan ${error.file}: ${error.message}\n`);
for (const issue of unexpected) {
  process.stderr.write(
    `NEW ${issue.id} (${issue.severity.name}, ${issue.confidence.name}) ${issue.file}:${issue.location.line}:${issue.location.column}\n    ${String(issue.sample ?? '').slice(0, 200)}\n    ${issue.description}\n`,
  );
}
accepted.forEach((entry, index) => {
  if (!used.has(index))
    process.stdout.write(`note: accepted finding no longer reported, remove it from the list: ${entry.check} ${entry.file}\n`);
});

const summary = `electronegativity ${require('@doyensec/electronegativity/package.json').version} on electron/ (Electron ${electronVersion}): ${result.issues.length} finding(s), ${result.issues.length - unexpected.length} accepted, ${unexpected.length} new, ${result.errors.length} file error(s)`;
process.stdout.write(`${summary}\n`);
process.exitCode = unexpected.length > 0 || result.errors.length > 0 ? 1 : 0;
