import { readFileSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

/**
 * The editor does what the clinician typed and nothing behind their back: periods follow
 * the topic only while nothing depends on them, undo stays within the document on screen,
 * messages never hide the field being typed in, focus always lands somewhere sensible, and
 * exported files are named for what they hold.
 */

async function newTopic(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Topics' }).click();
  await page.getByRole('button', { name: 'New topic', exact: true }).click();
  await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('');
}

/** Fill in the rest of a new topic: its words, the option, the outcome and an effect (RR 0.8). */
async function fillBlankTopic(page: Page): Promise<void> {
  await page.getByLabel('Decision', { exact: true }).fill('Taking a made-up tablet (illustrative)');
  await page.getByLabel('Who the numbers are for', { exact: true }).fill('adults with a made-up condition');
  await page.getByLabel('Option 2 name').fill('the tablet');
  await page.getByLabel('Outcome', { exact: true }).fill('a made-up event');
  await page.locator('fieldset.effect').first().getByLabel('Estimate').fill('0.8');
}

async function openFile(page: Page, name: string, text: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByRole('button', { name: 'Open…' }).click()]);
  await chooser.setFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text, 'utf8') });
}

const screeningText = readFileSync('assets/demo/02-bowel-screening.json', 'utf8');

test.describe('periods that follow the topic', () => {
  test('a baseline with no risk typed follows the topic’s period; a typed one keeps its period, and its conversion shows beside it and in the results', async ({
    page,
  }) => {
    await openApp(page);
    await newTopic(page);
    const outcome = page.locator('article.outcome').first();
    const baselinePeriod = outcome.getByLabel('Over', { exact: true });
    const baselineUnit = outcome.getByLabel('Over: unit');
    const followUp = outcome.locator('fieldset.effect').first().getByLabel('Follow-up', { exact: true });
    await expect(baselinePeriod).toHaveValue('10');
    await expect(followUp).toHaveValue('');

    // No risk typed yet: the baseline follows the topic's period and unit; the trial's follow-up does not.
    await page.getByLabel('Over what period', { exact: true }).fill('6');
    await page.getByLabel('Over what period: unit').selectOption('months');
    await expect(baselinePeriod).toHaveValue('6');
    await expect(baselineUnit).toHaveValue('months');
    await expect(followUp).toHaveValue('');

    // A typed risk keeps the period it was typed over.
    await page.getByLabel('Over what period', { exact: true }).fill('10');
    await page.getByLabel('Over what period: unit').selectOption('years');
    await expect(baselinePeriod).toHaveValue('10');
    await outcome.getByLabel('Baseline risk', { exact: true }).fill('25%');
    await fillBlankTopic(page);
    await expect(page.getByRole('status').filter({ hasText: 'Up to date' })).toBeVisible();
    await page.getByLabel('Over what period', { exact: true }).fill('1');
    await expect(baselinePeriod).toHaveValue('10');
    await expect(baselineUnit).toHaveValue('years');

    // The conversion is said at once, beside the field and with the outcome's results:
    // 1 − 0.75^(1/10) = 2.84% under a constant hazard (Fleurence and Hollenbeak 2007).
    const sentence = 'The baseline risk of 25% over 10 years was converted to 2.84% over 1 year, assuming a constant hazard.';
    await expect(outcome.locator('.conversion-note')).toHaveText(sentence);
    await expect(baselinePeriod).toHaveAccessibleDescription(new RegExp(sentence.replace(/[.%]/g, '\\$&')));
    await expect(page.locator('article.outcome-result .conversion-note').first()).toHaveText(sentence);
    await page.screenshot({ path: `${SCREENS}/editor-conversion.png` });
  });
});

