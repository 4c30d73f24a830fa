import { launchChromium } from './browser/launch-chromium.mjs';
import { serveFolder } from './browser/serve-folder.mjs';
const root = process.argv[2] ?? 'dist';
const runs = Number(process.argv[3] ?? 5);
const filter = process.argv[5] ? new RegExp(process.argv[5]) : null;
const served = await serveFolder(root);
const browser = await launchChromium();
const agg = [];
function init() {
  console.profile('start');
  const ready = () => document.querySelector('.results svg.people-chart [data-outcome]') !== null && document.querySelector('.editor-column input:enabled') !== null;
  const observer = new MutationObserver(() => { if (!ready()) return; observer.disconnect(); requestAnimationFrame(() => setTimeout(() => console.profileEnd('start'), 0)); });
  observer.observe(document, { childList: true, subtree: true, attributes: true });
}
for (let r = 0; r < runs; r++) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 100 });
  const done = new Promise((resolve) => cdp.on('Profiler.consoleProfileFinished', (e) => resolve(e.profile)));
  await page.addInitScript(init);
  await page.goto(served.url);
  const profile = await done;
  const byId = new Map(profile.nodes.map(n => [n.id, n]));
  const dt = profile.timeDeltas;
  const parent = new Map(); for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const incl = new Map();
  for (let i = 0; i < profile.samples.length; i++) {
    const d = (dt[i+1] ?? 0) / 1000; let id = profile.samples[i]; const seen = new Set(); let self = true;
    while (id !== undefined) { const n = byId.get(id); const f = n.callFrame; const key = (f.functionName || '(anon)') + ' ' + f.url.split('/').pop() + ':' + f.lineNumber; if (self) { incl.set('S '+key, (incl.get('S '+key) ?? 0) + d); self = false; } if (!seen.has(key)) { seen.add(key); incl.set('I '+key, (incl.get('I '+key) ?? 0) + d); } id = parent.get(id); }
  }
  // children of the module's top level
  const top = profile.nodes.filter(n => n.callFrame.lineNumber === 0 && n.callFrame.url.includes('index-'));
  const totalOf = (id) => { let t = 0; const stack=[id]; const ids=new Set(); while(stack.length){const x=stack.pop(); ids.add(x); for (const c of byId.get(x).children ?? []) stack.push(c);} for (let i=0;i<profile.samples.length;i++) if (ids.has(profile.samples[i])) t += (dt[i+1]??0)/1000; return t; };
  for (const t of top) for (const c of t.children ?? []) { const f = byId.get(c).callFrame; const key = 'C ' + (f.functionName||'(anon)') + ':' + f.lineNumber; incl.set(key, (incl.get(key) ?? 0) + totalOf(c)); }
  incl.set('TOTAL', (profile.endTime - profile.startTime) / 1000);
  agg.push(incl);
  await context.close();
}
const keys = new Set(agg.flatMap(m => [...m.keys()]));
const med = (a) => { const s=[...a].sort((x,y)=>x-y); return s[Math.floor(s.length/2)]; };
const rows = [...keys].filter(k => !filter || filter.test(k)).map(k => [k, med(agg.map(m => m.get(k) ?? 0))]).sort((a,b)=>b[1]-a[1]).slice(0, Number(process.argv[4] ?? 40));
for (const [k,v] of rows) console.log(v.toFixed(1).padStart(8), k);
await browser.close(); await served.stop();
