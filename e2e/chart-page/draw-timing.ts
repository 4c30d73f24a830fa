/**
 * Timing of the people charts in the page, with `performance.now()`: from the start of
 * drawing to after a forced style and layout (the svg's `getBoundingClientRect()` and the
 * container's `offsetHeight`). Each sample waits for a rendered frame first, so one
 * sample's leftover work does not land in the next. Each sample is also bracketed by
 * `performance.mark`s (`<kind>:start`, `<kind>:end`), so a browser trace can give the
 * main thread's CPU time over the same span, which other load on the machine inflates less.
 */
import type { ChartModel } from '../../src/render/chart-model.ts';
import { drawChart } from '../../src/render/svg/draw-chart.ts';
import type { SvgChartOptions } from '../../src/render/svg/svg-chart-options.ts';
import { updateChart } from '../../src/render/svg/update-chart.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/** One timed drawing, in milliseconds. */
export interface DrawSample {
  /** Start of drawing to after the forced layout. */
  readonly total: number;
  /** Start of drawing to the end of the renderer's own script (no layout). */
  readonly script: number;
}

/** Resolve after the next frame has been produced. */
export function nextFrame(): Promise<void> {
  return new Promise((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));
}

/** Force style and layout of `svg` inside `container`, as a page reading its size would. */
function forceLayout(svg: SVGSVGElement, container: HTMLElement): number {
  return svg.getBoundingClientRect().height + container.offsetHeight;
}

/** Names of the marks around each kind of sample. */
export const SAMPLE_MARKS = { firstDraw: 'chart-first-draw', redraw: 'chart-redraw', bareElements: 'bare-elements' } as const;

function mark(name: string): void {
  performance.mark(name);
  performance.clearMarks(name);
}

/** Draw `model` into a fresh svg appended to `container`, timed; the svg is left in place. */
export function timedFirstDraw(
  container: HTMLElement,
  model: ChartModel,
  options: SvgChartOptions = {},
): { svg: SVGSVGElement; sample: DrawSample } {
  mark(`${SAMPLE_MARKS.firstDraw}:start`);
  const start = performance.now();
  const svg = document.createElementNS(SVG_NAMESPACE, 'svg');
  container.append(svg);
  drawChart(svg, model, options);
  const scripted = performance.now();
  forceLayout(svg, container);
  const end = performance.now();
  mark(`${SAMPLE_MARKS.firstDraw}:end`);
  return { svg, sample: { total: end - start, script: scripted - start } };
}

/** `repetitions` first draws of `model`, each into a fresh svg removed afterwards. */
export async function timeFirstDraws(container: HTMLElement, model: ChartModel, repetitions: number): Promise<DrawSample[]> {
  const samples: DrawSample[] = [];
  for (let run = 0; run < repetitions; run += 1) {
    await nextFrame();
    const { svg, sample } = timedFirstDraw(container, model);
    samples.push(sample);
    await nextFrame();
    svg.remove();
  }
  return samples;
}

/**
 * `repetitions` live redraws with `updateChart` of one svg, alternating between the
 * models given (which differ in their counts), after one untimed first draw.
 */
export async function timeRedraws(
  container: HTMLElement,
  models: readonly ChartModel[],
  repetitions: number,
): Promise<DrawSample[]> {
  const [first] = models;
  if (first === undefined || models.length < 2) throw new Error('redraw timing needs at least two models');
  const svg = document.createElementNS(SVG_NAMESPACE, 'svg');
  container.append(svg);
  drawChart(svg, first);
  const samples: DrawSample[] = [];
  for (let run = 1; run <= repetitions; run += 1) {
    const model = models[run % models.length] as ChartModel;
    await nextFrame();
    mark(`${SAMPLE_MARKS.redraw}:start`);
    const start = performance.now();
    const update = updateChart(svg, model);
    const scripted = performance.now();
    forceLayout(svg, container);
    const end = performance.now();
    mark(`${SAMPLE_MARKS.redraw}:end`);
    if (update.redrawn || update.peopleChanged === 0) throw new Error('a timed redraw did not change people in place');
    samples.push({ total: end - start, script: scripted - start });
  }
  svg.remove();
  return samples;
}

/**
 * The browser's own floor for a first draw of `count` people: the same number of empty
 * `<path>` elements, each with only its `data-outcome`, in one group per array of an svg
 * of the chart's size, timed the same way (start of drawing to after a forced layout).
 * No chart with one element per person can be drawn faster than this on the same machine.
 */
export async function timeBareElements(container: HTMLElement, model: ChartModel, repetitions: number): Promise<DrawSample[]> {
  // The chart's size, from an untimed drawing (no marks, so the chart's own CPU spans stay its own).
  const reference = document.createElementNS(SVG_NAMESPACE, 'svg');
  const { width: frameWidth, height: frameHeight } = drawChart(reference, model);
  const width = String(frameWidth);
  const height = String(frameHeight);
  const samples: DrawSample[] = [];
  for (let run = 0; run < repetitions; run += 1) {
    await nextFrame();
    mark(`${SAMPLE_MARKS.bareElements}:start`);
    const start = performance.now();
    const svg = document.createElementNS(SVG_NAMESPACE, 'svg');
    svg.setAttribute('width', width);
    svg.setAttribute('height', height);
    container.append(svg);
    for (const array of model.arrays) {
      const group = document.createElementNS(SVG_NAMESPACE, 'g');
      for (const person of array.layout.people) {
        const element = document.createElementNS(SVG_NAMESPACE, 'path');
        element.setAttribute('data-outcome', person.group);
        group.appendChild(element);
      }
      svg.appendChild(group);
    }
    const scripted = performance.now();
    forceLayout(svg, container);
    const end = performance.now();
    mark(`${SAMPLE_MARKS.bareElements}:end`);
    samples.push({ total: end - start, script: scripted - start });
    await nextFrame();
    svg.remove();
  }
  return samples;
}
