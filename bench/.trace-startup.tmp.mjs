// temporary: trace the app's start-up and summarise main-thread events
import { launchChromium } from './browser/launch-chromium.mjs';
import { serveFolder } from './browser/serve-folder.mjs';
import { writeFileSync } from 'node:fs';
const root = process.argv[2] ?? 'dist';
const runs = Number(process.argv[3] ?? 5);
const served = await serveFolder(root);
const browser = await launchChromium();
const totals = [];
for (let r = 0; r < runs; r++) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  await browser.startTracing(page, { categories: ['devtools.timeline', 'v8', 'blink.user_timing', 'disabled-by-default-devtools.timeline', 'loading'] });
  await page.goto(served.url);
  await page.locator('.results svg.people-chart [data-outcome]').first().waitFor();
  await page.waitForTimeout(300);
  const buf = await browser.stopTracing();
  const events = JSON.parse(buf.toString()).traceEvents;
  // main thread: CrRendererMain
  const names = events.filter(e => e.name === 'thread_name' && e.args?.name === 'CrRendererMain');
  const tids = new Set(names.map(e => `${e.pid}:${e.tid}`));
  const main = events.filter(e => tids.has(`${e.pid}:${e.tid}`) && e.ph === 'X');
  const nav = events.find(e => e.name === 'navigationStart' || e.name === 'fetchStart');
  const sums = {};
  for (const e of main) sums[e.name] = (sums[e.name] ?? 0) + e.dur / 1000;
  totals.push(sums);
  if (r === 0) writeFileSync('/tmp/w17/trace0.json', buf);
  await context.close();
}
const keys = new Set(totals.flatMap(t => Object.keys(t)));
const med = (a) => { const s=[...a].sort((x,y)=>x-y); return s[Math.floor(s.length/2)]; };
const rows = [...keys].map(k => [k, med(totals.map(t => t[k] ?? 0))]).sort((a,b)=>b[1]-a[1]).slice(0,30);
for (const [k,v] of rows) console.log(v.toFixed(1).padStart(8), k);
await browser.close(); await served.stop();
