/**
 * Exporting a people chart: standalone SVG text that prints 180 mm wide, and a PNG that
 * prints at the same width at 300 dpi, drawn from that SVG on a canvas in the browser.
 */
import type { ChartModel } from '../../render/chart-model.ts';
import { type ChartExportOptions, EXPORT_WIDTH_MM, exportDrawing } from '../../render/export/chart-svg-file.ts';
import { pngDimensionsForPrint } from '../../render/export/print-size.ts';
import { chartSvgString } from '../../render/svg/chart-svg-string.ts';
import { withPrintResolution } from './png-density.ts';
import { svgTextToPng } from './svg-to-png.ts';

export { type ChartExportOptions, chartSvgFile } from '../../render/export/chart-svg-file.ts';
export const EXPORT_DPI = 300;

/** Width and height of the SVG's view box. */
function viewBoxSize(svgText: string): { width: number; height: number } {
  const found = /viewBox="([^"]*)"/.exec(svgText);
  const [, , width, height] = (found?.[1] ?? '')
    .trim()
    .split(/[\s,]+/)
    .map(Number);
  if (width === undefined || height === undefined || !(width > 0) || !(height > 0)) throw new RangeError('chart has no view box');
  return { width, height };
}

/** The chart as PNG bytes that print 180 mm wide at 300 dpi (2126 pixels wide). */
export async function chartPngFile(model: ChartModel, document: Document, options: ChartExportOptions = {}): Promise<Uint8Array> {
  const svgText = chartSvgString(model, document, exportDrawing(model, options));
  const size = viewBoxSize(svgText);
  const pixels = pngDimensionsForPrint(size, EXPORT_WIDTH_MM, EXPORT_DPI);
  // Size the image itself at the target pixels, so the vector drawing is rasterised sharp.
  const sized = svgText.replace(/<svg\b[^>]*>/, (root) =>
    root.replace(/\swidth="[^"]*"/, ` width="${pixels.width}"`).replace(/\sheight="[^"]*"/, ` height="${pixels.height}"`),
  );
  return withPrintResolution(await svgTextToPng(sized, document, pixels, 'chart'), EXPORT_DPI);
}
