/**
 * The people charts in Chromium, on their own check page (e2e/chart-page, built here with
 * its own Vite config and served with the app's security headers): every person drawn
 * once in the right group, nothing blocked by the policy, and screenshots in colour,
 * greyscale, the black-and-white theme and with the range outlined, for a person to look at.
 */
import { once } from 'node:events';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import { type Page, expect, test } from '@playwright/test';
import { build } from 'vite';
import { securityHeaders } from '../src/shared/content-security-policy.ts';
import { createStaticServer } from '../src/web/static-server.ts';

const pageFolder = fileURLToPath(new URL('./chart-page/', import.meta.url));
let server: Server;
let origin = '';

test.beforeAll(async () => {
  await build({ configFile: `${pageFolder}vite.config.ts`, logLevel: 'warn' });
  server = createStaticServer({ root: `${pageFolder}dist`, headers: securityHeaders() });
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

test.afterAll(async () => {
  server.closeAllConnections();
  server.close();
  await once(server, 'close');
});

declare global {
  interface Window {
    chartPageViolations?: string[];
  }
}

/** Open the check page with `query`; fails on page errors, policy violations or requests elsewhere. */
async function openChartPage(page: Page, query = ''): Promise<() => Promise<void>> {
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${String(error)}`));
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console error: ${message.text()}`);
  });
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (url.protocol !== 'data:' && url.origin !== origin) problems.push(`request outside the page's origin: ${request.url()}`);
  });
  // Added by the automation channel before the page's scripts, so the policy does not apply to it.
  await page.addInitScript(() => {
    window.chartPageViolations = [];
    document.addEventListener('securitypolicyviolation', (event) => {
      window.chartPageViolations?.push(`${event.effectiveDirective} blocked ${event.blockedURI || '(inline)'}`);
    });
  });
  const response = await page.goto(`${origin}/${query}`);
  expect(response?.headers()['content-security-policy']).toContain("script-src 'self'");
  await expect(page.locator('body[data-ready="true"]')).toHaveCount(1);
  return async () => {
    expect(await page.evaluate(() => window.chartPageViolations ?? [])).toEqual([]);
    expect(problems).toEqual([]);
  };
}

/** People of each `data-outcome` in every array of the chart of `outcomeId`: the shapes' `data-count`s added up. */
function drawnCounts(page: Page, outcomeId: string) {
  return page.evaluate((id) => {
    const svg = [...document.querySelectorAll('#charts svg.people-chart')].find(
      (chart) => chart.getAttribute('data-id-prefix') === `chart-${id}`,
    );
    if (svg === undefined) return null;
    return Object.fromEntries(
      [...svg.querySelectorAll('g.chart-array')].map((array) => {
        const counts: Record<string, number> = {};
        for (const shape of array.querySelectorAll('[data-outcome]')) {
          const group = shape.getAttribute('data-outcome') ?? '';
          counts[group] = (counts[group] ?? 0) + Number(shape.getAttribute('data-count') ?? 1);
        }
        return [array.getAttribute('data-option-id') ?? '', counts];
      }),
    );
  }, outcomeId);
}

