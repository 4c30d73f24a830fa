/**
 * The disclosures in the built app: filled in the editor's "About this topic" group, they leave
 * "Still to fill in for the handout" and appear in the handout's text, read back from the PDF by
 * poppler's pdftotext. The items are the IPDAS instrument's (Elwyn et al. 2009, PLoS ONE 4(3):e4705).
 */
import { execFileSync } from 'node:child_process';
import type { Page } from '@playwright/test';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

/** Make the handout from the card and give its text, white space made single spaces. */
async function handoutText(page: Page): Promise<string> {
  const card = page.getByRole('region', { name: 'Handout for the patient' });
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    card.getByRole('button', { name: 'Make the handout (PDF)' }).click(),
  ]);
  const path = await download.path();
  expect(execFileSync('pdfinfo', [path], { encoding: 'utf8' })).toMatch(/Pages:\s+1\b/);
  return execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

test.describe('the disclosures of a topic', () => {
  test('filled in the editor, leave the list of what is still to fill in and are printed on the handout', async ({ page }) => {
    await openApp(page);
    const gaps = page.getByRole('region', { name: /Still to fill in for the handout/ });
    await expect(gaps).toContainText('Still to fill in for the handout (4)');
    // "not stated" until they are given, never a blank.
    const before = await handoutText(page);
    expect(before).toContain('Written by: not stated. Funding: not stated. Interests: not stated. Review by: not stated.');

    const group = page.getByRole('region', { name: 'About this topic' });
    await group.getByLabel('Prepared by').fill('Hillside practice nurses (invented)');
    await group.getByLabel('Funding').fill('Hillside practice, no outside funding');
    await group.getByLabel('Interests').fill('None declared');
    await group.getByLabel('Review by').fill('2028-06-30');
    await expect(gaps).toHaveCount(0);
    await group.scrollIntoViewIfNeeded();
    await group.screenshot({ path: `${SCREENS}/20-about-this-topic.png` });

    const text = await handoutText(page);
    expect(text).toContain('About this sheet.');
    expect(text).toContain('Written by: Hillside practice nurses (invented).');
    expect(text).toContain('Funding: Hillside practice, no outside funding.');
    expect(text).toContain('Interests: None declared.');
    // 2028-06-30 written in words (ISO 8601 calendar date).
    expect(text).toContain('Review by: 30 June 2028.');
    // Each effect's source beside the evidence (the first demo's two invented sources).
    expect(text).toContain('The effects come from: Invented trials of drinking more, for demonstration only');
    expect(text).toContain('Invented small trials, for demonstration only');
  });

  test('a review-by date not written YYYY-MM-DD is marked beside its field, saying how to write it', async ({ page }) => {
    await openApp(page);
    const field = page.getByRole('region', { name: 'About this topic' }).getByLabel('Review by');
    await field.fill('30/06/2028');
    await expect(field).toHaveAttribute('aria-invalid', 'true');
    await expect(page.getByText(/The review-by date "30\/06\/2028" is not written as year-month-day/).first()).toBeVisible();
  });
});

test.describe('reading warnings when the handout is made', () => {
  test('a typed title above the grade target is named in the handout card, and the handout is still made', async ({ page }) => {
    await openApp(page);
    // "Stones topic (illustrative)": Flesch–Kincaid grade 0.39 × 3 + 11.8 × 7 / 3 − 15.59 = 13.1 (Kincaid et al. 1975).
    await page.getByLabel('Decision', { exact: true }).fill('Stones topic (illustrative)');
    await expect(page.getByRole('status').filter({ hasText: 'Up to date' })).toBeVisible();
    const text = await handoutText(page);
    expect(text).toContain('Stones topic (illustrative)');
    const warnings = page.getByRole('status', { name: 'Warnings on the handout' });
    await expect(warnings).toContainText('The text in the title reads at about grade 13.1, above grade 8.');
    await page.locator('.toast').getByRole('button', { name: 'Dismiss' }).click();
    await page.getByRole('region', { name: 'Handout for the patient' }).screenshot({ path: `${SCREENS}/21-handout-warning.png` });
  });
});

test.describe('the screening demo', () => {
  test('shows its screening entries in the editor and prints “If you have the test” on its handout', async ({ page }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Topics' }).click();
    await page.getByRole('region', { name: 'Start' }).locator('button.demo').nth(1).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue(/bowel test/);
    await expect(page.getByLabel('Missed cases (false reassurance)')).toHaveValue('3 in 1000');
    const group = page.getByLabel('Overdiagnosis').locator('xpath=ancestor::details');
    await group.scrollIntoViewIfNeeded();
    await group.screenshot({ path: `${SCREENS}/22-screening-test.png` });
    const text = await handoutText(page);
    expect(text).toContain('If you have the test: a positive result leads to a camera test of the bowel to look for the cause.');
    expect(text).toContain('About 3 in 1000 people who have the test are told all is well');
  });
});
