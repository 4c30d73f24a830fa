#!/usr/bin/env node
// Prints the median of every Vitest benchmark from its JSON output (Vitest's table shows
// means and percentiles; the shared, noisy machines call for medians).
import { readFileSync } from 'node:fs';

const file = process.argv[2] ?? 'bench/results/unit.json';
const report = JSON.parse(readFileSync(file, 'utf8'));
const rows = [];
for (const bench of report.files ?? []) {
  for (const group of bench.groups ?? []) {
    for (const entry of group.benchmarks ?? []) {
      rows.push({
        name: `${group.fullName ?? ''} > ${entry.name}`,
        median: entry.median,
        p75: entry.p75,
        samples: entry.sampleCount,
      });
    }
  }
}
const format = (milliseconds) => (milliseconds < 1 ? `${(milliseconds * 1000).toFixed(1)} µs` : `${milliseconds.toFixed(2)} ms`);
console.log('\nMedians (Vitest bench):');
for (const row of rows)
  console.log(`  ${row.name}: median ${format(row.median)}, p75 ${format(row.p75)}, ${row.samples} samples`);
