/**
 * The chart benchmark: the check page (e2e/chart-page) in headless Chromium, the
 * headline chart of the example topic per 1000 (two arrays of 1000 people), timed in
 * the page by its own hooks (e2e/chart-page/draw-timing.ts): wall time with
 * `performance.now()`, and main-thread CPU time of the same spans from a trace.
 */
import { summarise } from './statistics.mjs';
import { MARK_CATEGORIES, markedCpuSpans } from './trace-cpu.mjs';

/**
 * Time first draws and redraws over `loads` fresh page loads of `url`.
 * @param {import('@playwright/test').Browser} browser
 * @param {string} url
 * @param {{ loads: number, repetitions: number }} settings
 */
export async function timeCharts(browser, url, settings) {
  /** @type {Record<'firstDraw' | 'firstDrawScript' | 'firstDrawCpu' | 'redraw' | 'redrawScript' | 'redrawCpu' | 'loadDraw' | 'bare' | 'bareCpu', number[]>} */
  const samples = {
    firstDraw: [],
    firstDrawScript: [],
    firstDrawCpu: [],
    redraw: [],
    redrawScript: [],
    redrawCpu: [],
    loadDraw: [],
    bare: [],
    bareCpu: [],
  };
  for (let load = 0; load < settings.loads; load += 1) {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    const errors = [];
    page.on('pageerror', (error) => errors.push(String(error)));
    await page.goto(url);
    await page.waitForFunction(() => document.body.dataset['ready'] === 'true');
    const per = await page.evaluate(() => window.chartPage?.per);
    if (per !== 1000) throw new Error(`the chart page drew per ${per}, not per 1000`);
    const loadDraw = await page.evaluate(() => window.chartPage?.loadDraw.total ?? null);
    if (typeof loadDraw === 'number') samples.loadDraw.push(loadDraw);
    await browser.startTracing(page, { categories: MARK_CATEGORIES });
    const first = await page.evaluate((repetitions) => window.chartPage?.timeFirstDraws(repetitions), settings.repetitions);
    const redraw = await page.evaluate((repetitions) => window.chartPage?.timeRedraws(repetitions), settings.repetitions);
    const bare = await page.evaluate((repetitions) => window.chartPage?.timeBareElements(repetitions), settings.repetitions);
    const trace = await browser.stopTracing();
    samples.bareCpu.push(...markedCpuSpans(trace, 'bare-elements'));
    for (const sample of bare ?? []) samples.bare.push(sample.total);
    samples.firstDrawCpu.push(...markedCpuSpans(trace, 'chart-first-draw'));
    samples.redrawCpu.push(...markedCpuSpans(trace, 'chart-redraw'));
    for (const sample of first ?? []) {
      samples.firstDraw.push(sample.total);
      samples.firstDrawScript.push(sample.script);
    }
    for (const sample of redraw ?? []) {
      samples.redraw.push(sample.total);
      samples.redrawScript.push(sample.script);
    }
    if (errors.length > 0) throw new Error(`the chart page reported errors: ${errors.join('; ')}`);
    await context.close();
  }
  return {
    firstDraw: summarise(samples.firstDraw),
    firstDrawScript: summarise(samples.firstDrawScript),
    firstDrawCpu: summarise(samples.firstDrawCpu),
    redraw: summarise(samples.redraw),
    redrawScript: summarise(samples.redrawScript),
    redrawCpu: summarise(samples.redrawCpu),
    loadDraw: summarise(samples.loadDraw),
    bareElements: summarise(samples.bare),
    bareElementsCpu: summarise(samples.bareCpu),
  };
}
