/**
 * A chart as standalone SVG text, drawn in whatever document is given (the
 * browser's, or jsdom's).
 */
import type { ChartModel } from '../chart-model.ts';
import { drawChart } from './draw-chart.ts';
import type { SvgChartOptions } from './svg-chart-options.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/** Draw `model` in a detached `<svg>` of `document` and serialise it. */
export function chartSvgString(model: ChartModel, document: Document, options: SvgChartOptions = {}): string {
  const svg = document.createElementNS(SVG_NAMESPACE, 'svg');
  drawChart(svg, model, options);
  const Serializer = document.defaultView?.XMLSerializer ?? globalThis.XMLSerializer;
  if (Serializer !== undefined) return new Serializer().serializeToString(svg);
  // A document with no window (for example one made by DOMParser in jsdom): its own serialiser.
  const text = svg.outerHTML;
  return text.startsWith('<svg xmlns=') ? text : text.replace('<svg', `<svg xmlns="${SVG_NAMESPACE}"`);
}
