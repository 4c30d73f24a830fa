import { execFileSync } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import type { Page } from '@playwright/test';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

async function saveTopic(page: Page, includePatient = false): Promise<{ name: string; text: string }> {
  await page.getByRole('navigation', { name: 'Topic' }).getByRole('button', { name: /^Save/ }).click();
  const dialog = page.getByRole('dialog', { name: 'Save the topic' });
  await expect(dialog).toBeVisible();
  if (includePatient) await dialog.getByLabel(/Include the patient/).check();
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    dialog.getByRole('button', { name: 'Save file' }).click(),
  ]);
  const path = await download.path();
  return { name: download.suggestedFilename(), text: await readFile(path, 'utf8') };
}

async function openFile(page: Page, name: string, text: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Open…' }).click()]);
  await chooser.setFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text, 'utf8') });
}

test.describe('files', () => {
  test('a saved topic reopens as the same topic', async ({ page }) => {
    await openApp(page);
    await page.getByLabel('Decision', { exact: true }).fill('Drinking more water, as discussed');
    await page.getByLabel('Baseline risk', { exact: true }).first().fill('1 in 5');
    const saved = await saveTopic(page);
    expect(saved.name).toBe('drinking-more-water-as-discussed.cwtopic');
    expect(JSON.parse(saved.text).topic.outcomes[0].baseline.risk).toBe('1 in 5');
    await expect(page.getByText('Unsaved changes')).toHaveCount(0);
    await expect(page.locator('.document .file')).toHaveText(saved.name);

    await page.getByRole('button', { name: 'Topics' }).click();
    await page.getByRole('button', { name: 'New topic', exact: true }).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('');
    await openFile(page, saved.name, saved.text);
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('Drinking more water, as discussed');
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('1 in 5');
    const again = await saveTopic(page);
    expect(again.text).toBe(saved.text);
    await page.getByRole('button', { name: 'Topics' }).click();
    await expect(page.getByRole('region', { name: 'Start' }).getByRole('button', { name: saved.name })).toBeVisible();
  });

  test('patient details are written only when the box is ticked', async ({ page }) => {
    await openApp(page);
    await page.getByText('Evidence, questions and patient').click();
    await page.getByLabel('Patient name').fill('Ann Example');
    await page.getByLabel('Patient reference').fill('A-12');
    const without = await saveTopic(page);
    expect(without.text).not.toContain('Ann Example');
    expect(JSON.parse(without.text).topic.patient).toBeNull();
    const included = await saveTopic(page, true);
    expect(JSON.parse(included.text).topic.patient).toEqual({ name: 'Ann Example', reference: 'A-12' });
  });

  test('a damaged file gives a clear message and the current topic is untouched', async ({ page }) => {
    await openApp(page);
    await page.getByLabel('Decision', { exact: true }).fill('Work in progress');
    const good = await saveTopic(page);
    await page.getByLabel('Baseline risk', { exact: true }).first().fill('12%');
    await openFile(page, 'damaged.chancewise.json', good.text.slice(0, good.text.length / 2));
    const alert = page.getByRole('alert');
    await expect(alert).toContainText('“damaged.chancewise.json” could not be opened.');
    await expect(alert).toContainText('not complete JSON');
    await expect(alert).toContainText('Your current topic is unchanged.');
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('Work in progress');
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('12%');
    await expect(page.getByText('Unsaved changes')).toBeVisible();
    await page.screenshot({ path: `${SCREENS}/08-damaged-file.png` });

    const wrongField = good.text.replace('"periodYears": 5', '"periodYears": "five"');
    await openFile(page, 'wrong.chancewise.json', wrongField);
    await expect(page.getByRole('alert')).toContainText('damaged at "topic.periodYears"');
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('12%');
  });

  test('charts are saved as SVG 180 mm wide and as PNG at 300 dpi', async ({ page }) => {
    await openApp(page);
    const chart = page.locator('article.outcome-result').first();
    const [svgDownload] = await Promise.all([
      page.waitForEvent('download'),
      chart.getByRole('button', { name: 'Save chart as SVG' }).click(),
    ]);
    const svg = await readFile(await svgDownload.path(), 'utf8');
    expect(svgDownload.suggestedFilename()).toMatch(/-stone\.svg$/);
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(svg).toMatch(/<svg[^>]* width="180mm"/);
    // The headline chart: 40 with no change, 24 with extra water and 18 with the citrate drink have a stone.
    const events = [...svg.matchAll(/data-outcome="event" data-count="(\d+)"/g)].map((found) => Number(found[1]));
    expect(events).toEqual([40, 24, 18]);

    const [pngDownload] = await Promise.all([
      page.waitForEvent('download'),
      chart.getByRole('button', { name: /Save as PNG/ }).click(),
    ]);
    const png = await readFile(await pngDownload.path());
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    // IHDR width: 180 mm at 300 dpi = 180 / 25.4 × 300 = 2125.98, so 2126 pixels.
    expect(png.readUInt32BE(16)).toBe(2126);
    const physical = png.indexOf('pHYs');
    expect(physical).toBeGreaterThan(0);
    // 300 dots per inch = 11811 pixels per metre (W3C PNG §11.3.5.3, unit 1 = metre).
    expect([png.readUInt32BE(physical + 4), png.readUInt32BE(physical + 8), png[physical + 12]]).toEqual([11811, 11811, 1]);
  });

  test('the handout is made on request, as one page with the numbers on screen', async ({ page }) => {
    await openApp(page);
    const handout = page.getByRole('region', { name: 'Handout for the patient' });
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      handout.getByRole('button', { name: 'Make the handout (PDF)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/-handout\.pdf$/);
    const path = await download.path();
    const bytes = await readFile(path);
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // Poppler's pdfinfo and pdftotext read the file independently of the code that wrote it.
    expect(execFileSync('pdfinfo', [path], { encoding: 'utf8' })).toMatch(/Pages:\s+1\b/);
    const text = execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8' });
    expect(text).toMatch(/[Ii]llustrative/);
    expect(text).toContain('15');
    await expect(page.getByRole('status').filter({ hasText: /The handout is saved as “.*-handout\.pdf”/ })).toBeVisible();
  });

  test('unsaved work is offered back after the page is reopened', async ({ page }) => {
    await openApp(page);
    await page.getByLabel('Decision', { exact: true }).fill('Not yet saved anywhere');
    await page.waitForTimeout(800);
    await page.reload();
    const offer = page.getByRole('region', { name: 'Unsaved work' });
    await expect(offer).toContainText('“Not yet saved anywhere” was not saved to a file.');
    await page.screenshot({ path: `${SCREENS}/09-restore-offer.png` });
    await offer.getByRole('button', { name: 'Restore it' }).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('Not yet saved anywhere');
    await expect(page.getByText('Unsaved changes')).toBeVisible();
    await page.reload();
    await expect(page.getByRole('region', { name: 'Unsaved work' })).toBeVisible();
    await page.getByRole('button', { name: 'Discard it' }).click();
    await page.reload();
    await expect(page.getByRole('region', { name: 'Unsaved work' })).toHaveCount(0);
  });

  test('leaving the page with unsaved changes asks first', async ({ page }) => {
    await openApp(page);
    await page.getByLabel('Decision', { exact: true }).fill('Changed');
    let asked = false;
    page.on('dialog', async (dialog) => {
      asked = dialog.type() === 'beforeunload';
      await dialog.dismiss();
    });
    await page.close({ runBeforeUnload: true });
    await expect.poll(() => asked).toBe(true);
  });
});
