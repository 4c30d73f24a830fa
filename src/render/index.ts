/**
 * The people charts (icon arrays): layout, chart model, palette, glyphs and the
 * SVG and PDF renderers. Browser-safe; `renderChartSvg` (jsdom, for Node) is in
 * `./node.ts`.
 *
 * From a computed topic:
 *   const model = outcomeChart(topicResult, 'stroke');
 *   drawChart(svgElement, model);            // in the page
 *   updateChart(svgElement, nextModel);      // live redraw, only changed people
 *   drawChartPdf(doc, model, { x: 15, y: 20, width: 180 }, colourPalette);
 */
export { FILL_ORDER, fillSequence } from './fill-sequence.ts';
export {
  DEFAULT_SCATTER_SEED,
  iconArrayGeometry,
  iconArrayLayout,
  scaleLayout,
  type Arrangement,
  type GlyphName,
  type IconArrayGeometry,
  type IconArrayLayout,
  type IconArrayLayoutOptions,
  type PersonPlacement,
} from './icon-array-layout.ts';
export { mulberry32, seededPermutation } from './seeded-random.ts';
export { isUncertain, uncertainRanks, type RankSpan } from './uncertain-people.ts';
export {
  outcomeChart,
  pairChart,
  type ChartArray,
  type ChartLabel,
  type ChartModel,
  type ChartOptions,
  type ChartRange,
  type PairInput,
} from './chart-model.ts';
export { chartFrame, type ChartFrame, type FrameArray, type FrameOptions, type FrameText } from './chart-frame.ts';
export { chartMessagesEn, type ChartMessages } from './messages/en.ts';
export {
  OKABE_ITO,
  PALETTES,
  blackAndWhitePalette,
  colourPalette,
  type ChartPalette,
  type GroupStyle,
  type PatternName,
} from './palette.ts';
export { WCAG_THRESHOLDS, contrastRatio, hexChannels, relativeLuminance } from './colour/contrast.ts';
export { MACHADO_2009, colourDifference, greyscale, simulateVision, type VisionDeficiency } from './colour/colour-vision.ts';
export { compactPersonGlyph } from './glyphs/compact-person.ts';
export { personGlyph } from './glyphs/person.ts';
export { glyphFor } from './glyphs/glyph-for.ts';
export type { Glyph, PathContext } from './glyphs/path-context.ts';
export { SvgPathContext, glyphPath, placeGlyphPath } from './glyphs/svg-path-context.ts';
export { measureDejaVuSans, wrapText, type MeasureText } from './text/measure-text.ts';
export { drawChart } from './svg/draw-chart.ts';
export { updateChart, type ChartUpdate } from './svg/update-chart.ts';
export { chartSvgString } from './svg/chart-svg-string.ts';
export type { SvgChartOptions } from './svg/svg-chart-options.ts';
export { drawIconArrayPdf, type PdfArrayDrawing, type PdfArrayOptions, type PdfBox } from './pdf/draw-icon-array-pdf.ts';
export { drawChartPdf, type PdfChartDrawing, type PdfChartOptions } from './pdf/draw-chart-pdf.ts';
export { pngDimensionsForPrint, pngSizeForPrint } from './export/print-size.ts';
export { svgForExport, type SvgExportOptions } from './export/svg-for-export.ts';
