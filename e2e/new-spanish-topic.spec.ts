/**
 * A new topic written for a patient who reads Spanish, in the built app: the Topics panel offers
 * the patient's language beside "New topic", the comparison is named in Spanish, the caution about
 * Chancewise's Spanish shows, and the sentences read in Spanish once the numbers are typed, while
 * the clinician's screens stay in English.
 */
import { SCREENS, expect, openApp, test } from './fixtures.ts';

test.describe('a new topic in Spanish', () => {
  test('starts in Spanish with its comparison named in Spanish, and words its results in Spanish', async ({ page, watch }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Topics' }).click();
    const start = page.getByRole('region', { name: 'Start' });
    const language = start.getByLabel('Written for a patient who reads');
    // Offered first in the open topic's language (the English example).
    await expect(language).toHaveValue('en');
    await language.selectOption('es');
    await start.screenshot({ path: `${SCREENS}/34-new-topic-language.png` });
    await start.getByRole('button', { name: 'New topic', exact: true }).click();

    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('');
    await expect(page.getByLabel('Decision', { exact: true })).toBeFocused();
    await expect(page.getByLabel('Language the patient reads')).toHaveValue('es');
    await expect(page.getByLabel('Option 1 name')).toHaveValue('sin tratamiento');
    await expect(page.getByRole('note', { name: 'Patient wording in Spanish' })).toContainText('a qualified medical translator');

    // An invented topic (illustrative numbers), typed in Spanish.
    await page.getByLabel('Decision', { exact: true }).fill('Tomar un comprimido inventado (ejemplo ilustrativo)');
    await page.getByLabel('Who the numbers are for', { exact: true }).fill('adultos con una enfermedad inventada');
    await page.getByLabel('Option 2 name').fill('el comprimido');
    const outcome = page.locator('article.outcome').first();
    await page.getByLabel('Outcome', { exact: true }).fill('un ingreso en el hospital');
    await outcome.getByLabel('Baseline risk', { exact: true }).fill('20%');
    await outcome.locator('fieldset.effect').first().getByLabel('Estimate').fill('0.5');

    const results = page.locator('article[data-outcome-id="outcome-1"]');
    await expect(results.locator('svg.people-chart').first()).toBeVisible();
    await expect(results).toContainText('de cada 100');
    await expect(results).toContainText('Sin tratamiento');
    await expect(results).not.toContainText('people like you');
    // The clinician's own headings stay in English.
    await expect(page.getByRole('heading', { name: 'Outcomes', exact: true })).toBeVisible();
    await page.screenshot({ path: `${SCREENS}/35-new-spanish-topic.png`, fullPage: false });

    expect(watch.pageErrors).toEqual([]);
  });
});
