/**
 * Exporting a people chart: standalone SVG text that prints 180 mm wide, and a PNG that
 * prints at the same width at 300 dpi, drawn from that SVG on a canvas in the browser.
 */
import type { ChartModel } from '../../render/chart-model.ts';
import { pngDimensionsForPrint } from '../../render/export/print-size.ts';
import { svgForExport } from '../../render/export/svg-for-export.ts';
import { chartSvgString } from '../../render/svg/chart-svg-string.ts';
import { withPrintResolution } from './png-density.ts';

export const EXPORT_WIDTH_MM = 180;
export const EXPORT_DPI = 300;
/** The width, in CSS pixels, the exported chart is laid out at (its text wraps for this width). */
const LAYOUT_WIDTH = 720;

/** The chart as a standalone SVG file's text. */
export function chartSvgFile(model: ChartModel, document: Document): string {
  return svgForExport(chartSvgString(model, document, { width: LAYOUT_WIDTH, idPrefix: `export-${model.id}` }), {
    widthMm: EXPORT_WIDTH_MM,
  });
}

/** Width and height of the SVG's view box. */
function viewBoxSize(svgText: string): { width: number; height: number } {
  const found = /viewBox="([^"]*)"/.exec(svgText);
  const [, , width, height] = (found?.[1] ?? '').trim().split(/[\s,]+/).map(Number);
  if (width === undefined || height === undefined || !(width > 0) || !(height > 0)) throw new RangeError('chart has no view box');
  return { width, height };
}

function loadImage(url: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const image = new Image();
    image.onload = () => resolve(image);
    image.onerror = () => reject(new Error('the chart could not be drawn as an image'));
    image.src = url;
  });
}

/** The chart as PNG bytes that print 180 mm wide at 300 dpi (2126 pixels wide). */
export async function chartPngFile(model: ChartModel, document: Document): Promise<Uint8Array> {
  const svgText = chartSvgString(model, document, { width: LAYOUT_WIDTH, idPrefix: `export-${model.id}` });
  const size = viewBoxSize(svgText);
  const pixels = pngDimensionsForPrint(size, EXPORT_WIDTH_MM, EXPORT_DPI);
  // Size the image itself at the target pixels, so the vector drawing is rasterised sharp.
  const sized = svgText.replace(/<svg\b[^>]*>/, (root) =>
    root.replace(/\swidth="[^"]*"/, ` width="${pixels.width}"`).replace(/\sheight="[^"]*"/, ` height="${pixels.height}"`),
  );
  const url = URL.createObjectURL(new Blob([sized], { type: 'image/svg+xml' }));
  try {
    const image = await loadImage(url);
    const canvas = document.createElement('canvas');
    canvas.width = pixels.width;
    canvas.height = pixels.height;
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('this browser cannot draw images');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, pixels.width, pixels.height);
    context.drawImage(image, 0, 0, pixels.width, pixels.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (blob === null) throw new Error('the image could not be made');
    return withPrintResolution(new Uint8Array(await blob.arrayBuffer()), EXPORT_DPI);
  } finally {
    URL.revokeObjectURL(url);
  }
}
