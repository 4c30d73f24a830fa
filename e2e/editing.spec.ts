import { SCREENS, countedPeople, expect, openApp, people, test } from './fixtures.ts';

test.describe('editing a topic', () => {
  test('opens on the first example, marked illustrative, with numbers, charts and words', async ({ page, watch }) => {
    await openApp(page);
    await expect(page.getByRole('note', { name: 'Illustrative example' })).toContainText('Every number here is invented');
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue(/second kidney stone/);
    // The example: 4 in 10 over 5 years, RR 0.6 with extra water: 24 in 100.
    const headline = page.locator('table[data-outcome-id="stone"]');
    await expect(headline.locator('tr[data-option-id="as-now"] td.people .value')).toHaveText('40');
    await expect(headline.locator('tr[data-option-id="water"] td.people .value')).toHaveText('24');
    await expect.poll(() => countedPeople(people(page, 'stone', 'as-now', 'event'))).toBe(40);
    await expect.poll(() => countedPeople(people(page, 'stone', 'as-now', 'free'))).toBe(60);
    await expect(page.locator('article[data-outcome-id="stone"] ul[data-option-id="as-now"]')).toContainText(
      'about 40 in 100 people like you will have another kidney stone',
    );
    await expect(page.locator('svg.people-chart').first()).toContainText('Illustrative');
    await page.screenshot({ path: `${SCREENS}/01-start.png` });
    expect(watch.pageErrors).toEqual([]);
  });

  test('a new baseline risk updates the numbers, the charts and the sentences', async ({ page, watch }) => {
    await openApp(page);
    const baseline = page.getByLabel('Baseline risk', { exact: true }).first();
    await baseline.fill('20%');
    const headline = page.locator('table[data-outcome-id="stone"]');
    await expect(headline.locator('tr[data-option-id="as-now"] td.people .value')).toHaveText('20');
    // 20% × 0.6 = 12%: 12 of 100, so 8 avoid it; 20% × 0.45 = 9%, so 11 avoid it with the citrate drink.
    await expect(headline.locator('tr[data-option-id="water"] td.people .value')).toHaveText('12');
    await expect.poll(() => countedPeople(people(page, 'stone', 'as-now', 'event'))).toBe(20);
    await expect.poll(() => countedPeople(people(page, 'stone', 'water', 'prevented'))).toBe(8);
    await expect.poll(() => countedPeople(people(page, 'stone', 'citrate', 'prevented'))).toBe(11);
    await expect(page.locator('article[data-outcome-id="stone"] ul[data-option-id="as-now"]')).toContainText('about 20 in 100');
    await expect(page.getByRole('status').filter({ hasText: 'Up to date' })).toBeVisible();
    await expect(page.getByText('Unsaved changes')).toBeVisible();
    await page.screenshot({ path: `${SCREENS}/02-baseline-20.png` });
    expect(watch.outsideRequests).toEqual([]);
  });

  test('an option and an outcome can be added and filled in', async ({ page }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Add an option' }).click();
    const name = page.getByLabel('Option 4 name');
    await expect(name).toBeFocused();
    await name.fill('a lower dose');
    await expect(page.getByRole('region', { name: /Still to fill in \(3\)/ })).toBeVisible();
    await expect(page.getByRole('status').filter({ hasText: 'Out of date' })).toBeVisible();
    const blocks = page.locator('fieldset.effect').filter({ hasText: 'Effect of a lower dose' });
    await expect(blocks).toHaveCount(3);
    for (const block of await blocks.all()) await block.getByLabel('Estimate').fill('0.9');
    await expect(page.getByRole('status').filter({ hasText: 'Up to date' })).toBeVisible();
    await expect(page.locator('article[data-outcome-id="stone"] g.chart-array')).toHaveCount(4);

    await page.getByRole('button', { name: 'Add a harm' }).click();
    const outcomeName = page.getByLabel('Outcome', { exact: true }).last();
    await expect(outcomeName).toBeFocused();
    await outcomeName.fill('a headache');
    const outcome = page.locator('article.outcome').last();
    await outcome.getByLabel('Baseline risk', { exact: true }).fill('1 in 10');
    for (const block of await outcome.locator('fieldset.effect').all()) await block.getByLabel('Estimate').fill('1.5');
    await expect(page.getByRole('status').filter({ hasText: 'Up to date' })).toBeVisible();
    const headache = page.locator('article.outcome-result').filter({ hasText: 'a headache' });
    await expect(headache.locator('g.chart-array')).toHaveCount(4);
    // 10% × 1.5 = 15%: 5 more people in 100 (50 in 1000) have a headache with each option.
    const denominator = Number(await headache.locator('svg.people-chart').getAttribute('data-denominator'));
    await expect
      .poll(() => countedPeople(headache.locator('g.chart-array[data-option-id="water"] path[data-outcome="caused"]')))
      .toBe(denominator * 0.05);
    await page.screenshot({ path: `${SCREENS}/03-added-option-and-outcome.png`, fullPage: false });
  });

  test('an impossible value is explained beside its field; what was typed stays, and results show as out of date', async ({
    page,
  }) => {
    await openApp(page);
    const baseline = page.getByLabel('Baseline risk', { exact: true }).first();
    await baseline.fill('150%');
    await expect(baseline).toHaveAttribute('aria-invalid', 'true');
    const describedBy = (await baseline.getAttribute('aria-describedby')) ?? '';
    const problemId = describedBy.split(' ').find((id) => id.endsWith('-problem'));
    expect(problemId).toBeTruthy();
    const problem = page.locator(`[id="${problemId}"]`);
    await expect(problem).toHaveText(/A risk of "150%" is outside 0% to 100%/);
    // Beside the field: directly under it in the same field block.
    const fieldBox = await baseline.boundingBox();
    const problemBox = await problem.boundingBox();
    expect(problemBox && fieldBox && problemBox.y - (fieldBox.y + fieldBox.height)).toBeLessThan(20);
    await expect(baseline).toHaveValue('150%');
    await expect(page.getByText('These results are from before your latest change.')).toBeVisible();
    await expect(page.locator('table[data-outcome-id="stone"] tr[data-option-id="as-now"] td.people .value')).toHaveText('40');
    await baseline.evaluate((element) => element.scrollIntoView({ block: 'center' }));
    await page.screenshot({ path: `${SCREENS}/04-impossible-value.png` });

    // Every problem at once, listed above the editor, each a link to its field.
    await page.getByLabel('Estimate').nth(2).fill('-1');
    const summary = page.getByRole('region', { name: /2 things to fix/ });
    await expect(summary.getByRole('link')).toHaveCount(2);
    await summary.getByRole('link', { name: /risk ratio of -1 is not possible/ }).click();
    await expect(page.getByLabel('Estimate').nth(2)).toBeFocused();
  });

  test('undo and redo work from the keyboard and the buttons', async ({ page }) => {
    await openApp(page);
    const title = page.getByLabel('Decision', { exact: true });
    await title.fill('A different decision');
    await page.getByLabel('Baseline risk', { exact: true }).first().fill('20%');
    await page.keyboard.press('Control+z');
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('4 in 10');
    await page.keyboard.press('Control+z');
    await expect(title).toHaveValue(/second kidney stone/);
    await page.keyboard.press('Control+Shift+z');
    await expect(title).toHaveValue('A different decision');
    await page.keyboard.press('Control+y');
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('20%');
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('4 in 10');
    await page.getByRole('button', { name: 'Redo' }).click();
    await expect(page.getByLabel('Baseline risk', { exact: true }).first()).toHaveValue('20%');
  });

  test('switches between 100 and 1000 people', async ({ page }) => {
    await openApp(page);
    await page.getByRole('radio', { name: '1000 people' }).check();
    await expect(page.locator('table[data-outcome-id="stone"] tr[data-option-id="as-now"] td.people .value')).toHaveText('400');
    await expect
      .poll(() =>
        countedPeople(page.locator('article[data-outcome-id="stone"] g.chart-array[data-option-id="as-now"] path[data-outcome]')),
      )
      .toBe(1000);
    // 40% × 0.6 = 24%: 240 of 1000, so 160 avoid it.
    await expect.poll(() => countedPeople(people(page, 'stone', 'water', 'prevented'))).toBe(160);
    await page.screenshot({ path: `${SCREENS}/05-per-1000.png` });
    await page.getByRole('radio', { name: '100 people' }).check();
    await expect
      .poll(() =>
        countedPeople(page.locator('article[data-outcome-id="stone"] g.chart-array[data-option-id="as-now"] path[data-outcome]')),
      )
      .toBe(100);
  });

  test('the start panel offers a new topic and the other examples, each marked illustrative', async ({ page }) => {
    await openApp(page);
    await page.getByRole('button', { name: 'Topics' }).click();
    const panel = page.getByRole('region', { name: 'Start' });
    const examples = panel.locator('button.demo');
    // The five examples, the Spanish one among them.
    await expect(examples).toHaveCount(5);
    for (const example of await examples.all()) await expect(example).toContainText('Illustrative');
    await page.screenshot({ path: `${SCREENS}/06-start-panel.png` });
    await examples.nth(1).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue(/bowel test/);
    await expect(page.getByRole('note', { name: 'Illustrative example' })).toBeVisible();
    await page.getByRole('button', { name: 'Topics' }).click();
    await page.getByRole('button', { name: 'New topic', exact: true }).click();
    await expect(page.getByLabel('Decision', { exact: true })).toHaveValue('');
    await expect(page.getByRole('note', { name: 'Illustrative example' })).toHaveCount(0);
    await expect(page.getByText('No results yet')).toBeVisible();
    await page.screenshot({ path: `${SCREENS}/07-new-topic.png` });
  });
});