test.describe('undo within a document', () => {
  test('after opening a file, undo takes back edits to it and never brings the earlier topic back', async ({ page }) => {
    await openApp(page);
    const decision = page.getByLabel('Decision', { exact: true });
    await decision.fill('My unsaved work');
    await openFile(page, 'screening.cwtopic', screeningText);
    await expect(decision).toHaveValue(/bowel test/);
    const undo = page.getByRole('button', { name: 'Undo', exact: true });
    await expect(undo).toBeDisabled();
    // The replaced unsaved work is offered back, not hidden in the history.
    await expect(page.getByRole('region', { name: 'Unsaved work' })).toContainText('My unsaved work');

    await decision.fill('Edited screening');
    await expect(page).toHaveTitle('• Edited screening — Chancewise');
    await undo.click();
    await expect(decision).toHaveValue(/bowel test/);
    await expect(undo).toBeDisabled();
    await page.keyboard.press('Control+z');
    await expect(decision).toHaveValue(/bowel test/);
    // The header, the title and Save describe the file on screen.
    await expect(page.locator('.document .file')).toHaveText('screening.cwtopic');
    await expect(page.getByText('Unsaved changes')).toHaveCount(0);
    await expect(page).toHaveTitle(/^[^•].*bowel test.* — Chancewise$/);

    await page.getByRole('region', { name: 'Unsaved work' }).getByRole('button', { name: 'Restore it' }).click();
    await expect(decision).toHaveValue('My unsaved work');
    await expect(undo).toBeDisabled();
    await expect(page.locator('.document .file')).toHaveText('Example (not saved)');
  });
});

test.describe('messages that do not cover work', () => {
  test('a message moves out from under a focused field, names the saved file, and fades after a few seconds', async ({
    page,
  }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await openApp(page);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Save chart as SVG' }).first().click(),
    ]);
    const toast = page.locator('.toast-region .toast');
    await expect(toast).toHaveText(new RegExp(`The chart is saved as “${download.suggestedFilename().replace(/[.]/g, '\\.')}”`));

    // A field at the foot of the window, where the message sits, gets focus.
    const field = page.getByLabel('Source of the baseline risk').first();
    await field.evaluate((element) => {
      element.scrollIntoView({ block: 'end' });
      window.scrollBy(0, 40);
      (element as HTMLElement).focus({ preventScroll: true });
    });
    await expect(page.locator('.toast-region')).toHaveAttribute('data-place', 'top');
    const fieldBox = await field.boundingBox();
    const toastBox = await toast.boundingBox();
    if (fieldBox === null || toastBox === null) throw new Error('the field or the message is not on screen');
    const apart = fieldBox.y >= toastBox.y + toastBox.height || toastBox.y >= fieldBox.y + fieldBox.height;
    expect(apart, `message ${JSON.stringify(toastBox)} against field ${JSON.stringify(fieldBox)}`).toBe(true);
    // Nor does it cover the header.
    const header = await page.locator('header.bar').boundingBox();
    expect(toastBox.y).toBeGreaterThanOrEqual((header?.y ?? 0) + (header?.height ?? 0));
    await page.screenshot({ path: `${SCREENS}/editor-message-top.png` });

    // Information fades after a few seconds (six).
    await expect(toast).toHaveCount(0, { timeout: 9000 });
  });
});

