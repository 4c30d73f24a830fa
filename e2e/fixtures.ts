/**
 * A page that records what must never happen: a request to anywhere but the app's own
 * origin, a Content-Security-Policy violation, or an uncaught error. Every test checks
 * all three at its end.
 */
import { test as base, expect } from '@playwright/test';
import type { Locator, Page } from '@playwright/test';

export interface Watch {
  readonly outsideRequests: string[];
  readonly pageErrors: string[];
  /** Violations reported to the page (read at the end of the test). */
  violations(): Promise<string[]>;
}

declare global {
  interface Window {
    chancewiseViolations?: string[];
  }
}

export const test = base.extend<{ watch: Watch }>({
  watch: async ({ page, baseURL }, use) => {
    const origin = new URL(baseURL ?? 'http://127.0.0.1').origin;
    const outsideRequests: string[] = [];
    const pageErrors: string[] = [];
    page.on('request', (request) => {
      const url = new URL(request.url());
      if (url.protocol === 'data:' || url.protocol === 'blob:') return;
      if (url.origin !== origin) outsideRequests.push(request.url());
    });
    page.on('pageerror', (error) => pageErrors.push(String(error)));
    page.on('console', (message) => {
      if (message.type() === 'error') pageErrors.push(message.text());
    });
    // Injected by the browser's automation channel before any page script, so the policy does not apply to it.
    await page.addInitScript(() => {
      window.chancewiseViolations = [];
      document.addEventListener('securitypolicyviolation', (event) => {
        window.chancewiseViolations?.push(`${event.effectiveDirective} blocked ${event.blockedURI || '(inline)'}`);
      });
    });
    const watch: Watch = {
      outsideRequests,
      pageErrors,
      violations: async () => (page.isClosed() ? [] : await page.evaluate(() => window.chancewiseViolations ?? [])),
    };
    await use(watch);
    expect(outsideRequests, 'requests outside the app’s origin').toEqual([]);
    expect(await watch.violations(), 'Content-Security-Policy violations').toEqual([]);
    expect(pageErrors, 'errors in the page').toEqual([]);
  },
});

export { expect };

/**
 * Open the app fresh (no autosave from an earlier test) and wait until the whole page is
 * drawn: the first screen comes first, the parts below it in turns after the first paint.
 */
export async function openApp(page: Page): Promise<void> {
  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.locator('svg.people-chart').first()).toBeVisible();
  await expect(page.locator('.app')).toHaveAttribute('data-startup', 'drawn');
}

/** How many people the shapes `locator` finds draw: their `data-count`s added up (one for a shape without). */
export function countedPeople(locator: Locator): Promise<number> {
  return locator.evaluateAll((shapes) => shapes.reduce((sum, shape) => sum + Number(shape.getAttribute('data-count') ?? 1), 0));
}

/** The shape of the people of one option's array in one outcome's chart, by group (count them with {@link countedPeople}). */
export function people(page: Page, outcomeId: string, optionId: string, group: string) {
  return page.locator(
    `article[data-outcome-id="${outcomeId}"] g.chart-array[data-option-id="${optionId}"] path[data-outcome="${group}"]`,
  );
}

/** Where screenshots go. */
export const SCREENS = 'test-results/screens';
