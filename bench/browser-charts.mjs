#!/usr/bin/env node
/**
 * `npm run bench:browser`: the people charts and the app in headless Chromium.
 *
 *   node bench/browser-charts.mjs [--only charts|app] [--loads N] [--repetitions N] [--app-runs N]
 *
 * Prints a table (median, p25, p75, n; milliseconds) and writes bench/results/charts.json.
 * Timings are reported, never judged: the run fails only when something could not be measured.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { timeCharts } from './browser/chart-timing.mjs';
import { launchChromium } from './browser/launch-chromium.mjs';
import { formatTable } from './browser/report.mjs';
import { serveFolder } from './browser/serve-folder.mjs';

const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..');

/** Targets of the timings, in milliseconds (medians). */
const TARGETS = { firstDraw: 16, redraw: 8, appLoad: 500, inputToCharts: 16 };

function option(name, fallback) {
  const at = process.argv.indexOf(`--${name}`);
  return at === -1 ? fallback : (process.argv[at + 1] ?? fallback);
}

const only = option('only', 'all');
const settings = {
  loads: Number(option('loads', 5)),
  repetitions: Number(option('repetitions', 40)),
  appRuns: Number(option('app-runs', 15)),
};

const browser = await launchChromium();
const results = { measuredAt: new Date().toISOString(), chromium: browser.version(), settings, targets: TARGETS };
const rows = [];
try {
  if (only === 'all' || only === 'charts') {
    await build({ configFile: join(projectRoot, 'e2e/chart-page/vite.config.ts'), logLevel: 'warn' });
    const served = await serveFolder(join(projectRoot, 'e2e/chart-page/dist'));
    try {
      const charts = await timeCharts(browser, served.url, settings);
      results.charts = charts;
      rows.push(
        { label: 'chart: first draw, 2 × 1000 people (draw + layout)', target: TARGETS.firstDraw, ...charts.firstDraw },
        { label: '  of which script (drawChart)', target: null, ...charts.firstDrawScript },
        { label: 'chart: redraw with changed counts (updateChart + layout)', target: TARGETS.redraw, ...charts.redraw },
        { label: '  of which script (updateChart)', target: null, ...charts.redrawScript },
        { label: 'chart: first draw on page load (cold)', target: null, ...charts.loadDraw },
      );
    } finally {
      await served.stop();
    }
  }
} finally {
  await browser.close();
}

process.stdout.write(`${formatTable(rows)}\n`);
const file = join(projectRoot, 'bench/results/charts.json');
mkdirSync(dirname(file), { recursive: true });
writeFileSync(file, `${JSON.stringify(results, null, 2)}\n`);
process.stdout.write(`Written to ${file}\n`);
