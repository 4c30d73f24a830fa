/**
 * The headline outcome's pictures with every outcome lined up under them: the
 * render module's chart frame on the right (one array per option, same size,
 * drawn by its PDF renderer), the key to the figures on the left, under each
 * picture its option's numbers in words, and below, one row per other outcome
 * with each option's number straight under that option's picture.
 */
import { chartFrame } from '../render/chart-frame.ts';
import type { ChartFrame, FrameText } from '../render/chart-frame.ts';
import type { MeasureText } from '../render/text/measure-text.ts';
import type { FitSettings } from './fit-settings.ts';
import type { HandoutContent, TableCell } from './handout-content.ts';
import type { HandoutStyles } from './handout-styles.ts';
import { type Block, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { type MeasureWidth, POINTS_PER_MM, type TextBlock, type TextStyle, lineHeight, textBlock } from './text-layout.ts';

/** The block, or the part whose words cannot fit their column. */
export type PicturesBlock =
  | { readonly ok: true; readonly block: Block }
  | { readonly ok: false; readonly part: 'options' };

/** Padding around table text, in millimetres. */
const PAD_X = 1.8;
const PAD_Y = 1.05;
/** Tolerance for a line that ends exactly at its column edge, in millimetres. */
const EDGE = 0.01;

/**
 * Share of the width left of the pictures for the key and the outcome names, by
 * number of pictures; less beside arrays of 1000, which are wide and low.
 */
function labelShare(pictures: number, denominator: number): number {
  const thousand = denominator === 1000;
  if (pictures <= 2) return thousand ? 0.25 : 0.34;
  if (pictures === 3) return thousand ? 0.21 : 0.27;
  return thousand ? 0.19 : 0.23;
}

/** The render module's measure (sizes in millimetres) from the handout's (sizes in points). */
export function chartMeasure(measure: MeasureWidth): MeasureText {
  return (text, fontSize, bold) => measure(text, fontSize * POINTS_PER_MM, bold);
}

function overflows(block: FrameText, right: number, measure: MeasureText): boolean {
  return block.lines.some((line) => line.x + measure(line.text, block.fontSize, block.bold) > right + EDGE);
}

/** A text block with each line centred in `width`. */
function centred(text: string, width: number, style: TextStyle, measure: MeasureWidth): TextBlock {
  const block = textBlock(text, width, style, measure);
  return {
    ...block,
    lines: block.lines.map((line) => ({ ...line, x: (width - measure(line.text, style.size, style.bold)) / 2 })),
  };
}

/** A cell's value, broken after its band word ("very common:" / "13 in 100") when it needs two lines. */
function cellValue(text: string, width: number, style: TextStyle, measure: MeasureWidth): TextBlock {
  const split = text.indexOf(': ');
  if (split === -1 || measure(text, style.size, style.bold) <= width) return centred(text, width, style, measure);
  const first = centred(text.slice(0, split + 1), width, style, measure);
  const second = centred(text.slice(split + 2), width, style, measure);
  return {
    ...first,
    lines: [...first.lines, ...second.lines.map((line) => ({ ...line, y: line.y + first.height }))],
    height: first.height + second.height,
    width: Math.max(first.width, second.width),
  };
}

function cellBlock(cell: TableCell, width: number, styles: HandoutStyles, measure: MeasureWidth): Block {
  const value = cellValue(cell.value, width, styles.tableBold, measure);
  if (cell.note === null) return textItem(value);
  const note = centred(cell.note, width, styles.tableNote, measure);
  return { items: [...textItem(value).items, ...textItem(note, 0, value.height).items], height: value.height + note.height };
}

/** The key: what each look of figure means, each line led by a figure drawn as in the pictures. */
function keyBlock(content: HandoutContent, width: number, frame: ChartFrame, styles: HandoutStyles, measure: MeasureWidth): Block {
  const glyph = content.chart.model.arrays[0]?.layout.geometry.glyph ?? 'person';
  const size = lineHeight(styles.list) * 1.05;
  const indent = size + 2;
  const rows = content.chart.key.map((entry) => {
    const text = textBlock(entry.text, width - indent, styles.list, measure);
    const height = Math.max(size, text.height);
    const items: PageItem[] = [
      { kind: 'figure', x: 0, y: (height - size) / 2, size, glyph, group: entry.group },
      ...placeBlock(textItem(text), indent, (height - text.height) / 2),
    ];
    return { items, height };
  });
  const intro = textItem(textBlock(content.chart.keyIntro, width, styles.listMuted, measure));
  const block = stack([intro, ...rows], lineHeight(styles.list) * 0.3);
  // Level with the top of the pictures, or raised beside the option names when taller than the pictures.
  const grid = frame.arrays[0]?.grid;
  const gridTop = grid?.y ?? 0;
  const gridBottom = gridTop + (grid?.layout.geometry.height ?? 0);
  const top = Math.max(0, Math.min(gridTop, gridBottom - block.height));
  return { items: placeBlock(block, 0, top), height: top + block.height };
}

/** The pictures, key and outcome rows, `width` millimetres wide. */
export function picturesBlock(
  content: HandoutContent,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): PicturesBlock {
  const model = content.chart.model;
  const first = model.arrays[0];
  const count = model.arrays.length;
  if (first === undefined) return { ok: true, block: { items: [], height: 0 } };
  const measureMm = chartMeasure(measure);
  const labelWidth = width * labelShare(count, model.denominator);
  const area = width - labelWidth;
  const fontSize = settings.chartText / POINTS_PER_MM;
  // chartFrame's own spacing: half an em of margin, two ems between arrays.
  const margin = fontSize * 0.5;
  const gap = fontSize * 2;
  const unit = first.layout.geometry;
  const widest = (area - 2 * margin - gap * (count - 1)) / count;
  const column = Math.min(widest, (model.denominator === 1000 ? settings.cell1000 : settings.cell100) * unit.width);
  const chartWidth = 2 * margin + count * column + (count - 1) * gap;
  const chartX = labelWidth + (area - chartWidth) / 2;
  const frame = chartFrame(model, { width: chartWidth, fontSize, measure: measureMm });
  if (frame.arrays.some((array) => overflows(array.title, array.x + array.width, measureMm))) return { ok: false, part: 'options' };

  const key = keyBlock(content, labelWidth - PAD_X, frame, styles, measure);
  const items: PageItem[] = [
    { kind: 'chart', x: chartX, y: 0, width: chartWidth, height: frame.height, model, fontSize },
    ...key.items,
  ];
  let top = Math.max(frame.height, key.height + lineHeight(styles.list) * 0.5);

  // Under each picture, its option's two frames in words, from the picture's left edge to the next picture.
  const pitch = column + gap;
  const captions = content.chart.captions.map((caption, index) => {
    const x = chartX + (frame.arrays[index]?.x ?? 0);
    const captionWidth = Math.min(pitch - gap * 0.3, width - x);
    return { block: textBlock(caption, captionWidth, styles.list, measure), x };
  });
  for (const caption of captions) items.push(...textItem(caption.block, caption.x, top).items);
  top += Math.max(0, ...captions.map((caption) => caption.block.height));
  if (content.table.sections.length === 0 && content.table.noSideEffects === null) {
    return { ok: true, block: { items, height: top } };
  }

  top += lineHeight(styles.list) * 0.6;
  items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.strongRule, thickness: 0.4 });

  const cellWidth = (index: number) => (frame.arrays[index]?.width ?? column) + gap * 0.7 - 2 * PAD_X;
  const cellLeft = (index: number) => {
    const array = frame.arrays[index];
    const centre = chartX + (array === undefined ? 0 : array.x + array.width / 2);
    return centre - cellWidth(index) / 2;
  };
  const row = (blocks: readonly { readonly block: Block; readonly x: number }[], shaded: boolean) => {
    const height = Math.max(...blocks.map((cell) => cell.block.height)) + 2 * PAD_Y;
    if (shaded) items.push({ kind: 'box', x: 0, y: top, width, height, fill: styles.colours.shade, radius: 0 });
    for (const cell of blocks) items.push(...placeBlock(cell.block, cell.x, top + PAD_Y));
    top += height;
  };
  for (const part of content.table.sections) {
    if (part.heading !== null) {
      const heading = textBlock(part.heading, width - 2 * PAD_X, { ...styles.tableBold, colour: styles.colours.muted }, measure);
      top += PAD_Y * 0.5;
      row([{ block: textItem(heading), x: PAD_X }], false);
      items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.rule, thickness: 0.25 });
    }
    part.rows.forEach((found, index) => {
      const label = textBlock(found.outcome, labelWidth - 2 * PAD_X, found.isHeadline ? styles.tableBold : styles.table, measure);
      row(
        [
          { block: textItem(label), x: PAD_X },
          ...found.cells.map((cell, column) => ({ block: cellBlock(cell, cellWidth(column), styles, measure), x: cellLeft(column) })),
        ],
        index % 2 === 1,
      );
    });
  }
  items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.strongRule, thickness: 0.4 });
  top += 0.4;
  if (content.table.noSideEffects !== null) {
    const note = textBlock(content.table.noSideEffects, width, styles.listMuted, measure);
    top += PAD_Y;
    items.push(...textItem(note, 0, top).items);
    top += note.height;
  }
  return { ok: true, block: { items, height: top } };
}
