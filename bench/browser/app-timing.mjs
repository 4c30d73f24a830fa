/**
 * The app benchmark: built apps in headless Chromium.
 *
 * Load: navigation start (the page's time origin) to the topic shown at start being interactive,
 * defined as the first moment a results element (`.results`) holds a drawn people chart
 * (`svg.people-chart [data-outcome]`) and the editor has an enabled input. A
 * MutationObserver installed before any page script notes that moment with
 * `performance.now()`; "rendered" is the end of the first frame after it (a task queued
 * from the next `requestAnimationFrame`). Each run is a fresh browser context (empty
 * cache and storage), and every request is recorded, to show no PDF code is fetched.
 * Along the way: the page's response end, the first script's response end, and the end
 * of DOMContentLoaded (after the module script, which mounts the app, has run). The
 * renderer main thread's CPU time from the document's start (a mark set before any page
 * script) to "rendered" comes from a trace of marks, as for the input timing.
 *
 * Several builds can be timed in one run (the bench's own build, which starts on the
 * bench's fixture, beside the production build, which starts on the first example); they
 * take turns load by load.
 *
 * Input to charts: a topic of one outcome, the comparison and one option (taken from the
 * bench's fixture), shown per 1000 people: two arrays of 1000. The time runs from just
 * before an `input` event is dispatched on the baseline risk field to the moment the
 * chart's text alternative (updated in the same task as its people) shows the new counts,
 * seen by a MutationObserver, plus a forced layout (`getBoundingClientRect()` and
 * `offsetHeight`), as in the chart benchmark. Baselines of 15%, 20% and 12% take turns.
 * The main thread's CPU time over each sample comes from a trace of marks around it.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { summarise } from './statistics.mjs';
import { MARK_CATEGORIES, markedCpuSpans } from './trace-cpu.mjs';

/** The benchmark's own topic, invented and kept fixed so the figures stay comparable (the examples change). */
export const BENCH_TOPIC = 'bench/fixtures/bench-topic.chancewise.json';

/** Installed before the page's own scripts: notes when the page first becomes interactive. */
function watchInteractive() {
  const state = { interactive: null, rendered: null };
  Object.defineProperty(window, 'chancewiseBench', { value: state });
  // The main thread's CPU clock at these marks gives the load's CPU time (see trace-cpu.mjs).
  performance.mark('app-load:start');
  const ready = () => {
    const chart = document.querySelector('.results svg.people-chart [data-outcome]');
    const input = document.querySelector('.editor-column input:enabled, .editor-column textarea:enabled');
    return chart !== null && input !== null;
  };
  const observer = new MutationObserver(() => {
    if (state.interactive !== null || !ready()) return;
    state.interactive = performance.now();
    observer.disconnect();
    requestAnimationFrame(() =>
      setTimeout(() => {
        state.rendered = performance.now();
        performance.mark('app-load:end');
      }, 0),
    );
  });
  observer.observe(document, { childList: true, subtree: true, attributes: true });
}

/**
 * One fresh load of `url` in a new browser context: the moments of the load (see above).
 * @param {import('@playwright/test').Browser} browser
 * @param {string} url
 * @param {Set<string>} requested
 * @param {string[]} errors
 */
async function loadOnce(browser, url, requested, errors) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  page.on('request', (request) => requested.add(new URL(request.url()).pathname));
  page.on('pageerror', (error) => errors.push(String(error)));
  await page.addInitScript(watchInteractive);
  await browser.startTracing(page, { categories: MARK_CATEGORIES });
  await page.goto(url);
  const times = await page
    .waitForFunction(
      () => {
        const state = /** @type {{ interactive: number | null, rendered: number | null } | undefined} */ (
          /** @type {unknown} */ (window)['chancewiseBench']
        );
        return state !== undefined && state.rendered !== null ? state : null;
      },
      undefined,
      { timeout: 30_000 },
    )
    .then((handle) => handle.jsonValue());
  const [cpu = null] = markedCpuSpans(await browser.stopTracing(), 'app-load');
  const navigation = await page.evaluate(() => {
    const entry = /** @type {PerformanceNavigationTiming | undefined} */ (performance.getEntriesByType('navigation')[0]);
    const script = performance.getEntriesByType('resource').find((resource) => resource.name.endsWith('.js'));
    return {
      responseEnd: entry?.responseEnd ?? null,
      scriptEnd: script?.responseEnd ?? null,
      contentLoaded: entry?.domContentLoadedEventEnd ?? null,
    };
  });
  await context.close();
  return { ...times, cpu, ...navigation };
}

