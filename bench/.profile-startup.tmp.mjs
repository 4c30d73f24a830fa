import { launchChromium } from './browser/launch-chromium.mjs';
import { serveFolder } from './browser/serve-folder.mjs';
const root = process.argv[2] ?? 'dist';
const runs = Number(process.argv[3] ?? 5);
const served = await serveFolder(root);
const browser = await launchChromium();
const agg = [];
for (let r = 0; r < runs; r++) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 100 });
  await cdp.send('Profiler.start');
  await page.goto(served.url);
  await page.locator('.results svg.people-chart [data-outcome]').first().waitFor();
  const { profile } = await cdp.send('Profiler.stop');
  // self time per url+function, and per url
  const byId = new Map(profile.nodes.map(n => [n.id, n]));
  const self = new Map();
  const dt = profile.timeDeltas; 
  for (let i = 0; i < profile.samples.length; i++) {
    const n = byId.get(profile.samples[i]); const d = (dt[i+1] ?? 0) / 1000;
    const f = n.callFrame; const key = `${f.functionName || '(anon)'} ${f.url.split('/').pop()}:${f.lineNumber}`;
    self.set(key, (self.get(key) ?? 0) + d);
  }
  // inclusive time per function name
  const parent = new Map(); for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const incl = new Map();
  for (let i = 0; i < profile.samples.length; i++) {
    const d = (dt[i+1] ?? 0) / 1000; let id = profile.samples[i]; const seen = new Set();
    while (id !== undefined) { const n = byId.get(id); const f = n.callFrame; const key = 'I ' + (f.functionName || '(anon)') + ' ' + f.url.split('/').pop() + ':' + f.lineNumber; if (!seen.has(key)) { seen.add(key); incl.set(key, (incl.get(key) ?? 0) + d); } id = parent.get(id); }
  }
  agg.push(process.env.INCL ? incl : self);
  await context.close();
}
const keys = new Set(agg.flatMap(m => [...m.keys()]));
const med = (a) => { const s=[...a].sort((x,y)=>x-y); return s[Math.floor(s.length/2)]; };
const rows = [...keys].map(k => [k, med(agg.map(m => m.get(k) ?? 0))]).sort((a,b)=>b[1]-a[1]).slice(0, Number(process.argv[4] ?? 40));
for (const [k,v] of rows) console.log(v.toFixed(1).padStart(8), k);
await browser.close(); await served.stop();
