/**
 * A chart's SVG text as a standalone file: an XML declaration, and a physical
 * size in millimetres so it prints at the intended width.
 */

export interface SvgExportOptions {
  /** Printed width in millimetres (default 180); the height keeps the chart's aspect. */
  readonly widthMm?: number;
}

/**
 * Standalone SVG file text from the output of `renderChartSvg` or `chartSvgString`.
 *
 * @example svgForExport('<svg viewBox="0 0 720 360" width="720" height="360"></svg>')
 * // => '<?xml version="1.0" encoding="UTF-8"?>\n<svg viewBox="0 0 720 360" width="180mm" height="90mm"></svg>\n'
 */
export function svgForExport(svgText: string, options: SvgExportOptions = {}): string {
  const widthMm = options.widthMm ?? 180;
  const root = /<svg\b[^>]*>/.exec(svgText);
  const viewBox = root === null ? null : /\bviewBox="([^"]*)"/.exec(root[0]);
  const numbers = (viewBox?.[1] ?? '')
    .trim()
    .split(/[\s,]+/)
    .map(Number);
  const [, , boxWidth, boxHeight] = numbers;
  if (root === null || boxWidth === undefined || boxHeight === undefined || !(boxWidth > 0) || !(boxHeight > 0)) {
    throw new RangeError('svgForExport requires an <svg> root with a viewBox');
  }
  const heightMm = Math.round(((widthMm * boxHeight) / boxWidth) * 100) / 100;
  const sized = root[0]
    .replace(/\swidth="[^"]*"/, ` width="${widthMm}mm"`)
    .replace(/\sheight="[^"]*"/, ` height="${heightMm}mm"`);
  const body = svgText.slice(0, root.index) + sized + svgText.slice(root.index + root[0].length);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${body.trim()}\n`;
}