test.describe('keyboard and focus', () => {
  test('focus lands back on Save after Escape in the save dialog, on the decision after New topic, and on the Topics button when the panel closes', async ({
    page,
  }) => {
    await openApp(page);
    // The save dialog: Escape, and focus is back on Save.
    const save = page.getByRole('button', { name: /^Save/ }).first();
    await save.click();
    const dialog = page.getByRole('dialog', { name: 'Save the topic' });
    await expect(dialog).toBeVisible();
    await page.keyboard.press('Escape');
    await expect(dialog).toHaveCount(0);
    await expect(save).toBeFocused();
    // Ctrl+S from a field: focus returns to that field.
    const decision = page.getByLabel('Decision', { exact: true });
    await decision.focus();
    await page.keyboard.press('Control+s');
    await expect(dialog).toBeVisible();
    await page.keyboard.press('Escape');
    await expect(decision).toBeFocused();

    const topics = page.getByRole('button', { name: 'Topics' });
    await topics.click();
    await page.getByRole('button', { name: 'New topic', exact: true }).click();
    await expect(page.getByLabel('Decision', { exact: true })).toBeFocused();

    // Escape closes the Topics panel, wherever focus is in it, and gives focus back to its button.
    await topics.click();
    const panel = page.getByRole('region', { name: 'Start' });
    await panel.getByRole('button', { name: 'Open a topic file…' }).focus();
    await page.keyboard.press('Escape');
    await expect(panel).toHaveCount(0);
    await expect(topics).toBeFocused();
    await expect(topics).toHaveAttribute('aria-expanded', 'false');
    await topics.click();
    await panel.getByRole('button', { name: 'Close' }).click();
    await expect(topics).toBeFocused();
  });

  test('an example opened from the Topics panel puts focus on the topic’s heading', async ({ page }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Topics' }).click();
    await page.getByRole('region', { name: 'Start' }).locator('button.demo').nth(1).click();
    await expect(page.getByRole('heading', { name: 'Topic', exact: true })).toBeFocused();
  });

  test('what the keyboard moves to is never hidden under the sticky header (WCAG 2.2, 2.4.11)', async ({ page }) => {
    for (const width of [1440, 800]) {
      await page.setViewportSize({ width, height: 900 });
      await openApp(page);
      const header = page.locator('header.bar');
      for (const [link, heading] of [
        ['Skip to the topic', 'Topic'],
        ['Skip to the results', 'Results'],
      ] as const) {
        await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
        await page.getByRole('link', { name: link }).focus();
        await page.keyboard.press('Enter');
        const target = page.getByRole('heading', { name: heading, exact: true });
        await expect(target).toBeFocused();
        const headerBox = await header.boundingBox();
        const targetBox = await target.boundingBox();
        if (headerBox === null || targetBox === null) throw new Error('the header or the heading is not on screen');
        expect(targetBox.y, `${heading} at ${width} px`).toBeGreaterThanOrEqual(headerBox.y + headerBox.height);
      }
    }
  });
});

test.describe('exports named for what they are', () => {
  async function downloadName(page: Page, click: () => Promise<void>): Promise<string> {
    const [download] = await Promise.all([page.waitForEvent('download'), click()]);
    return download.suggestedFilename();
  }

  test('charts are <topic>-<outcome>.svg/.png and the handout <topic>-handout.pdf, and each says so', async ({ page }) => {
    await openApp(page);
    const chart = page.locator('article.outcome-result[data-outcome-id="stone"]');
    expect(await downloadName(page, () => chart.getByRole('button', { name: 'Save chart as SVG' }).click())).toBe(
      'ways-to-cut-the-chance-of-a-second-another-kidney-stone.svg',
    );
    await expect(page.locator('.toast')).toContainText('“ways-to-cut-the-chance-of-a-second-another-kidney-stone.svg”');
    expect(await downloadName(page, () => chart.getByRole('button', { name: 'Save as PNG (300 dpi)' }).click())).toBe(
      'ways-to-cut-the-chance-of-a-second-another-kidney-stone.png',
    );
    const handout = page.getByRole('region', { name: 'Handout for the patient' });
    expect(await downloadName(page, () => handout.getByRole('button', { name: 'Make the handout (PDF)' }).click())).toBe(
      'ways-to-cut-the-chance-of-a-second-handout.pdf',
    );
    await expect(page.locator('.toast')).toContainText('“ways-to-cut-the-chance-of-a-second-handout.pdf”');

    // An opened file names its exports after itself, without its ending.
    await openFile(page, 'Bowel Screening.cwtopic', screeningText);
    const screening = page.locator('article.outcome-result').first();
    await expect(screening).toBeVisible();
    expect(await downloadName(page, () => screening.getByRole('button', { name: 'Save chart as SVG' }).click())).toBe(
      'bowel-screening-dying-of-bowel-cancer.svg',
    );
  });

  test('the handout’s choices and the outline are kept in the saved topic file', async ({ page }) => {
    await openApp(page);
    const handout = page.getByRole('region', { name: 'Handout for the patient' });
    await handout.getByLabel('Paper').selectOption('letter');
    await handout.getByLabel('Include the number needed to treat').check();
    await page.getByLabel('Outline the people who depend on the range').check();
    await page.getByRole('radio', { name: '1000 people' }).check();
    await page.getByRole('navigation', { name: 'Topic' }).getByRole('button', { name: /^Save/ }).click();
    const dialog = page.getByRole('dialog', { name: 'Save the topic' });
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      dialog.getByRole('button', { name: 'Save file' }).click(),
    ]);
    const saved = JSON.parse(readFileSync(await download.path(), 'utf8')) as { version: number; topic: { handout: unknown } };
    expect(saved.version).toBe(6);
    expect(saved.topic.handout).toEqual({ showNnt: true, per: 1000, outline: true, paper: 'letter' });
  });
});