test.describe('people charts in the browser', () => {
  test('draw every one of 1000 people per array in the group the numbers give', async ({ page }) => {
    const finish = await openChartPage(page);
    // People per 1000 = risk × 1000, rounded to whole people, halves up (common practice);
    // the risk with the option is the baseline × RR (Cochrane Handbook 5.1, §12.5.4).
    // Another kidney stone: 40% → 400; 40% × 0.6 = 24% → 240, so 160 avoid it.
    expect(await drawnCounts(page, 'stone')).toEqual({
      'as-now': { event: 400, free: 600 },
      water: { event: 240, prevented: 160, free: 600 },
    });
    // Broken sleep: 15% → 150; 15% × 1.6 = 24% → 240, so 90 more have it.
    expect(await drawnCounts(page, 'night')).toEqual({
      'as-now': { event: 150, free: 850 },
      water: { event: 150, caused: 90, free: 760 },
    });
    // An upset stomach: 5% → 50; a risk ratio of 1 with extra water leaves it at 50.
    expect(await drawnCounts(page, 'stomach')).toEqual({
      'as-now': { event: 50, free: 950 },
      water: { event: 50, free: 950 },
    });
    // One shape per group that has people, their counts adding up to 1000, and nothing else carries data-outcome.
    const shape = await page.evaluate(() => ({
      groups: [...document.querySelectorAll('#charts g.people')].map((group) => ({
        children: group.children.length,
        shapes: group.querySelectorAll(':scope > path[data-outcome][data-count]').length,
        people: [...group.children].reduce((sum, child) => sum + Number(child.getAttribute('data-count')), 0),
      })),
      outside: document.querySelectorAll('#charts [data-outcome]:not(g.people > path)').length,
      uses: document.querySelectorAll('#charts use').length,
    }));
    expect(shape.groups.map((group) => group.people)).toEqual(Array.from({ length: 6 }, () => 1000));
    // as-now and water of each chart: 2 and 3 groups (stone), 2 and 3 (night), 2 and 2 (stomach).
    expect(shape.groups.map((group) => [group.children, group.shapes])).toEqual(
      [2, 3, 2, 3, 2, 2].map((count) => [count, count]),
    );
    expect(shape.outside).toBe(0);
    expect(shape.uses).toBe(0);
    await page.screenshot({ path: 'test-results/charts-colour.png', fullPage: true });
    const first = page.locator('#charts svg.people-chart').first();
    await first.screenshot({ path: 'test-results/charts-headline.png' });
    await finish();
  });

  test('paint people in the colours of their groups, with the patterns the greyscale view needs', async ({ page }) => {
    const finish = await openChartPage(page, '?greyscale=on');
    const paints = await page.evaluate(() => {
      const svg = document.querySelector('#charts svg.people-chart');
      const paint = (selector: string) => {
        const element = svg?.querySelector(selector);
        return element === null || element === undefined ? null : getComputedStyle(element).fill;
      };
      return {
        event: paint('[data-outcome="event"]'),
        free: paint('[data-outcome="free"]'),
        prevented: paint('[data-outcome="prevented"]'),
        filter: getComputedStyle(document.getElementById('charts') as HTMLElement).filter,
      };
    });
    // Okabe & Ito (2008) blue for events, light grey for people without the outcome.
    expect(paints.event).toBe('rgb(0, 114, 178)');
    expect(paints.free).toBe('rgb(232, 232, 232)');
    expect(paints.prevented).toMatch(/^url\(".*#chart-stone-dots"\)$/);
    expect(paints.filter).toBe('grayscale(1)');
    await page.screenshot({ path: 'test-results/charts-greyscale.png', fullPage: true });
    await finish();
  });

  test('show each figure crisply when enlarged: heads, bodies, dots and hatching, in every view', async ({ browser }) => {
    const context = await browser.newContext({ deviceScaleFactor: 4, viewport: { width: 1000, height: 700 } });
    for (const [query, view] of [
      ['', 'colour'],
      ['?greyscale=on', 'greyscale'],
      ['?palette=black-and-white&range=on', 'black-and-white-range'],
    ] as const) {
      const page = await context.newPage();
      const finish = await openChartPage(page, query);
      // The first two blocks of the option's array in the benefit chart and a harm chart, where groups meet.
      for (const [outcome, kind] of [
        ['stone', 'benefit'],
        ['night', 'harm'],
      ] as const) {
        const people = page.locator(
          `#charts svg[data-id-prefix="chart-${outcome}"] g.chart-array[data-option-id="water"] g.people`,
        );
        const box = await people.boundingBox();
        expect(box).not.toBeNull();
        if (box === null) continue;
        await page.screenshot({
          path: `test-results/charts-detail-${kind}-${view}.png`,
          fullPage: true,
          clip: { x: box.x - 4, y: box.y + box.height / 2 - 4, width: box.width * 0.42 + 8, height: box.height / 2 + 8 },
        });
      }
      await finish();
      await page.close();
    }
    await context.close();
  });

  test('draw the black-and-white theme and the range outline without policy errors', async ({ page }) => {
    const finish = await openChartPage(page, '?palette=black-and-white&range=on');
    const svg = page.locator('#charts svg.people-chart').first();
    await expect(svg).toHaveAttribute('data-palette', 'black-and-white');
    // RR 0.45 to 0.8 at 40%: 180 to 320 around 240 with extra water, ranks 180–319 outlined (140 people).
    const outline = svg.locator('g.chart-array[data-option-id="water"] path.range-outline');
    await expect(outline).toHaveAttribute('data-look', 'outline');
    await expect(outline).toHaveAttribute('data-count', '140');
    expect((await outline.getAttribute('d'))?.match(/M/g)).toHaveLength(140);
    expect(await outline.getAttribute('data-outcome')).toBeNull();
    await expect(svg.locator('g.chart-array[data-option-id="as-now"] [stroke-dasharray]')).toHaveCount(0);
    await page.screenshot({ path: 'test-results/charts-black-and-white-range.png', fullPage: true });
    await svg.screenshot({ path: 'test-results/charts-black-and-white-headline.png' });
    await finish();
  });
});
