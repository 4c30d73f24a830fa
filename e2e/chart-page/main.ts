/**
 * The people-chart check page: the bench's topic (bench/fixtures/) per 1000 people (or per 100 with
 * `?per=100`), every outcome as the comparison beside extra water. `?palette=black-and-white`
 * draws the print theme, `?range=on` outlines the people who depend on the interval,
 * `?greyscale=on` shows the page through a greyscale filter. Timing hooks for the chart
 * benchmark are on `window.chartPage`.
 */
import type { Denominator } from '../../src/core/types.ts';
import { PALETTES, colourPalette } from '../../src/render/palette.ts';
import { type DrawSample, timeBareElements, timeFirstDraws, timeRedraws, timedFirstDraw } from './draw-timing.ts';
import { demoChartModels, demoTopic, headlineChartAt } from './demo-models.ts';
import './chart-page.css';

/** What the page offers to a driving browser test or benchmark. */
export interface ChartPageHooks {
  /** The first draw of the headline chart when the page loaded. */
  readonly loadDraw: DrawSample;
  readonly per: Denominator;
  timeFirstDraws(repetitions: number): Promise<DrawSample[]>;
  timeRedraws(repetitions: number): Promise<DrawSample[]>;
  /** The same number of empty elements, for the browser's floor (see draw-timing.ts). */
  timeBareElements(repetitions: number): Promise<DrawSample[]>;
}

declare global {
  interface Window {
    chartPage?: ChartPageHooks;
  }
}

const query = new URLSearchParams(location.search);
const per: Denominator = query.get('per') === '100' ? 100 : 1000;
const palette = PALETTES[query.get('palette') ?? ''] ?? colourPalette;
const showRange = query.get('range') === 'on';
if (query.get('greyscale') === 'on') document.body.classList.add('greyscale');

function element(id: string): HTMLElement {
  const found = document.getElementById(id);
  if (found === null) throw new Error(`the page has no #${id}`);
  return found;
}

const topic = demoTopic();
const charts = element('charts');
const bench = element('bench');
const drawn = demoChartModels(topic, per).map((model) => timedFirstDraw(charts, model, { palette, showRange }));
const loadDraw = drawn[0]?.sample ?? { total: Number.NaN, script: Number.NaN };
// Three baselines around the topic's 15%, so every redraw moves people between groups.
const redrawModels = ['15%', '20%', '12%'].map((risk) => headlineChartAt(topic, per, risk));

window.chartPage = {
  loadDraw,
  per,
  timeFirstDraws: (repetitions) => timeFirstDraws(bench, redrawModels[0]!, repetitions),
  timeRedraws: (repetitions) => timeRedraws(bench, redrawModels, repetitions),
  timeBareElements: (repetitions) => timeBareElements(bench, redrawModels[0]!, repetitions),
};
document.body.dataset['ready'] = 'true';
