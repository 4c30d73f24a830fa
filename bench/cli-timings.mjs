#!/usr/bin/env node
// `npm run bench:cli`: wall time of whole `chancewise` processes (start to exit), beside
// `node -e 0` in the same run, and of one `handout --out-dir` call that makes many handouts.
// Prints a table and writes bench/results/cli.json. See bench/README.md.
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..');
const { values } = parseArgs({
  options: {
    runs: { type: 'string', default: '15' },
    batch: { type: 'string', default: '100' },
    'batch-runs': { type: 'string', default: '3' },
    entry: { type: 'string', default: join(ROOT, 'bin', 'chancewise.mjs') },
  },
});
const runs = Number(values.runs);
const batchSize = Number(values.batch);
const batchRuns = Number(values['batch-runs']);
const entry = resolve(values.entry);
const scratch = mkdtempSync(join(tmpdir(), 'chancewise-bench-cli-'));
const DATE = '2026-12-01';

/** The p-th quantile of sorted numbers, linear between order statistics (Hyndman & Fan 1996, definition 7). */
function quantile(sorted, p) {
  const position = (sorted.length - 1) * p;
  const low = Math.floor(position);
  const high = Math.min(low + 1, sorted.length - 1);
  return sorted[low] + (sorted[high] - sorted[low]) * (position - low);
}

/** Run one process to its end; its wall time in milliseconds. Fails the run on a non-zero exit. */
function timed(command) {
  const start = process.hrtime.bigint();
  const result = spawnSync(process.execPath, command, { cwd: ROOT, encoding: 'utf8' });
  const milliseconds = Number(process.hrtime.bigint() - start) / 1e6;
  if (result.status !== 0) throw new Error(`${command.join(' ')} exited ${result.status}: ${result.stderr.trim()}`);
  return milliseconds;
}

function summary(samples) {
  const sorted = [...samples].sort((a, b) => a - b);
  return { median: quantile(sorted, 0.5), p25: quantile(sorted, 0.25), p75: quantile(sorted, 0.75), count: sorted.length };
}

const processes = [
  { name: 'node -e 0 (floor)', command: ['-e', '0'], target: null },
  { name: 'compute --demo', command: [entry, 'compute', '--demo'], target: 250 },
  { name: 'chart --demo', command: [entry, 'chart', '--demo', '--out', join(scratch, 'chart.svg')], target: 400 },
  {
    name: 'handout --demo',
    command: [entry, 'handout', '--demo', '--out', join(scratch, 'handout.pdf'), '--date', DATE],
    target: 700,
  },
];

// One untimed run each first (a build after a source change, the disk cache), then the
// processes take turns so that a busy moment of the machine falls on all of them alike.
for (const each of processes) timed(each.command);
const samples = processes.map(() => []);
for (let round = 0; round < runs; round += 1) {
  processes.forEach((each, index) => samples[index].push(timed(each.command)));
}
const rows = processes.map((each, index) => ({ name: each.name, target: each.target, ...summary(samples[index]) }));

let batch = null;
if (batchSize > 0) {
  // The demo topics copied under distinct names, taken in turn, to make `batchSize` inputs.
  const demoFolder = join(ROOT, 'assets', 'demo');
  const demos = readdirSync(demoFolder)
    .filter((name) => name.endsWith('.json'))
    .sort();
  const inputs = join(scratch, 'inputs');
  mkdirSync(inputs);
  const files = Array.from({ length: batchSize }, (_, index) => {
    const path = join(inputs, `topic-${String(index + 1).padStart(3, '0')}.json`);
    copyFileSync(join(demoFolder, demos[index % demos.length]), path);
    return path;
  });
  const out = join(scratch, 'handouts');
  const times = [];
  for (let run = 0; run < batchRuns; run += 1) {
    rmSync(out, { recursive: true, force: true });
    times.push(timed([entry, 'handout', ...files, '--out-dir', out, '--date', DATE]));
    if (readdirSync(out).length !== batchSize)
      throw new Error(`the batch wrote ${readdirSync(out).length} of ${batchSize} handouts`);
  }
  batch = { name: `handout ×${batchSize} in one --out-dir call`, target: 20_000, ...summary(times) };
}

const floor = rows[0].median;
const load = loadavg()[0];
const format = (ms) => `${ms.toFixed(0)} ms`;
console.log(`\nCommand line, wall time per process (${runs} runs each, load ${load.toFixed(2)} at the end, ${process.version}):`);
console.log('  process                            median    p25–p75          × floor  target');
for (const row of batch === null ? rows : [...rows, batch]) {
  const spread = `${format(row.p25)}–${format(row.p75)}`;
  const ratio = (row.median / floor).toFixed(1);
  const target = row.target === null ? '' : `< ${format(row.target)}`;
  console.log(`  ${row.name.padEnd(34)} ${format(row.median).padStart(8)}  ${spread.padEnd(16)} ${ratio.padStart(7)}  ${target}`);
}
if (batch !== null) console.log(`  per handout in the batch: ${format(batch.median / batchSize)}`);

mkdirSync(join(ROOT, 'bench', 'results'), { recursive: true });
writeFileSync(
  join(ROOT, 'bench', 'results', 'cli.json'),
  `${JSON.stringify({ entry, node: process.version, load, runs, rows, batch }, null, 2)}\n`,
);
rmSync(scratch, { recursive: true, force: true });
