/**
 * The Spanish example in the built app: its sentences, pictures, name preview and handout are in
 * Spanish, its reading level is on the INFLESZ scale, and the clinician's screens stay in English
 * with the caution about Chancewise's own Spanish.
 */
import { execFileSync } from 'node:child_process';
import { SCREENS, expect, openApp, test } from './fixtures.ts';

test.describe('the Spanish example', () => {
  test('reads to the patient in Spanish on screen and on the handout', async ({ page, watch }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Topics' }).click();
    await page.getByRole('region', { name: 'Start' }).locator('button.demo', { hasText: 'migrañas' }).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue(/menos migrañas/);
    await expect(page.getByLabel('Language the patient reads')).toHaveValue('es');
    await expect(page.getByRole('note', { name: 'Patient wording in Spanish' })).toContainText('a qualified medical translator');

    // The sentences under the pictures, in Spanish with "de cada 1000", a wanted event had "gracias a" the option.
    const headline = page.locator('article[data-outcome-id="mitad-de-dias"]');
    await expect(headline.locator('svg.people-chart').first()).toBeVisible();
    await expect(headline).toContainText('de cada 1000');
    await expect(headline).not.toContainText('people like you');
    // The clinician's own words stay in English.
    await expect(page.getByRole('heading', { name: 'Outcomes', exact: true })).toBeVisible();

    // The reading level is on the Spanish scale, with its aim and source.
    const reading = page.locator('[data-reading-scale]');
    await expect(reading).toHaveAttribute('data-reading-scale', 'inflesz');
    await expect(reading).toContainText('INFLESZ');
    await expect(reading).toContainText('Barrio-Cantalejo et al. 2008');

    // The editor previews the sentences the typed names go into, and follows a renamed outcome.
    const preview = page.getByRole('region', { name: 'How the names read to the patient' });
    await expect(preview).toContainText('personas como usted');
    await page.getByLabel('Outcome', { exact: true }).nth(1).fill('mucho sueño durante el día');
    await expect(preview).toContainText('mucho sueño durante el día');
    await page.getByLabel('Outcome', { exact: true }).nth(1).fill('cansancio durante el día');
    await page.screenshot({ path: `${SCREENS}/31-spanish-example.png` });
    await headline.screenshot({ path: `${SCREENS}/32-spanish-headline.png` });
    await preview.screenshot({ path: `${SCREENS}/33-spanish-name-preview.png` });

    const handout = page.getByRole('region', { name: 'Handout for the patient' });
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      handout.getByRole('button', { name: 'Make the handout (PDF)' }).click(),
    ]);
    const path = await download.path();
    // Poppler reads the file independently of the code that wrote it.
    expect(execFileSync('pdfinfo', [path], { encoding: 'utf8' })).toMatch(/Pages:\s+1\b/);
    const text = execFileSync('pdftotext', [path, '-'], { encoding: 'utf8' });
    expect(text).toContain('Ejemplo ilustrativo');
    expect(text).toContain('no sustituye sus consejos');
    expect(text).toContain('Siga las recomendaciones locales.');
    expect(text).not.toContain('people like you');
    expect(watch.pageErrors).toEqual([]);
  });
});
