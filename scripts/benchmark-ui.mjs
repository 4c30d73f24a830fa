#!/usr/bin/env node
// `npm run bench:ui [-- --runs N]`: how fast the built app becomes usable and how fast it
// answers typing, measured in Debian's Chromium. It builds the app if needed, serves it on a
// free port with the app's security headers, and prints medians in milliseconds:
//   load to interactive  navigation start until the first chart is drawn and the editor answers
//   input to charts      a new baseline risk typed until the next frame after every chart changed
// Timings depend on the machine and its load; compare runs on the same machine only.
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';
import { chromium } from '@playwright/test';

register();
const { serveApp } = await import('../src/web/serve-app.ts');
const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..');
const runsFlag = process.argv.indexOf('--runs');
const runs = runsFlag === -1 ? 5 : Math.max(1, Number(process.argv[runsFlag + 1]) || 5);
const port = 4400 + Math.floor(Math.random() * 500);

const median = (values) => {
  const sorted = [...values].sort((first, second) => first - second);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
};

const address = await serveApp(projectRoot, { port, host: '127.0.0.1', build: true }, () => undefined);
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
    '--no-first-run',
    '--disable-quic',
  ],
});
const load = [];
const typing = { 100: [], 1000: [] };
try {
  for (let run = 0; run < runs; run += 1) {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await page.goto(address);
    await page.locator('svg.people-chart path[data-outcome]').first().waitFor();
    load.push(
      await page.evaluate(() => {
        const start = performance.getEntriesByType('navigation')[0]?.startTime ?? 0;
        return performance.now() - start;
      }),
    );
    for (const per of [100, 1000]) {
      await page.getByRole('radio', { name: `${per} people` }).check();
      await page.waitForTimeout(200);
      const times = await page.evaluate(async (expected) => {
        const input = document.querySelector('input[id*="baseline-risk"]');
        const out = [];
        for (const value of ['16%', '17%', '18%', '19%', '20%', '21%']) {
          const start = performance.now();
          input.value = value;
          input.dispatchEvent(new Event('input', { bubbles: true }));
          // Wait until the headline chart shows the new count, then for the frame after it.
          const wanted = String(Math.round((Number.parseFloat(value) / 100) * expected));
          while (document.querySelector('table[data-outcome-id] tr td.people .value')?.textContent !== wanted) {
            await new Promise((resolve) => setTimeout(resolve, 1));
          }
          await new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
          out.push(performance.now() - start);
        }
        return out;
      }, per);
      typing[per].push(...times);
    }
    await page.close();
  }
} finally {
  await browser.close();
}
const format = (value) => `${value.toFixed(0)} ms`;
process.stdout.write(
  [
    `Chancewise interface benchmark (${runs} runs, Chromium, ${new Date().toISOString()})`,
    `  load to interactive:        median ${format(median(load))}  (min ${format(Math.min(...load))}, max ${format(Math.max(...load))})`,
    `  input to charts, per 100:   median ${format(median(typing[100]))}  (${typing[100].length} changes)`,
    `  input to charts, per 1000:  median ${format(median(typing[1000]))}  (${typing[1000].length} changes)`,
    '',
  ].join('\n'),
);
process.exit(0);
