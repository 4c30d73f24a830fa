#!/usr/bin/env node
/**
 * `npm run bench:browser`: the people charts and the app in headless Chromium.
 *
 *   node bench/browser-charts.mjs [--only charts|app] [--loads N] [--repetitions N] [--app-runs N] [--compare DIR[,DIR...]]
 *
 * Prints a table (median, p25, p75, n; milliseconds) and writes bench/results/charts.json.
 * Timings are reported, never judged: the run fails only when something could not be measured.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { timeAppLoads, timeInputToCharts } from './browser/app-timing.mjs';
import { timeCharts } from './browser/chart-timing.mjs';
import { initialJavaScript } from './browser/initial-javascript.mjs';
import { launchChromium } from './browser/launch-chromium.mjs';
import { formatTable } from './browser/report.mjs';
import { serveApp, serveFolder } from './browser/serve-folder.mjs';

const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..');

/** Targets of the timings, in milliseconds (medians). */
// Targets in ms, and the initial JavaScript in KiB gzip (the speed targets of one shape per look).
const TARGETS = { firstDraw: 4, redraw: 3, appLoad: 400, inputToCharts: 8, initialKiBGzip: 90 };

function option(name, fallback) {
  const at = process.argv.indexOf(`--${name}`);
  return at === -1 ? fallback : (process.argv[at + 1] ?? fallback);
}

const only = option('only', 'all');
if (!['all', 'charts', 'app'].includes(only)) throw new Error(`--only takes charts or app (got ${only})`);
const settings = {
  loads: Number(option('loads', 5)),
  repetitions: Number(option('repetitions', 40)),
  appRuns: Number(option('app-runs', 15)),
  // Other built app folders (for example an older checkout's dist/), comma-separated, timed in the same run.
  compare: option('compare', '')
    .split(',')
    .filter((folder) => folder !== ''),
};

