import { readFileSync, writeFileSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';
import { SCREENS, countedPeople, expect, openApp, test } from './fixtures.ts';

/**
 * The teaching view on a projector: entered from the demonstration topic, stepped by keys,
 * measured in the page. Minimum sizes are this view's targets for a room (28 px body text,
 * 40 px headings, people at least 24 px across in 100-person arrays, at 1280 × 720); text
 * contrast is WCAG 2.2 level AAA, 7:1 (SC 1.4.6), computed from the WCAG definitions of
 * relative luminance and contrast ratio.
 */

const SIZES = [
  { width: 1280, height: 720, body: 28, heading: 40, icon: 24 },
  { width: 1920, height: 1080, body: 42, heading: 60, icon: 36 },
] as const;

/** Every slide of the kidney stone topic: its step, its heading, and words it must show (from the computed numbers and the core's wording). */
const STEPS: readonly (readonly [string, string, readonly string[]])[] = [
  [
    'title',
    'Ways to cut the chance of a second kidney stone (illustrative)',
    ['Every number is over 5 years.', 'Comparing extra water each day with no change.'],
  ],
  ['baseline', 'Without the option', ['40 in 100', 'have another kidney stone over 5 years', '60 in 100']],
  ['with-option', 'With the option', ['No change', 'Extra water each day', '24 in 100', 'without it (no change)']],
  ['helped', 'Who is helped', ['16 in 100', 'avoid another kidney stone because of extra water each day', 'have it anyway']],
  [
    'harmed',
    'Who is harmed (1 of 2)',
    ['9 in 100', 'get broken sleep from passing urine at night because of extra water each day'],
  ],
  ['harmed', 'Who is harmed (2 of 2)', ['an upset stomach bad enough to stop']],
  ['uncertainty', 'How sure are we?', ['could be anywhere between 8 and 22 in 100', 'Certainty of the evidence: moderate']],
  [
    'patient-words',
    'What the patient hears (1 of 2)',
    ['No change: about 40 in 100 people like you will have another kidney stone in the next 5 years.'],
  ],
  ['patient-words', 'What the patient hears (2 of 2)', ['About 9 in 100 get broken sleep']],
  [
    'framing',
    'One result, four ways',
    [
      '40% lower risk',
      '16 in 100 fewer',
      'Treat 7 to prevent 1',
      '100 ÷ 16 = 6.25, rounded up: 7',
      'Akl 2011, Cochrane · Zipkin 2014',
    ],
  ],
  [
    'denominator',
    '100 or 1000 people?',
    ['100 people', '1000 people', 'risks seemed more serious', 'Galesic, Garcia-Retamero & Gigerenzer 2009'],
  ],
  ['arrangement', 'Grouped or scattered?', ['Grouped', 'Scattered', 'overestimated more', 'Ancker, Weber & Kukafka 2011']],
  [
    'incremental',
    'Two totals, or the change itself?',
    ['Two totals', 'Change as its own group', 'Without it (no change): 40 in 100.', 'J Health Commun 2008;13:107'],
  ],
];

/**
 * Every slide of the invented wanted-event topic (test/fixtures/topics): relief from an itch,
 * 30 in 100 by day 3 without the tablet, 30 × 1.6 = 48 with it; one unwanted harm and one
 * wanted event made less likely.
 */
const WANTED_STEPS: readonly (readonly [string, string, readonly string[]])[] = [
  [
    'title',
    'Taking a night-time antihistamine tablet for an itchy rash (illustrative example)',
    ['Every number counts what happens by day 3.'],
  ],
  ['baseline', 'Without the option', ['30 in 100', 'have relief from the itch by day 3']],
  ['with-option', 'With the option', ['48 in 100', 'have relief from the itch with the night-time tablet']],
  ['helped', 'Who is helped', ['18 in 100', 'have relief from the itch because of the night-time tablet', 'have it anyway']],
  ['harmed', 'Who is harmed (1 of 2)', ['12 in 100', 'get drowsiness the next day because of the night-time tablet']],
  [
    'harmed',
    'Who is harmed (2 of 2)',
    ['10 in 100', 'miss out on feeling alert the next morning because of the night-time tablet'],
  ],
  [
    'uncertainty',
    'How sure are we?',
    ['the number of extra people who have relief from the itch could be anywhere between 9 and 30 in 100'],
  ],
  [
    'patient-words',
    'What the patient hears (1 of 2)',
    ['about 48 in 100 people like you will have relief from the itch by day 3', 'about 18 more of those 100 people'],
  ],
  [
    'patient-words',
    'What the patient hears (2 of 2)',
    ['About drowsiness the next day', 'about 10 fewer of those 100 people end up feeling alert the next morning'],
  ],
  [
    'framing',
    'One result, four ways',
    [
      '60% more people have it',
      '18 in 100 more',
      '48 − 30 = 18 more in 100',
      'NNTB',
      'Treat 6 for 1 more',
      '100 ÷ 18 = 5.56, rounded up: 6',
    ],
  ],
  ['denominator', '100 or 1000 people?', ['100 people', '1000 people']],
  ['arrangement', 'Grouped or scattered?', ['Grouped', 'Scattered']],
  ['incremental', 'Two totals, or the change itself?', ['Without it (no tablet): 30 in 100.']],
];

const WANTED_TOPIC = 'test/fixtures/topics/wanted-itch-relief.json';

const view = (page: Page) => page.locator('dialog.teaching[open]');
const slide = (page: Page) => view(page).locator('article.slide');

async function enter(page: Page): Promise<void> {
  await openApp(page);
  await page.getByRole('button', { name: 'Present for teaching' }).click();
  await expect(view(page)).toBeVisible();
  await expect(slide(page)).toHaveAttribute('data-step', 'title');
}

/** Everything the editor holds: every field's value, the page title and the results' text. */
async function editorState(page: Page): Promise<string> {
  return page.evaluate(() => {
    const fields = [
      ...document.querySelectorAll<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>(
        '.editor-column input, .editor-column select, .editor-column textarea',
      ),
    ].map((field) =>
      field instanceof HTMLInputElement && (field.type === 'checkbox' || field.type === 'radio')
        ? String(field.checked)
        : field.value,
    );
    const results = document.querySelector('.results-column')?.textContent?.replace(/\s+/g, ' ') ?? '';
    return JSON.stringify({ fields, title: document.title, results });
  });
}

interface Measures {
  readonly smallestText: number;
  readonly smallestHeading: number;
  readonly textCount: number;
  readonly smallestIcon: number | null;
  readonly iconCount: number;
  readonly lowContrast: string[];
  readonly overflow: string[];
}

/** Measure the open view in the page: text and heading sizes, people in 100-arrays, contrast, overflow. */
async function measure(page: Page): Promise<Measures> {
  return page.evaluate(() => {
    const root = document.querySelector('dialog.teaching');
    if (root === null) throw new Error('no teaching view');
    const channel = (value: number): number => {
      const scaled = value / 255;
      return scaled <= 0.04045 ? scaled / 12.92 : ((scaled + 0.055) / 1.055) ** 2.4;
    };
    const parse = (colour: string): [number, number, number, number] => {
      const parts = colour.match(/[\d.]+/g)?.map(Number) ?? [0, 0, 0];
      return [parts[0] ?? 0, parts[1] ?? 0, parts[2] ?? 0, parts[3] ?? 1];
    };
    const luminance = ([red, green, blue]: readonly number[]): number =>
      0.2126 * channel(red ?? 0) + 0.7152 * channel(green ?? 0) + 0.0722 * channel(blue ?? 0);
    /** The colour behind an element: the first opaque background up the tree, composited over white. */
    const backgroundOf = (element: Element): [number, number, number] => {
      const layers: [number, number, number, number][] = [];
      for (let current: Element | null = element; current !== null; current = current.parentElement) {
        const found = parse(getComputedStyle(current).backgroundColor);
        if (found[3] > 0) layers.push(found);
        if (found[3] >= 1) break;
      }
      let colour: [number, number, number] = [255, 255, 255];
      for (const [red, green, blue, alpha] of layers.reverse()) {
        colour = [
          red * alpha + colour[0] * (1 - alpha),
          green * alpha + colour[1] * (1 - alpha),
          blue * alpha + colour[2] * (1 - alpha),
        ];
      }
      return colour;
    };
    const visible = (element: Element): boolean => {
      const box = element.getBoundingClientRect();
      const style = getComputedStyle(element);
      return (
        box.width > 2 &&
        box.height > 2 &&
        style.visibility !== 'hidden' &&
        style.display !== 'none' &&
        !element.closest('.visually-hidden')
      );
    };
    const texts = [...root.querySelectorAll('*')].filter(
      (element) =>
        !(element instanceof SVGElement) &&
        [...element.childNodes].some((node) => node.nodeType === Node.TEXT_NODE && (node.textContent ?? '').trim() !== '') &&
        visible(element),
    );
    const headings = texts.filter((element) => /^H[1-6]$/.test(element.tagName));
    const lowContrast: string[] = [];
    for (const element of texts) {
      const foreground = parse(getComputedStyle(element).color);
      const lighter = Math.max(luminance(foreground), luminance(backgroundOf(element)));
      const darker = Math.min(luminance(foreground), luminance(backgroundOf(element)));
      const ratio = (lighter + 0.05) / (darker + 0.05);
      if (ratio < 7)
        lowContrast.push(
          `${element.tagName}.${element.className} “${element.textContent?.trim().slice(0, 30)}” ${ratio.toFixed(2)}:1`,
        );
    }
    // One person's figure as shown: the first run of a shape's path (each person's run starts with an absolute M),
    // drawn alone for a moment beside the shape.
    const icons = [...root.querySelectorAll('svg.people[data-denominator="100"] path.person')].map((path) => {
      const single = path.cloneNode(false) as SVGPathElement;
      single.setAttribute('d', (path.getAttribute('d') ?? '').split(/(?=M)/)[0] ?? '');
      path.after(single);
      const box = single.getBoundingClientRect();
      single.remove();
      return box;
    });
    const overflow: string[] = [];
    const html = document.documentElement;
    // The editor behind the view is longer than the screen; the page must not scroll while presenting.
    if (html.scrollWidth > innerWidth || getComputedStyle(html).overflowY !== 'hidden')
      overflow.push(`page ${html.scrollWidth} wide, overflow ${getComputedStyle(html).overflowY}`);
    const own = root.getBoundingClientRect();
    if (own.left !== 0 || own.top !== 0 || own.width !== innerWidth || own.height !== innerHeight)
      overflow.push(`view ${own.width}×${own.height} at ${own.left},${own.top}`);
    const frame = root.querySelector('.frame');
    for (const box of [root, frame, root.querySelector('.stage')]) {
      if (box !== null && (box.scrollWidth > box.clientWidth + 1 || box.scrollHeight > box.clientHeight + 1)) {
        overflow.push(`${box.className}: ${box.scrollWidth}×${box.scrollHeight} in ${box.clientWidth}×${box.clientHeight}`);
      }
    }
    const controlsTop = root.querySelector('.controls')?.getBoundingClientRect().top ?? innerHeight;
    for (const element of root.querySelectorAll('.slide *')) {
      const box = element.getBoundingClientRect();
      if (box.width === 0 || element.closest('.visually-hidden')) continue;
      if (box.right > innerWidth + 0.5 || box.left < -0.5 || box.bottom > controlsTop + 0.5) {
        overflow.push(
          `${element.tagName}.${element.getAttribute('class') ?? ''} ends at ${Math.round(box.right)}, ${Math.round(box.bottom)}`,
        );
      }
    }
    return {
      smallestText: Math.min(...texts.map((element) => Number.parseFloat(getComputedStyle(element).fontSize))),
      smallestHeading: Math.min(...headings.map((element) => Number.parseFloat(getComputedStyle(element).fontSize))),
      textCount: texts.length,
      smallestIcon: icons.length === 0 ? null : Math.min(...icons.map((box) => Math.min(box.width, box.height))),
      iconCount: icons.length,
      lowContrast,
      overflow: overflow.slice(0, 5),
    };
  });
}

/** Axe-core against WCAG 2.0, 2.1 and 2.2 A and AA, on the view; serious and critical findings fail. */
async function seriousViolations(page: Page): Promise<string[]> {
  // The people inside a drawing are presentational (the drawing is one role="img" with its text), so axe skips them.
  const results = await new AxeBuilder({ page })
    .include('dialog.teaching')
    .exclude('dialog.teaching svg path')
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
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

/**
 * Step through every slide from the first, checking its heading and words, and measuring it:
 * text and heading sizes, people in 100-arrays, contrast, overflow. A screenshot of each.
 */
async function stepThrough(
  page: Page,
  size: (typeof SIZES)[number],
  steps: readonly (readonly [string, string, readonly string[]])[],
  name: string,
): Promise<void> {
  for (const [index, [step, heading, words]] of steps.entries()) {
    const where = `${step} (slide ${index + 1})`;
    await expect(slide(page)).toHaveAttribute('data-step', step);
    await expect(slide(page).getByRole('heading', { level: 2 })).toHaveText(heading);
    for (const text of words) await expect(slide(page)).toContainText(text);
    await expect(view(page).locator('.progress')).toHaveText(`${index + 1} / ${steps.length}`);
    // Taken before the measures are checked, so that a slide that fails them can be looked at.
    await page.screenshot({
      path: `${SCREENS}/${name}-${size.width}x${size.height}-${String(index + 1).padStart(2, '0')}-${step}.png`,
    });
    const found = await measure(page);
    expect(found.smallestText, `smallest text on ${where}`).toBeGreaterThanOrEqual(size.body - 0.01);
    expect(found.smallestHeading, `heading on ${where}`).toBeGreaterThanOrEqual(size.heading);
    if (found.iconCount > 0) expect(found.smallestIcon, `people on ${where}`).toBeGreaterThanOrEqual(size.icon);
    expect(found.lowContrast, `text below 7:1 on ${where}`).toEqual([]);
    expect(found.overflow, `overflow on ${where}`).toEqual([]);
    await page.keyboard.press('ArrowRight');
  }
  // Every 100-person array of the story was measured.
  expect(await view(page).locator('svg.people').count()).toBeGreaterThan(0);
}

/** Open, from the view's menu, a teaching set of one topic file written inside it. */
async function openSetOf(page: Page, setPath: string, topicPath: string): Promise<void> {
  const set = {
    format: 'chancewise-teaching-set',
    version: 1,
    title: 'One topic',
    items: [{ topic: JSON.parse(readFileSync(topicPath, 'utf8')) as unknown }],
  };
  writeFileSync(setPath, JSON.stringify(set));
  await view(page).getByRole('button', { name: 'File…' }).click();
  const [chooser] = await Promise.all([
    page.waitForEvent('filechooser'),
    view(page).getByRole('button', { name: 'Open set…' }).click(),
  ]);
  await chooser.setFiles(setPath);
  await expect(view(page).getByRole('status')).toContainText('Opened the teaching set “One topic”: 1 topic.');
}

/** Width and height from a PNG's IHDR chunk (PNG specification, W3C 2003, §11.2.2). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  expect([...bytes.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

for (const size of SIZES) {
  test.describe(`the teaching view at ${size.width} × ${size.height}`, () => {
    test.use({ viewport: { width: size.width, height: size.height } });

    test('steps through every slide of the demonstration topic, large, legible, in contrast and inside the screen', async ({
      page,
      watch,
    }) => {
      void watch;
      await enter(page);
      await stepThrough(page, size, STEPS, 'teaching');
    });

    test('steps through every slide of a topic whose headline event is wanted, every harm on its own slide', async ({
      page,
      watch,
    }, testInfo) => {
      void watch;
      await enter(page);
      await openSetOf(page, testInfo.outputPath('wanted.teaching.json'), WANTED_TOPIC);
      await stepThrough(page, size, WANTED_STEPS, 'teaching-wanted');
      // The people who gain the wanted event keep their event meaning (caused) and wear the helped look;
      // those who miss out on a wanted event (prevented) wear the harmed look.
      await page.keyboard.press('Home');
      for (let index = 0; index < 3; index += 1) await page.keyboard.press('ArrowRight');
      await expect
        .poll(() =>
          countedPeople(
            slide(page).locator('figure[data-panel-id="option"] path.person[data-look="helped"][data-outcome="caused"]'),
          ),
        )
        .toBe(18);
      await expect(slide(page).locator('path.person[data-look="harmed"]')).toHaveCount(0);
      await page.keyboard.press('ArrowRight');
      await page.keyboard.press('ArrowRight');
      await expect
        .poll(() =>
          countedPeople(
            slide(page).locator('figure[data-panel-id="option"] path.person[data-look="harmed"][data-outcome="prevented"]'),
          ),
        )
        .toBe(10);
    });
  });
}

test.describe('the teaching view', () => {
  test.use({ viewport: { width: 1280, height: 720 } });

  test('goes full screen, steps forward and back with keyboard and clicker keys, and leaves with Escape, the topic unchanged', async ({
    page,
    watch,
  }) => {
    void watch;
    await openApp(page);
    const before = await editorState(page);
    const present = page.getByRole('button', { name: 'Present for teaching' });
    await present.click();
    await expect(view(page)).toBeVisible();
    await expect.poll(() => page.evaluate(() => document.fullscreenElement !== null)).toBe(true);
    const step = () => slide(page).getAttribute('data-step');
    for (const [key, expected] of [
      ['ArrowRight', 'baseline'],
      ['PageDown', 'with-option'],
      ['Space', 'helped'],
      ['ArrowDown', 'harmed'],
      ['ArrowLeft', 'helped'],
      ['PageUp', 'with-option'],
      ['ArrowUp', 'baseline'],
      ['End', 'incremental'],
      ['ArrowRight', 'incremental'],
      ['Home', 'title'],
      ['ArrowLeft', 'title'],
      ['Shift+Space', 'title'],
    ] as const) {
      await page.keyboard.press(key);
      expect(await step(), `after ${key}`).toBe(expected);
    }
    // The editor's shortcuts do nothing while presenting: undo does not reach the topic.
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Escape');
    await expect(view(page)).toHaveCount(0);
    await expect.poll(() => page.evaluate(() => document.fullscreenElement === null)).toBe(true);
    await expect(present).toBeFocused();
    expect(await editorState(page)).toBe(before);
  });

  test('steps with the on-screen buttons and announces each slide', async ({ page, watch }) => {
    void watch;
    await enter(page);
    await expect(view(page).getByRole('button', { name: 'Back' })).toBeDisabled();
    await view(page).getByRole('button', { name: 'Next' }).click();
    await expect(slide(page)).toHaveAttribute('data-step', 'baseline');
    await expect(view(page).locator('[aria-live="polite"]')).toHaveText('Slide 2 of 13: Without the option');
    await view(page).getByRole('button', { name: 'Back' }).click();
    await expect(slide(page)).toHaveAttribute('data-step', 'title');
    await view(page).getByRole('button', { name: 'Leave' }).click();
    await expect(view(page)).toHaveCount(0);
  });

  test('has no serious or critical axe findings on its slides and with its menu open', async ({ page, watch }) => {
    void watch;
    test.setTimeout(180_000);
    await enter(page);
    for (const kind of ['title', 'helped', 'uncertainty', 'patient-words', 'framing', 'denominator']) {
      while ((await slide(page).getAttribute('data-step')) !== kind) await page.keyboard.press('ArrowRight');
      expect(await seriousViolations(page), `axe on ${kind}`).toEqual([]);
    }
    await view(page).getByRole('button', { name: 'File…' }).click();
    expect(await seriousViolations(page)).toEqual([]);
  });

  test('runs a teaching set of two topics opened with the file input, and reports a damaged set without losing the presentation', async ({
    page,
    watch,
  }, testInfo) => {
    void watch;
    await enter(page);
    const menu = view(page).getByRole('button', { name: 'File…' });
    await menu.click();
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      view(page).getByRole('button', { name: 'Open set…' }).click(),
    ]);
    await chooser.setFiles('assets/teaching/framing-and-format.teaching.json');
    await expect(view(page).getByRole('status')).toHaveText(
      /Opened the teaching set “Framing and format: two illustrative topics”: 2 topics\./,
    );
    await expect(view(page).locator('.progress')).toHaveText('1 / 18 · Topic 1 of 2');
    for (let index = 0; index < 11; index += 1) await page.keyboard.press('PageDown');
    await expect(view(page).locator('.progress')).toHaveText('12 / 18 · Topic 2 of 2');
    await expect(slide(page).getByRole('heading', { level: 2 })).toHaveText('A bowel test at home every 2 years (illustrative)');
    await page.keyboard.press('PageDown');
    await expect(slide(page)).toContainText('30 in 1000');
    await page.keyboard.press('PageDown');
    await page.keyboard.press('PageDown');
    await expect(slide(page)).toHaveAttribute('data-step', 'helped');
    await expect(slide(page)).toContainText('avoid dying of bowel cancer because of screening');
    await page.keyboard.press('PageDown');
    await expect(slide(page)).toContainText('get a camera test after a false alarm because of screening');
    await page.screenshot({ path: `${SCREENS}/teaching-set-1280x720-16-harmed-1000.png` });
    await page.keyboard.press('PageDown');
    await expect(slide(page)).toContainText('Treat 170 to prevent 1');
    await page.screenshot({ path: `${SCREENS}/teaching-set-1280x720-17-framing-1000.png` });
    // Every slide of the set, both topics, inside the screen, legible and in contrast.
    await page.keyboard.press('Home');
    for (let index = 0; index < 18; index += 1) {
      const found = await measure(page);
      const where = `slide ${index + 1} (${(await slide(page).getAttribute('data-step')) ?? ''})`;
      expect(found.overflow, where).toEqual([]);
      expect(found.lowContrast, where).toEqual([]);
      expect(found.smallestText, where).toBeGreaterThanOrEqual(28 - 0.01);
      if (found.iconCount > 0) expect(found.smallestIcon, where).toBeGreaterThanOrEqual(24);
      await page.keyboard.press('PageDown');
    }
    await page.keyboard.press('End');
    await expect(slide(page)).toHaveAttribute('data-step', 'denominator');
    await expect(view(page).locator('.progress')).toHaveText('18 / 18 · Topic 2 of 2');

    // A damaged set: one message naming the field, and the presentation stays as it was.
    const damaged = testInfo.outputPath('damaged.teaching.json');
    const text = JSON.parse(readFileSync('assets/teaching/framing-and-format.teaching.json', 'utf8')) as {
      items: { steps: string[] }[];
    };
    const first = text.items[0];
    if (first !== undefined) first.steps = ['title', 'summary'];
    writeFileSync(damaged, JSON.stringify(text));
    await menu.click();
    const [again] = await Promise.all([
      page.waitForEvent('filechooser'),
      view(page).getByRole('button', { name: 'Open set…' }).click(),
    ]);
    await again.setFiles(damaged);
    await expect(view(page).getByRole('alert')).toContainText('“damaged.teaching.json” is damaged at "items.0.steps.1"');
    await expect(view(page).getByRole('alert')).toContainText('found the text "summary". The presentation is unchanged.');
    await expect(view(page).locator('.progress')).toHaveText('18 / 18 · Topic 2 of 2');
  });

  test('saves the current slide as PNG and SVG, and the presentation as a set that opens again', async ({ page, watch }) => {
    void watch;
    await enter(page);
    for (let index = 0; index < 3; index += 1) await page.keyboard.press('ArrowRight');
    const menu = view(page).getByRole('button', { name: 'File…' });
    await menu.click();
    const [png] = await Promise.all([page.waitForEvent('download'), view(page).getByRole('button', { name: 'PNG' }).click()]);
    expect(png.suggestedFilename()).toBe('ways-to-cut-the-chance-of-04-helped.png');
    const pngBytes = readFileSync((await png.path()) ?? '');
    expect(pngSize(pngBytes)).toEqual({ width: 1920, height: 1080 });
    await menu.click();
    const [svg] = await Promise.all([page.waitForEvent('download'), view(page).getByRole('button', { name: 'SVG' }).click()]);
    const svgText = readFileSync((await svg.path()) ?? '', 'utf8');
    expect(svgText).toContain('viewBox="0 0 1920 1080"');
    expect(svgText).toContain('avoid another kidney stone because of extra water each day');
    const counts = [...svgText.matchAll(/class="person"[^>]* data-count="(\d+)"/g)].map((found) => Number(found[1]));
    expect(counts.reduce((sum, count) => sum + count, 0)).toBe(200);
    await menu.click();
    const [set] = await Promise.all([
      page.waitForEvent('download'),
      view(page).getByRole('button', { name: 'Save set' }).click(),
    ]);
    const setText = readFileSync((await set.path()) ?? '', 'utf8');
    const saved = JSON.parse(setText) as { format: string; items: { topic: { topic: { title: string } } }[] };
    expect(saved.format).toBe('chancewise-teaching-set');
    expect(saved.items[0]?.topic.topic.title).toBe('Ways to cut the chance of a second kidney stone (illustrative)');
    // The view keeps its place after saving.
    await expect(slide(page)).toHaveAttribute('data-step', 'helped');
  });
});