test.describe('narrow windows', () => {
  test('at 800 × 900 the headline results stay in view while typing a baseline, and the header stays reachable', async ({
    page,
  }) => {
    await page.setViewportSize({ width: 800, height: 900 });
    await openApp(page);
    const summary = page.getByRole('group', { name: 'Headline results' });
    await expect(summary).toBeVisible();
    const baseline = page.getByLabel('Baseline risk', { exact: true }).first();
    await baseline.scrollIntoViewIfNeeded();
    await baseline.fill('20%');
    await expect(baseline).toBeFocused();
    // 20% without an option; × RR 0.6 = 12% and × RR 0.45 = 9% with the two options (plain arithmetic).
    await expect(summary.locator('[data-option-id="as-now"] strong')).toHaveText('20');
    await expect(summary.locator('[data-option-id="water"] strong')).toHaveText('12');
    await expect(summary.locator('[data-option-id="citrate"] strong')).toHaveText('9');
    const box = await summary.boundingBox();
    const field = await baseline.boundingBox();
    if (box === null || field === null) throw new Error('the summary or the field is not on screen');
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + box.height).toBeLessThanOrEqual(900);
    // The field being typed in is not under the pinned header.
    expect(field.y).toBeGreaterThanOrEqual(box.y + box.height);
    // The header (Save, Undo) is still on screen after scrolling down.
    await expect(page.getByRole('button', { name: 'Undo', exact: true })).toBeInViewport();
    await page.screenshot({ path: `${SCREENS}/editor-800-typing.png` });

    // An out-of-date entry says so in the summary too.
    await baseline.fill('20%%');
    await expect(summary).toContainText('Out of date');
    await summary.getByRole('link', { name: 'All results' }).click();
    await expect(page.getByRole('heading', { name: 'Results', exact: true })).toBeFocused();
  });

  test('has no serious or critical axe findings at 800 × 900', async ({ page }) => {
    test.setTimeout(180_000);
    await page.setViewportSize({ width: 800, height: 900 });
    await openApp(page);
    const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa']).analyze();
    const serious = results.violations
      .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
      .map(
        (violation) =>
          `${violation.id}: ${violation.nodes
            .map((node) => node.target.join(' '))
            .slice(0, 3)
            .join('; ')}`,
      );
    expect(serious).toEqual([]);
    await page.screenshot({ path: `${SCREENS}/editor-800-start.png` });
  });

  test('screens at 1440 × 900 for a person to look at', async ({ page }) => {
    await page.setViewportSize({ width: 1440, height: 900 });
    await openApp(page);
    await expect(page.getByRole('group', { name: 'Headline results' })).toBeHidden();
    await page.screenshot({ path: `${SCREENS}/editor-1440-start.png` });
  });
});

test.describe('printing the handout in the browser', () => {
  test('opens the handout’s PDF in a new tab, where the browser prints it, with the page’s policy unchanged', async ({
    page,
    context,
  }) => {
    await openApp(page);
    const policy = await page.evaluate(async () => (await fetch('/')).headers.get('content-security-policy'));
    const [tab] = await Promise.all([
      context.waitForEvent('page'),
      page.getByRole('region', { name: 'Handout for the patient' }).getByRole('button', { name: 'Print the handout…' }).click(),
    ]);
    await tab.waitForURL(/^blob:/);
    // The tab shows the handout itself, as a PDF document in the browser's viewer.
    expect(await tab.evaluate(() => document.contentType)).toBe('application/pdf');
    // The handout's tab cannot reach back into the app.
    expect(await tab.evaluate(() => window.opener)).toBeNull();
    await expect(page.locator('.toast')).toHaveText(
      /The handout “ways-to-cut-the-chance-of-a-second-handout\.pdf” is open in a new tab: print it from there \(Ctrl\+P\)\./,
    );
    expect(await page.evaluate(async () => (await fetch('/')).headers.get('content-security-policy'))).toBe(policy);
    await tab.close();
  });
});
