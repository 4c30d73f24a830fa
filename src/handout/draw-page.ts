/**
 * Paint a laid-out page on a jsPDF document: text in the embedded font (so it
 * stays selectable and extractable), rules, shaded boxes and outlines, and the charts
 * and enlarged blocks of people through the render module's PDF renderer.
 */
import type { jsPDF } from 'jspdf';
import { glyphFor } from '../render/glyphs/glyph-for.ts';
import { drawChartPdf } from '../render/pdf/draw-chart-pdf.ts';
import { drawFigurePdf } from '../render/pdf/draw-figure-pdf.ts';
import { drawIconArrayPdf } from '../render/pdf/draw-icon-array-pdf.ts';
import type { ChartPalette } from '../render/palette.ts';
import { HANDOUT_FONT_FAMILY } from './handout-fonts.ts';
import type { PageItem } from './page-items.ts';

/** The difference allowed between a chart's planned and drawn height, in millimetres. */
const HEIGHT_TOLERANCE = 0.01;

/** Draw every item; charts are checked to take the height they were planned with. */
export function drawPage(doc: jsPDF, items: readonly PageItem[], palette: ChartPalette): void {
  for (const item of items) {
    switch (item.kind) {
      case 'box':
        doc.setFillColor(item.fill);
        if (item.radius > 0) doc.roundedRect(item.x, item.y, item.width, item.height, item.radius, item.radius, 'F');
        else doc.rect(item.x, item.y, item.width, item.height, 'F');
        break;
      case 'rule':
        doc.setDrawColor(item.colour);
        doc.setLineWidth(item.thickness);
        doc.line(item.x, item.y, item.x + item.width, item.y);
        break;
      case 'outline':
        doc.setDrawColor(item.colour);
        doc.setLineWidth(item.thickness);
        doc.rect(item.x, item.y, item.width, item.height, 'S');
        break;
      case 'people':
        drawIconArrayPdf(doc, item.layout, { x: item.x, y: item.y, width: item.width }, palette, { wanted: item.wanted });
        break;
      case 'text': {
        const { style, lines } = item.block;
        doc.setFont(HANDOUT_FONT_FAMILY, style.bold ? 'bold' : 'normal');
        doc.setFontSize(style.size);
        doc.setTextColor(style.colour);
        for (const line of lines) doc.text(line.text, item.x + line.x, item.y + line.y);
        break;
      }
      case 'figure': {
        const { x, y, size } = item;
        drawFigurePdf(
          doc,
          glyphFor(item.glyph),
          item.look,
          {
            x,
            y,
            size,
            tileOriginX: x,
            tileOriginY: y,
            tile: size / 4,
            lineWidth: size * palette.outlineWidth,
            cellSize: size,
          },
          palette,
        );
        break;
      }
      case 'chart': {
        doc.setFont(HANDOUT_FONT_FAMILY, 'normal');
        const drawn = drawChartPdf(doc, item.model, { x: item.x, y: item.y, width: item.width }, palette, {
          fontSize: item.fontSize,
        });
        if (Math.abs(drawn.height - item.height) > HEIGHT_TOLERANCE) {
          throw new Error(`the chart took ${drawn.height} mm, not the ${item.height} mm planned`);
        }
        break;
      }
    }
  }
}
