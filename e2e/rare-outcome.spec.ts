import type { Page } from '@playwright/test';
import { writeTopicFile } from '../src/core/topic/topic-file.ts';
import { RARE, effectTopic } from '../test/ui/results/effect-topic.ts';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

/**
 * An invented, illustrative rare outcome: a serious bleed in 0.1% a year, hazard ratio 0.8
 * (0.7 to 0.9). Under proportional hazards the risk with the tablet is 1 − (1 − p)^HR
 * (Altman & Andersen 1999, BMJ 319:1492): 8.0008 (7.0011 to 9.0005) in 10,000, against 10
 * without; out of 1000 the difference would round to no one.
 */

async function openFile(page: Page, name: string, text: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Open…' }).click()]);
  await chooser.setFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text, 'utf8') });
  await expect(page.getByLabel('Decision', { exact: true })).toHaveValue(RARE.title);
  // The note that the file opened would cover part of the screenshots.
  await page.getByRole('button', { name: 'Dismiss' }).click();
}

const lower = (page: Page) => page.getByLabel('Lower limit of the 95% interval', { exact: true });
const upper = (page: Page) => page.getByLabel('Upper limit of the 95% interval', { exact: true });

/** The text of every element a field's aria-describedby names. */
async function description(page: Page, box: ReturnType<Page['getByLabel']>): Promise<string> {
  const ids = ((await box.getAttribute('aria-describedby')) ?? '').split(' ').filter((id) => id !== '');
  const texts = await Promise.all(ids.map((id) => page.locator(`[id="${id}"]`).textContent()));
  return texts.join(' ');
}

test.describe('a rare outcome', () => {
  test('opens with its table and words per 10,000 and its pictures of 1000', async ({ page, watch }) => {
    await openApp(page);
    await openFile(page, 'rare-bleed.cwtopic', writeTopicFile(RARE, { includePatient: false }));
    const table = page.locator('table[data-outcome-id="bleed"]');
    await expect(table).toBeVisible();
    await expect(page.locator('.basis')).toContainText(
      'The pictures show 1000 people like this, over 1 year; the tables and words count per 10,000',
    );
    await expect(table.getByRole('columnheader', { name: /out of 10,000/ })).toBeVisible();
    const row = table.locator('tr[data-option-id="tablet"]');
    await expect(row.locator('td .value')).toHaveText(['8', '2 fewer', '0.08%', 'NNTB 5003']);
    await expect(row.locator('th')).toContainText('ranges: 95% interval');
    await expect(page.locator('article[data-outcome-id="bleed"] .words')).toContainText(
      'about 2 of those 10,000 people avoid a serious bleed',
    );
    await expect(page.locator('article[data-outcome-id="bleed"]')).not.toContainText(/no difference|no change/);
    await expect(page.locator('.footnote')).toContainText('Ranges are 95% intervals for the effect');
    await page.screenshot({ path: `${SCREENS}/rare-01-results.png`, fullPage: true });
    await page.locator('article[data-outcome-id="bleed"]').screenshot({ path: `${SCREENS}/rare-02-outcome.png` });
    expect(watch.pageErrors).toEqual([]);
  });

  test('a reversed interval typed in the editor marks both boxes with one message, and fixing it clears both', async ({
    page,
    watch,
  }) => {
    await openApp(page);
    await openFile(page, 'rare-bleed.cwtopic', writeTopicFile(RARE, { includePatient: false }));
    await lower(page).fill('0.9');
    await upper(page).fill('0.7');
    for (const box of [lower(page), upper(page)]) {
      await expect(box).toHaveAttribute('aria-invalid', 'true');
      expect(await description(page, box)).toContain(
        'The limits are the wrong way round: the lower limit, 0.9, is above the upper limit, 0.7.',
      );
      // The red border of a marked box (the app's --problem colour), not only the attribute.
      expect(await box.evaluate((element) => getComputedStyle(element).borderTopWidth)).toBe('2px');
    }
    await expect(page.locator('.stale-banner')).toBeVisible();
    await page
      .locator('fieldset.effect')
      .first()
      .screenshot({ path: `${SCREENS}/rare-03-reversed-typed.png` });
    await lower(page).fill('0.7');
    await upper(page).fill('0.9');
    await expect(lower(page)).toHaveAttribute('aria-invalid', 'false');
    await expect(upper(page)).toHaveAttribute('aria-invalid', 'false');
    await expect(page.locator('.stale-banner')).toHaveCount(0);
    expect(watch.pageErrors).toEqual([]);
  });

  test('a saved file with reversed limits opens with both boxes marked and no results', async ({ page, watch }) => {
    await openApp(page);
    const reversed = effectTopic({ baseline: 0.001, effect: { measure: 'hr', estimate: 0.8, lower: 0.9, upper: 0.7 } });
    await openFile(page, 'reversed.cwtopic', writeTopicFile(reversed, { includePatient: false }));
    await expect(lower(page)).toHaveValue('0.9');
    await expect(upper(page)).toHaveValue('0.7');
    await expect(lower(page)).toHaveAttribute('aria-invalid', 'true');
    await expect(upper(page)).toHaveAttribute('aria-invalid', 'true');
    await expect(page.getByRole('status').filter({ hasText: 'No results yet' })).toBeVisible();
    await expect(page.locator('table[data-outcome-id="bleed"]')).toHaveCount(0);
    await page.screenshot({ path: `${SCREENS}/rare-04-reversed-file.png` });
    expect(watch.pageErrors).toEqual([]);
  });
});