const browser = await launchChromium();
const results = {
  measuredAt: new Date().toISOString(),
  chromium: browser.version(),
  // One-minute load average when the run started: on a busy machine every timing grows.
  loadAverage: Math.round((loadavg()[0] ?? 0) * 100) / 100,
  settings,
  targets: TARGETS,
};
const rows = [];
/** @type {string[]} */
const notes = [];
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
        { label: '  main-thread CPU time of the same spans', target: null, ...charts.firstDrawCpu },
        { label: 'chart: redraw with changed counts (updateChart + layout)', target: TARGETS.redraw, ...charts.redraw },
        { label: '  of which script (updateChart)', target: null, ...charts.redrawScript },
        { label: '  main-thread CPU time of the same spans', target: null, ...charts.redrawCpu },
        { label: 'chart: first draw on page load (cold)', target: null, ...charts.loadDraw },
        { label: 'floor: 2000 empty <path data-outcome> (+ layout)', target: null, ...charts.bareElements },
        { label: '  main-thread CPU time of the same spans', target: null, ...charts.bareElementsCpu },
      );
      const ratio = (/** @type {number | null} */ over, /** @type {number | null} */ under) =>
        over === null || under === null || under === 0 ? 'n/a' : `${(over / under).toFixed(2)}×`;
      notes.push(
        `chart: first draw / floor of the same number of empty elements: ${ratio(charts.firstDraw.median, charts.bareElements.median)} ` +
          `(CPU ${ratio(charts.firstDrawCpu.median, charts.bareElementsCpu.median)})`,
      );
    } finally {
      await served.stop();
    }
  }
  if (only === 'all' || only === 'app') {
    // The production build, started as a person starts it (on the first example), through scripts/web.mjs.
    const served = await serveApp(projectRoot);
    // The bench's build of the same app, which starts on the bench's own fixture instead.
    await build({ configFile: join(projectRoot, 'bench/app-page/vite.config.ts') });
    const benchServed = await serveFolder(join(projectRoot, 'bench/app-page/dist'));
    /** @type {{ folder: string, url: string, stop: () => Promise<void> }[]} */
    const compared = [];
    for (const folder of settings.compare) compared.push({ folder, ...(await serveFolder(folder)) });
    try {
      const loads = await timeAppLoads(
        browser,
        {
          bench: benchServed.url,
          example: served.url,
          ...Object.fromEntries(compared.map((other) => [other.folder, other.url])),
        },
        settings.appRuns,
      );
      const load = loads.bench;
      const input = await timeInputToCharts(browser, served.url, { projectRoot, repetitions: settings.repetitions });
      const javascript = initialJavaScript(join(projectRoot, 'dist/index.html'));
      const requested = Object.values(loads).flatMap((each) => each.requested);
      const pdfFetched = javascript.pdfChunks.filter((chunk) => requested.some((path) => path.endsWith(`/${chunk}`)));
      const javascriptCompared = Object.fromEntries(
        compared.map((other) => [other.folder, initialJavaScript(join(other.folder, 'index.html'))]),
      );
      results.app = { loads, input, javascript: { ...javascript, pdfFetchedOnLoad: pdfFetched }, javascriptCompared };
      rows.push(
        { label: 'app: load: page received', target: null, ...load.responseEnd },
        { label: 'app: load: script received', target: null, ...load.scriptFetched },
        { label: 'app: load: script run (DOMContentLoaded end)', target: null, ...load.contentLoaded },
        { label: 'app: load to bench topic interactive (DOM ready)', target: null, ...load.interactive },
        { label: 'app: load to bench topic interactive (frame rendered)', target: TARGETS.appLoad, ...load.rendered },
        { label: '  main-thread CPU time, document start to frame', target: null, ...load.cpu },
        { label: '  the same, production build on its first example (DOM ready)', target: null, ...loads.example.interactive },
        { label: '  the same, production build on its first example (frame)', target: null, ...loads.example.rendered },
        { label: '  the same, production build on its first example (CPU)', target: null, ...loads.example.cpu },
        ...compared.flatMap((other) => [
          { label: `  the same, ${other.folder} (DOM ready)`, target: null, ...loads[other.folder].interactive },
          { label: `  the same, ${other.folder} (frame)`, target: null, ...loads[other.folder].rendered },
          { label: `  the same, ${other.folder} (CPU)`, target: null, ...loads[other.folder].cpu },
        ]),
        { label: 'app: input to charts updated, 2 × 1000 (+ layout)', target: TARGETS.inputToCharts, ...input.total },
        { label: '  of which until the chart DOM changed', target: null, ...input.dom },
        { label: '  main-thread CPU time of the same spans', target: null, ...input.cpu },
      );
      const sizes = (/** @type {ReturnType<typeof initialJavaScript>} */ of) =>
        `${of.files.map((file) => `${file.file} ${(file.gzipBytes / 1024).toFixed(1)}`).join(', ')}: ` +
        `${(of.bytes / 1024).toFixed(1)} KiB, ${(of.gzipBytes / 1024).toFixed(1)} KiB gzip`;
      notes.push(
        `app: initial JavaScript (KiB gzip per chunk) ${sizes(javascript)} (target < ${TARGETS.initialKiBGzip} KiB gzip: ` +
          `${javascript.gzipBytes / 1024 < TARGETS.initialKiBGzip ? 'met' : 'NOT met'})`,
        ...Object.entries(javascriptCompared).map(([folder, of]) => `  ${folder}: ${sizes(of)}`),
        `app: PDF code (jsPDF) in the initial JavaScript: ${javascript.pdfCodeInitial ? 'YES' : 'no'}; ` +
          `lazy PDF chunks: ${javascript.pdfChunks.join(', ') || 'none'}; fetched during load: ${pdfFetched.join(', ') || 'none'}`,
      );
    } finally {
      await served.stop();
      await benchServed.stop();
      for (const other of compared) await other.stop();
    }
  }
} finally {
  await browser.close();
}

process.stdout.write(`Load average (1 min) at the start: ${results.loadAverage} on this machine\n`);
process.stdout.write(`${formatTable(rows)}\n`);
for (const note of notes) process.stdout.write(`${note}\n`);
const file = join(projectRoot, 'bench/results/charts.json');
mkdirSync(dirname(file), { recursive: true });
writeFileSync(file, `${JSON.stringify(results, null, 2)}\n`);
process.stdout.write(`Written to ${file}\n`);
