import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { contentSecurityPolicy } from '../src/shared/content-security-policy.ts';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

/** Axe-core against WCAG 2.0, 2.1 and 2.2 A and AA; serious and critical findings fail the test. */
async function seriousViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa']).analyze();
  return results.violations
    .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
    .map(
      (violation) =>
        `${violation.id}: ${violation.help} (${violation.nodes
          .map((node) => node.target.join(' '))
          .slice(0, 3)
          .join('; ')})`,
    );
}

test.describe('accessibility and privacy', () => {
  test('the page is served with the strict policy, and the build carries it too', async ({ page }) => {
    const response = await page.goto('/');
    expect(response?.headers()['content-security-policy']).toBe(contentSecurityPolicy());
    expect(await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content')).toContain(
      "script-src 'self'",
    );
    // No inline script or style in the page as delivered.
    const html = (await response?.text()) ?? '';
    expect(html).not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);
    expect(html).not.toMatch(/<style|\sstyle="/);
  });

  test('has no serious or critical axe findings: on start, with problems, and with the start panel and save dialog open', async ({
    page,
  }) => {
    // Four full scans of a page with about 3000 chart elements: slow on a loaded machine.
    test.setTimeout(240_000);
    await openApp(page);
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByLabel('Baseline risk', { exact: true }).first().fill('150%');
    await page.getByLabel('Estimate').nth(1).fill('');
    await expect(page.getByText('These results are from before your latest change.')).toBeVisible();
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('button', { name: 'Topics' }).click();
    expect(await seriousViolations(page)).toEqual([]);
    await page.getByRole('navigation', { name: 'Topic' }).getByRole('button', { name: /^Save/ }).click();
    await page.keyboard.press('Escape');
    await page.getByLabel('Baseline risk', { exact: true }).first().fill('4 in 10');
    await page.getByLabel('Estimate').nth(1).fill('0.45');
    await page.getByRole('navigation', { name: 'Topic' }).getByRole('button', { name: /^Save/ }).click();
    await expect(page.getByRole('dialog', { name: 'Save the topic' })).toBeVisible();
    expect(await seriousViolations(page)).toEqual([]);
  });

  test('works by keyboard alone: reach a field, type, add an outcome, save', async ({ page }) => {
    await openApp(page);
    await page.keyboard.press('Tab');
    await expect(page.getByRole('link', { name: 'Skip to the topic' })).toBeFocused();
    await page.keyboard.press('Tab');
    await expect(page.getByRole('link', { name: 'Skip to the results' })).toBeFocused();
    await page.keyboard.press('Enter');
    await expect(page.getByRole('heading', { name: 'Results', exact: true })).toBeFocused();
    await page.getByRole('button', { name: 'Topics' }).focus();
    // Through the header (Open, Save, a copy in Spanish), the banner's link, and the links of what the handout still
    // lacks (the example gives none of its four disclosures), to the first field of the editor.
    const order: string[] = [];
    for (let step = 0; step < 9; step += 1) {
      await page.keyboard.press('Tab');
      order.push(await page.evaluate(() => document.activeElement?.textContent?.trim() || document.activeElement?.id || ''));
    }
    expect(order.slice(0, 8)).toEqual([
      'Open…',
      'Save Ctrl+S',
      'A copy in Spanish',
      'Start a new topic or open a file',
      'Who prepared this topic',
      'Who funded it',
      'Interests (conflicts of interest) of those who prepared it',
      'The date to review it by',
    ]);
    await expect(page.getByLabel('Decision', { exact: true })).toBeFocused();
    await page.keyboard.press('Control+a');
    await page.keyboard.type('Typed by keyboard');
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('Typed by keyboard');
    await page.getByRole('button', { name: 'Add a benefit' }).focus();
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Outcome', { exact: true }).last()).toBeFocused();
    await page.keyboard.type('a fall');
    await page.keyboard.press('Control+s');
    const dialog = page.getByRole('dialog', { name: 'Save the topic' });
    await expect(dialog).toBeHidden();
    // The new outcome has no numbers yet, so nothing can be written; the message says why.
    await expect(page.getByRole('alert')).toContainText('cannot be read yet');
  });

  test('every focused control shows a visible focus ring', async ({ page }) => {
    await openApp(page);
    for (let step = 0; step < 12; step += 1) {
      await page.keyboard.press('Tab');
      const outline = await page.evaluate(() => {
        const active = document.activeElement;
        if (active === null || active === document.body) return 'none';
        const style = getComputedStyle(active);
        return `${style.outlineStyle} ${style.outlineWidth}`;
      });
      expect(outline).toMatch(/^solid [3-9]px$/);
    }
  });

  test('has no serious axe finding at 200% zoom of a 1440 × 900 window, with nothing scrolling sideways', async ({ browser }) => {
    // 200% zoom of 1440 × 900: 720 × 450 CSS pixels at twice the pixel density (WCAG 2.2, 1.4.4 and 1.4.10).
    const context = await browser.newContext({ viewport: { width: 720, height: 450 }, deviceScaleFactor: 2 });
    const page = await context.newPage();
    await page.goto('/');
    await expect(page.locator('svg.people-chart').first()).toBeVisible();
    await expect(page.locator('.app[data-startup="drawn"]')).toBeVisible();
    expect(await seriousViolations(page)).toEqual([]);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: `${SCREENS}/12-zoom-200-1440x900.png` });
    await context.close();
  });

  test('reads at 200% zoom: the layout stacks and nothing scrolls sideways', async ({ browser }) => {
    // 200% zoom of a 1280 × 800 window: 640 × 400 CSS pixels at twice the pixel density.
    const context = await browser.newContext({ viewport: { width: 640, height: 400 }, deviceScaleFactor: 2 });
    const page = await context.newPage();
    await page.goto('/');
    await expect(page.locator('svg.people-chart').first()).toBeVisible();
    expect(await seriousViolations(page)).toEqual([]);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    const editor = await page.getByRole('region', { name: 'Topic', exact: true }).boundingBox();
    const results = await page.getByRole('region', { name: 'Results' }).boundingBox();
    expect(editor && results && results.y >= editor.y + editor.height - 1).toBe(true);
    await page.screenshot({ path: `${SCREENS}/10-zoom-200.png` });
    await page.getByRole('region', { name: 'Results' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENS}/11-zoom-200-results.png` });
    await context.close();
  });
});
