/**
 * A copy in Spanish in the built app: from the English example, the app bar's action puts an
 * unsaved copy on screen with the same numbers, the caution about checking Chancewise's Spanish,
 * and each typed text listed as still to translate until the clinician rewrites it.
 */
import { SCREENS, countedPeople, expect, openApp, people, test } from './fixtures.ts';

test.describe('a copy in Spanish', () => {
  test('keeps the numbers, cautions about the Spanish and lists what is still in English until it is rewritten', async ({
    page,
    watch,
  }) => {
    await openApp(page);
    const caution = page.getByRole('note', { name: 'Patient wording in Spanish' });
    await expect(caution).toHaveCount(0);
    await expect(page.getByLabel('Language the patient reads')).toHaveValue('en');
    const helpedBefore = await countedPeople(people(page, 'stone', 'water', 'prevented'));

    await page.getByRole('button', { name: 'A copy in Spanish' }).click();
    await expect(page.getByLabel('Language the patient reads')).toHaveValue('es');
    await expect(caution).toContainText('a qualified medical translator or a Spanish-speaking clinician');
    // A copy of an example is still an example, and in no file yet.
    await expect(page.locator('header .file')).toHaveText('Example (not saved)');
    await expect(page.getByText('Unsaved changes', { exact: true })).toBeVisible();
    // A topic already in Spanish has nothing to copy into Spanish.
    await expect(page.getByRole('button', { name: 'A copy in Spanish' })).toHaveCount(0);

    const gaps = page.getByRole('region', { name: /Still to fill in for the handout/ });
    const water = gaps.getByRole('link', {
      name: 'Option name “extra water each day” is still in English: write it in Spanish.',
    });
    await expect(water).toBeVisible();
    await expect(gaps.getByRole('link', { name: /^Outcome name “another kidney stone” is still in English/ })).toBeVisible();
    // The example's 12 typed texts, then its 4 disclosures not given.
    await expect(gaps.locator('h3')).toHaveText('Still to fill in for the handout (16)');

    // The same numbers: the people helped by extra water are drawn as before.
    await expect(people(page, 'stone', 'water', 'prevented').first()).toBeAttached();
    expect(await countedPeople(people(page, 'stone', 'water', 'prevented'))).toBe(helpedBefore);

    await page.screenshot({ path: '/tmp/es-editor.png' });
    await page.screenshot({ path: `${SCREENS}/30-copy-in-spanish.png` });

    // The entry takes the clinician to the field; once renamed, it leaves the list.
    await water.click();
    const field = page.getByLabel('Option 2 name');
    await expect(field).toBeFocused();
    await field.fill('más agua cada día');
    await expect(water).toHaveCount(0);
    await expect(gaps.locator('h3')).toHaveText('Still to fill in for the handout (15)');
    await expect(gaps.getByRole('link', { name: /^Option name “a citrate drink twice a day”/ })).toBeVisible();

    // A text that reads the same in Spanish (here, as if it did) is kept as it is and leaves the list;
    // focus moves to the next entry's button.
    await gaps.getByRole('button', { name: 'Keep “a citrate drink twice a day” as it is in Spanish' }).click();
    await expect(gaps.getByRole('link', { name: /^Option name “a citrate drink twice a day”/ })).toHaveCount(0);
    await expect(gaps.locator('h3')).toHaveText('Still to fill in for the handout (14)');
    await expect(gaps.locator('button.keep:focus')).toHaveAccessibleName(/^Keep “.*” as it is in Spanish$/);
    await gaps.screenshot({ path: `${SCREENS}/36-keep-as-it-is.png` });
    // Undo brings it back to the list.
    await page.keyboard.press('Control+z');
    await expect(gaps.locator('h3')).toHaveText('Still to fill in for the handout (15)');

    expect(watch.pageErrors).toEqual([]);
  });
});
