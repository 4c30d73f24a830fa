/** A shared jsdom window for renderer tests: parse SVG text, or draw into a live `<svg>`. */
import { JSDOM } from 'jsdom';
import type { ChartModel } from '../../../src/render/chart-model.ts';
import { drawChart } from '../../../src/render/svg/draw-chart.ts';
import type { SvgChartOptions } from '../../../src/render/svg/svg-chart-options.ts';

const window = new JSDOM('<!DOCTYPE html><html><body></body></html>').window;

/** The shared test document. */
export const testDocument: Document = window.document;

export function parseSvg(text: string): SVGSVGElement {
  const parsed = new window.DOMParser().parseFromString(text, 'image/svg+xml');
  const errors = parsed.getElementsByTagName('parsererror');
  if (errors.length > 0) throw new Error(`SVG does not parse: ${errors[0]?.textContent ?? ''}`);
  return parsed.documentElement as unknown as SVGSVGElement;
}

/** Draw a chart into a new `<svg>` in the page body. */
export function drawIntoPage(model: ChartModel, options: SvgChartOptions = {}): SVGSVGElement {
  const svg = testDocument.createElementNS('http://www.w3.org/2000/svg', 'svg');
  testDocument.body.replaceChildren(svg);
  drawChart(svg, model, options);
  return svg;
}

/**
 * People per group under `root`: the `data-count`s of the elements of each `data-outcome`
 * added up, an element without a count drawing one person.
 */
export function outcomeCounts(root: Element): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const element of root.querySelectorAll('[data-outcome]')) {
    const group = element.getAttribute('data-outcome') ?? '';
    counts[group] = (counts[group] ?? 0) + Number(element.getAttribute('data-count') ?? 1);
  }
  return counts;
}

/** Every person `root` draws: the sum of {@link outcomeCounts}. */
export function peopleCount(root: Element): number {
  return Object.values(outcomeCounts(root)).reduce((sum, count) => sum + count, 0);
}

/** The text of a `<text>` element, its lines joined by spaces. */
export function lineText(element: Element): string {
  return [...element.querySelectorAll('tspan')].map((line) => line.textContent).join(' ');
}
