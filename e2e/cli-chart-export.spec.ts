/**
 * The chart the app saves as SVG in Chromium and the file `chancewise chart` writes for the
 * same topic, outcome and range setting are the same bytes: the app serialises with the
 * browser's XMLSerializer, the command line with its own text document.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from '@playwright/test';
import { expect, openApp, test } from './fixtures.ts';

const folder = mkdtempSync(join(tmpdir(), 'chancewise-e2e-cli-chart-'));

/** Save the chart of `outcomeId` from the app, as the app's button does. */
async function savedFromApp(page: Page, outcomeId: string): Promise<string> {
  const chart = page.locator(`article.outcome-result[data-outcome-id="${outcomeId}"]`);
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    chart.getByRole('button', { name: 'Save chart as SVG' }).click(),
  ]);
  return readFileSync(await download.path(), 'utf8');
}

/** The same chart from the command line, on the first demo topic (the one the app opens with). */
function writtenByCli(outcomeId: string, showRange: boolean): string {
  const out = join(folder, `${outcomeId}-${String(showRange)}.svg`);
  execFileSync(process.execPath, [
    'bin/chancewise.mjs',
    'chart',
    '--demo',
    '--outcome',
    outcomeId,
    '--out',
    out,
    ...(showRange ? ['--show-range'] : []),
  ]);
  return readFileSync(out, 'utf8');
}

test('the command line writes the app’s SVG export byte for byte, with and without the range outline', async ({ page }) => {
  await openApp(page);
  for (const outcomeId of ['stone', 'night']) expect(writtenByCli(outcomeId, false)).toBe(await savedFromApp(page, outcomeId));
  await page.getByLabel('Outline the people who depend on the range').check();
  for (const outcomeId of ['stone', 'night']) expect(writtenByCli(outcomeId, true)).toBe(await savedFromApp(page, outcomeId));
});