/**
 * Time the loads of several built apps, `runs` fresh loads each. The apps take turns, one
 * load each and each round starting with the next, so a busy moment of the machine falls on
 * all of them alike.
 * @param {import('@playwright/test').Browser} browser
 * @param {Record<string, string>} urls the app's address, by name
 * @param {number} runs
 */
export async function timeAppLoads(browser, urls, runs) {
  const names = Object.keys(urls);
  /** @type {Record<string, { interactive: number[], rendered: number[], cpu: number[], responseEnd: number[], scriptFetched: number[], contentLoaded: number[], requested: Set<string> }>} */
  const collected = {};
  for (const name of names) {
    collected[name] = {
      interactive: [],
      rendered: [],
      cpu: [],
      responseEnd: [],
      scriptFetched: [],
      contentLoaded: [],
      requested: new Set(),
    };
  }
  const errors = [];
  for (let run = 0; run < runs; run += 1) {
    // Each round starts with another app, so none always comes first after a context closes.
    for (const name of names.map((_, at) => names[(at + run) % names.length])) {
      const into = collected[name];
      const load = await loadOnce(browser, urls[name], into.requested, errors);
      into.interactive.push(load.interactive);
      into.rendered.push(load.rendered);
      if (load.cpu !== null) into.cpu.push(load.cpu);
      if (load.responseEnd !== null) into.responseEnd.push(load.responseEnd);
      if (load.scriptEnd !== null) into.scriptFetched.push(load.scriptEnd);
      if (load.contentLoaded !== null) into.contentLoaded.push(load.contentLoaded);
    }
  }
  if (errors.length > 0) throw new Error(`the app reported errors while loading: ${errors.join('; ')}`);
  return Object.fromEntries(
    names.map((name) => {
      const into = collected[name];
      return [
        name,
        {
          responseEnd: summarise(into.responseEnd),
          scriptFetched: summarise(into.scriptFetched),
          contentLoaded: summarise(into.contentLoaded),
          interactive: summarise(into.interactive),
          rendered: summarise(into.rendered),
          cpu: summarise(into.cpu),
          requested: [...into.requested].sort(),
        },
      ];
    }),
  );
}

/** The bench's own topic (bench/fixtures/) reduced to its headline outcome, the comparison and one option. */
export function twoArrayTopic(projectRoot) {
  const file = JSON.parse(readFileSync(join(projectRoot, BENCH_TOPIC), 'utf8'));
  const topic = file.topic;
  const comparison = topic.options.find((option) => option.isComparison);
  const option = topic.options.find((candidate) => !candidate.isComparison);
  const headline = topic.outcomes.find((outcome) => outcome.isHeadline) ?? topic.outcomes[0];
  return JSON.stringify({
    ...file,
    topic: {
      ...topic,
      title: 'Two arrays of 1000 people (illustrative, for timing)',
      options: [comparison, option],
      outcomes: [{ ...headline, effects: headline.effects.filter((effect) => effect.optionId === option.id) }],
    },
  });
}

/**
 * @param {import('@playwright/test').Browser} browser
 * @param {string} url
 * @param {{ projectRoot: string, repetitions: number }} settings
 */
