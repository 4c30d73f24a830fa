/**
 * Pixel sizes for raster copies of a chart that print at a given physical size.
 */

const MILLIMETRES_PER_INCH = 25.4;

/**
 * The pixel width of an image that prints `widthMm` wide at `dpi` dots per inch,
 * rounded to the nearest pixel (1 inch = 25.4 mm exactly).
 *
 * @example pngSizeForPrint() // => 2126 (180 mm at 300 dpi)
 */
export function pngSizeForPrint(widthMm = 180, dpi = 300): number {
  if (!(widthMm > 0) || !(dpi > 0)) throw new RangeError(`pngSizeForPrint requires a positive width and resolution`);
  return Math.round((widthMm / MILLIMETRES_PER_INCH) * dpi);
}

/** Width and height in pixels for a chart of the given aspect, printed `widthMm` wide at `dpi`. */
export function pngDimensionsForPrint(
  chart: { readonly width: number; readonly height: number },
  widthMm = 180,
  dpi = 300,
): { width: number; height: number } {
  const width = pngSizeForPrint(widthMm, dpi);
  return { width, height: Math.round((width * chart.height) / chart.width) };
}
