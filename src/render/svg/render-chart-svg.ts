/**
 * `renderChartSvg`: a chart as SVG text in Node or the browser. Without a
 * document it draws in a fresh jsdom document, so the command line needs no browser.
 * (This module imports jsdom; browser code uses `chartSvgString` or `drawChart`.)
 */
import { JSDOM } from 'jsdom';
import type { ChartModel } from '../chart-model.ts';
import { chartSvgString } from './chart-svg-string.ts';
import type { SvgChartOptions } from './svg-chart-options.ts';

export interface RenderChartSvgOptions extends SvgChartOptions {
  /** A document to draw in; default a new jsdom document. */
  readonly document?: Document;
}

/**
 * The chart as standalone SVG text. Same model and options give byte-identical output.
 *
 * @example renderChartSvg(pairChart({ perPeople })).startsWith('<svg') // => true
 */
export function renderChartSvg(model: ChartModel, options: RenderChartSvgOptions = {}): string {
  const { document, ...drawing } = options;
  if (document !== undefined) return chartSvgString(model, document, drawing);
  const dom = new JSDOM('<!DOCTYPE html><html><body></body></html>');
  try {
    return chartSvgString(model, dom.window.document, drawing);
  } finally {
    dom.window.close();
  }
}
