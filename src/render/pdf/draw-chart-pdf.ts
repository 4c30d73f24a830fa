/**
 * A whole chart (heading, titles, icon arrays, legends) drawn on a jsPDF page
 * from the same frame as the SVG renderer, with text in the document's font.
 */
import type { jsPDF } from 'jspdf';
import { type FrameText, chartFrame } from '../chart-frame.ts';
import type { ChartModel } from '../chart-model.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import type { MeasureText } from '../text/measure-text.ts';
import type { ChartPalette } from '../palette.ts';
import { type PdfArrayDrawing, type PdfBox, drawIconArrayPdf } from './draw-icon-array-pdf.ts';
import { ringedSwatch } from '../range-ring.ts';
import { drawFigurePdf, drawRingPdf } from './draw-figure-pdf.ts';

export interface PdfChartOptions {
  /** Body text size in the document's units (default 10 pt). */
  readonly fontSize?: number;
  /** Ring the people whose group depends on where in the interval the truth lies (default off). */
  readonly showRange?: boolean;
}

export interface PdfChartDrawing {
  /** Height used on the page, in the document's units. */
  readonly height: number;
  readonly arrays: readonly PdfArrayDrawing[];
}

/**
 * Draw `model` at `box` (top-left corner and width, in the document's units).
 * Text uses the document's current font family (bold where available).
 */
export function drawChartPdf(
  doc: jsPDF,
  model: ChartModel,
  box: PdfBox,
  palette: ChartPalette,
  options: PdfChartOptions = {},
): PdfChartDrawing {
  const fontName = doc.getFont().fontName;
  const styles: readonly string[] = doc.getFontList()[fontName] ?? [];
  const boldStyle = styles.includes('bold') ? 'bold' : 'normal';
  const pointsPerUnit = doc.internal.scaleFactor;
  const setText = (fontSize: number, bold: boolean) => {
    doc.setFont(fontName, bold ? boldStyle : 'normal');
    doc.setFontSize(fontSize * pointsPerUnit);
  };
  const measure: MeasureText = (text, fontSize, bold) => {
    setText(fontSize, bold);
    return doc.getTextWidth(text);
  };
  const fontSize = options.fontSize ?? 10 / pointsPerUnit;
  const frame = chartFrame(model, { width: box.width, fontSize, showRange: options.showRange === true, measure });
  const write = (block: FrameText | null) => {
    if (block === null) return;
    setText(block.fontSize, block.bold);
    doc.setTextColor(block.tone === 'muted' ? palette.mutedText : palette.text);
    for (const line of block.lines) doc.text(line.text, box.x + line.x, box.y + line.y);
  };

  write(frame.heading);
  write(frame.illustrative);
  const arrays = model.arrays.map((array, index) => {
    const placed = frame.arrays[index];
    if (placed === undefined) {
      return {
        height: 0,
        drawn: { event: 0, prevented: 0, caused: 0, free: 0 },
        looks: { event: 0, helped: 0, harmed: 0, free: 0 },
        outlined: 0,
      };
    }
    write(placed.title);
    const glyph = glyphFor(array.layout.geometry.glyph);
    for (const row of placed.legend) {
      if (row.swatch !== null) {
        const { x, y, size, look } = row.swatch;
        const ringed = look === 'uncertain' ? ringedSwatch(box.x + x, box.y + y, size, palette) : null;
        const figure = ringed?.figure ?? { x: box.x + x, y: box.y + y, size };
        drawFigurePdf(
          doc,
          glyph,
          look === 'uncertain' ? 'free' : look,
          {
            ...figure,
            tileOriginX: figure.x,
            tileOriginY: figure.y,
            tile: figure.size / 4,
            lineWidth: size * palette.outlineWidth,
            cellSize: size,
          },
          palette,
        );
        if (ringed !== null) drawRingPdf(doc, ringed.ring, palette);
      }
      write(row.text);
    }
    return drawIconArrayPdf(
      doc,
      array.layout,
      { x: box.x + placed.grid.x, y: box.y + placed.grid.y, width: placed.grid.layout.geometry.width },
      palette,
      { uncertain: options.showRange === true ? (array.range?.uncertain ?? null) : null, wanted: model.wanted },
    );
  });
  return { height: frame.height, arrays };
}