export async function timeInputToCharts(browser, url, settings) {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  const page = await context.newPage();
  const errors = [];
  page.on('pageerror', (error) => errors.push(String(error)));
  await page.goto(url);
  await page.locator('.results svg.people-chart').first().waitFor();
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Open…' }).click();
  await (
    await chooser
  ).setFiles({
    name: 'two-arrays.chancewise.json',
    mimeType: 'application/json',
    buffer: Buffer.from(twoArrayTopic(settings.projectRoot)),
  });
  await page.getByRole('radio', { name: '1000 people' }).check();
  await page.waitForFunction(() => {
    const charts = document.querySelectorAll('.results svg.people-chart');
    return (
      charts.length === 1 &&
      charts[0]?.getAttribute('data-denominator') === '1000' &&
      [...charts[0].querySelectorAll('[data-outcome]')].reduce(
        (sum, shape) => sum + Number(shape.getAttribute('data-count') ?? 1),
        0,
      ) === 2000
    );
  });
  const field = await page.getByLabel('Baseline risk', { exact: true }).first().elementHandle();
  if (field === null) throw new Error('the app has no baseline risk field');
  await browser.startTracing(page, { categories: MARK_CATEGORIES });
  const samples = await page.evaluate(
    async ({ input, repetitions }) => {
      const values = ['15%', '20%', '12%'];
      const svg = /** @type {SVGSVGElement} */ (document.querySelector('.results svg.people-chart'));
      const results = /** @type {HTMLElement} */ (document.querySelector('.results'));
      const frame = () => new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
      const type = (/** @type {string} */ value) => {
        const field = /** @type {HTMLInputElement} */ (input);
        field.value = value;
        field.dispatchEvent(new Event('input', { bubbles: true }));
      };
      // Learn what the chart says at each value, untimed.
      /** @type {Map<string, string>} */
      const labels = new Map();
      for (const value of values) {
        type(value);
        await frame();
        labels.set(value, svg.getAttribute('aria-label') ?? '');
      }
      if (new Set(labels.values()).size !== values.length) throw new Error('the baselines did not give different charts');
      const collected = [];
      for (let run = 0; run < repetitions; run += 1) {
        const value = values[run % values.length] ?? '15%';
        await frame();
        const expected = labels.get(value);
        /** @type {Promise<number>} */
        const updated = new Promise((resolve, reject) => {
          const observer = new MutationObserver(() => {
            if (svg.getAttribute('aria-label') !== expected) return;
            observer.disconnect();
            clearTimeout(timer);
            resolve(performance.now());
          });
          const timer = setTimeout(() => {
            observer.disconnect();
            reject(new Error(`the chart did not show the counts for a baseline of ${value}`));
          }, 10_000);
          observer.observe(results, { attributes: true, childList: true, subtree: true, characterData: true });
        });
        performance.mark('app-input:start');
        const start = performance.now();
        type(value);
        const seen = await updated;
        svg.getBoundingClientRect();
        void results.offsetHeight;
        const end = performance.now();
        performance.mark('app-input:end');
        performance.clearMarks('app-input:start');
        performance.clearMarks('app-input:end');
        collected.push({
          total: end - start,
          dom: seen - start,
          people: [...svg.querySelectorAll('[data-outcome]')].reduce(
            (sum, shape) => sum + Number(shape.getAttribute('data-count') ?? 1),
            0,
          ),
        });
      }
      return collected;
    },
    { input: field, repetitions: settings.repetitions },
  );
  const cpu = markedCpuSpans(await browser.stopTracing(), 'app-input');
  await context.close();
  if (errors.length > 0) throw new Error(`the app reported errors: ${errors.join('; ')}`);
  if (samples.some((sample) => sample.people !== 2000)) throw new Error('a timed update did not show 2000 people');
  return {
    total: summarise(samples.map((sample) => sample.total)),
    dom: summarise(samples.map((sample) => sample.dom)),
    cpu: summarise(cpu),
  };
}
