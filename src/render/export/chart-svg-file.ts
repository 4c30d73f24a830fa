/**
 * A people chart as the standalone SVG file the app saves and the command line writes:
 * laid out 720 CSS pixels wide (its text wraps for that width), ids prefixed `export-`, and
 * sized to print 180 mm wide. One function for both, so they write the same bytes.
 */
import type { ChartModel } from '../chart-model.ts';
import { chartSvgString } from '../svg/chart-svg-string.ts';
import type { SvgChartOptions } from '../svg/svg-chart-options.ts';
import { svgForExport } from './svg-for-export.ts';

export const EXPORT_WIDTH_MM = 180;
/** The width, in CSS pixels, the exported chart is laid out at. */
const LAYOUT_WIDTH = 720;

/** What an exported chart shows besides its people: the range outline, when it is on screen. */
export interface ChartExportOptions {
  readonly showRange?: boolean;
}

/** The drawing options of an exported chart (the SVG file and the PNG drawn from it). */
export function exportDrawing(model: ChartModel, options: ChartExportOptions = {}): SvgChartOptions {
  return { width: LAYOUT_WIDTH, idPrefix: `export-${model.id}`, showRange: options.showRange === true };
}

/** The chart as a standalone SVG file's text, drawn in `document` (the browser's, or `svgTextDocument()`). */
export function chartSvgFile(model: ChartModel, document: Document, options: ChartExportOptions = {}): string {
  return svgForExport(chartSvgString(model, document, exportDrawing(model, options)), { widthMm: EXPORT_WIDTH_MM });
}
