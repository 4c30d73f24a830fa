/**
 * Where everything of a chart goes — heading, titles, icon grids, legend rows —
 * as plain numbers for a given width and font size. The SVG and PDF renderers
 * both draw this frame, so a chart has the same arrangement on screen and paper.
 */
import type { PersonLook } from '../core/direction.ts';
import type { ChartModel } from './chart-model.ts';
import { type IconArrayLayout, scaleLayout } from './icon-array-layout.ts';
import { type MeasureText, measureDejaVuSans, wrapText } from './text/measure-text.ts';

/** A block of wrapped text; each line has its own baseline. */
export interface FrameText {
  readonly lines: readonly { readonly text: string; readonly x: number; readonly y: number }[];
  readonly fontSize: number;
  readonly bold: boolean;
  /** Body text, or the muted colour for secondary sentences. */
  readonly tone: 'text' | 'muted';
}

/** A legend's sample figure: a group's look, or a ringed figure for the range outline. */
export interface FrameSwatch {
  readonly x: number;
  readonly y: number;
  readonly size: number;
  readonly look: PersonLook | 'uncertain';
}

export interface FrameLegendRow {
  readonly swatch: FrameSwatch | null;
  readonly text: FrameText;
}

export interface FrameArray {
  readonly x: number;
  readonly width: number;
  readonly title: FrameText;
  /** Top-left corner of the grid and the layout scaled to its drawn size. */
  readonly grid: { readonly x: number; readonly y: number; readonly layout: IconArrayLayout };
  readonly legend: readonly FrameLegendRow[];
}

export interface ChartFrame {
  readonly width: number;
  readonly height: number;
  readonly heading: FrameText;
  readonly illustrative: FrameText | null;
  readonly arrays: readonly FrameArray[];
}

export interface FrameOptions {
  /** Total width, in the renderer's units (default 720). */
  readonly width?: number;
  /** Body font size, in the same units (default 14). */
  readonly fontSize?: number;
  /** Ring the people whose group depends on the interval, with a legend line. */
  readonly showRange?: boolean;
  readonly measure?: MeasureText;
}

const LINE_HEIGHT = 1.3;
/** Ascent used to place the first baseline below a block's top (DejaVu Sans ≈ 0.76 em; common practice). */
const ASCENT = 0.8;

/**
 * The frame of a chart: arrays side by side, equal width, grids aligned on one
 * row, titles above and legends below, every block placed for the given width.
 */
export function chartFrame(model: ChartModel, options: FrameOptions = {}): ChartFrame {
  const width = options.width ?? 720;
  const fontSize = options.fontSize ?? 14;
  const measure = options.measure ?? measureDejaVuSans;
  const margin = fontSize * 0.5;
  const text = (
    content: string,
    x: number,
    top: number,
    maxWidth: number,
    size: number,
    bold: boolean,
    tone: FrameText['tone'],
  ) => {
    const lines = wrapText(content, maxWidth, size, bold, measure).map((line, index) => ({
      text: line,
      x,
      y: top + size * ASCENT + index * size * LINE_HEIGHT,
    }));
    return { block: { lines, fontSize: size, bold, tone } satisfies FrameText, bottom: top + lines.length * size * LINE_HEIGHT };
  };

  const inner = width - 2 * margin;
  const heading = text(model.heading, margin, margin, inner, fontSize * 1.3, true, 'text');
  const illustrative =
    model.illustrative === null ? null : text(model.illustrative, margin, heading.bottom, inner, fontSize * 0.9, false, 'muted');
  const titlesTop = (illustrative?.bottom ?? heading.bottom) + fontSize * 0.6;

  const count = model.arrays.length;
  const gap = fontSize * 2;
  const columnWidth = (inner - gap * (count - 1)) / count;
  const titleSize = fontSize * 1.05;
  const titles = model.arrays.map((array, index) =>
    text(array.title, margin + index * (columnWidth + gap), titlesTop, columnWidth, titleSize, true, 'text'),
  );
  const gridTop = Math.max(...titles.map((title) => title.bottom)) + fontSize * 0.6;

  const unitLayout = model.arrays[0]?.layout;
  const unitWidth = unitLayout?.geometry.width ?? 1;
  // Icons no larger than 2.4 em, so a wide column does not give giant figures.
  const scale = Math.min(columnWidth / unitWidth, fontSize * 2.4);
  const gridHeight = (unitLayout?.geometry.height ?? 0) * scale;
  const legendTop = gridTop + gridHeight + fontSize * 0.9;
  const swatchSize = fontSize * 1.3;
  const textIndent = swatchSize + fontSize * 0.5;

  let height = legendTop;
  const arrays: FrameArray[] = model.arrays.map((array, index) => {
    const x = margin + index * (columnWidth + gap);
    const legend: FrameLegendRow[] = [];
    let top = legendTop;
    const row = (content: string, look: FrameSwatch['look'] | null, tone: FrameText['tone']) => {
      const indent = look === null ? 0 : textIndent;
      const placed = text(content, x + indent, top, columnWidth - indent, fontSize, false, tone);
      const blockHeight = Math.max(placed.bottom - top, look === null ? 0 : swatchSize);
      const swatch = look === null ? null : { x, y: top + (blockHeight - swatchSize) / 2, size: swatchSize, look };
      const shift = (blockHeight - (placed.bottom - top)) / 2;
      const block = { ...placed.block, lines: placed.block.lines.map((line) => ({ ...line, y: line.y + shift })) };
      legend.push({ swatch, text: block });
      height = Math.max(height, top + blockHeight);
      top += blockHeight + fontSize * 0.4;
    };
    for (const label of array.labels) row(label.text, label.look, 'text');
    if (array.note !== null) row(array.note, null, 'muted');
    if (array.range !== null) {
      top += fontSize * 0.3;
      row(array.range.text, null, 'muted');
      if (options.showRange === true && array.range.uncertain !== null) row(array.range.outlineText, 'uncertain', 'muted');
    }
    const title = titles[index]?.block ?? { lines: [], fontSize: titleSize, bold: true, tone: 'text' as const };
    return { x, width: columnWidth, title, grid: { x, y: gridTop, layout: scaleLayout(array.layout, scale) }, legend };
  });

  return {
    width,
    height: height + margin,
    heading: heading.block,
    illustrative: illustrative?.block ?? null,
    arrays,
  };
}
