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

/** Padding left and right of table text, in millimetres. */
const PAD_X = 1.8;
/** Space between a caption and the edges of its slot, in millimetres. */
const CAPTION_PAD = 2;
/** Tolerance for a line that ends exactly at its column edge, in millimetres. */
const EDGE = 0.01;

/**
 * Share of the width left of the pictures for the key and the outcome names, by
 * number of pictures; less beside arrays of 1000, which are wide and low.
 */
function labelShare(pictures: number, denominator: number): number {
  const thousand = denominator === 1000;
  if (pictures <= 2) return thousand ? 0.25 : 0.34;
  if (pictures === 3) return thousand ? 0.22 : 0.27;
  return 0.22;
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
function keyBlock(
  content: HandoutContent,
  width: number,
  gridTop: number,
  bottom: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const glyph = content.chart.model.arrays[0]?.layout.geometry.glyph ?? 'person';
  const size = lineHeight(styles.list) * 1.05;
  const indent = size + 2;
  const rows = content.chart.key.map((entry) => {
    const text = textBlock(entry.text, width - indent, styles.list, measure);
    const height = Math.max(size, text.height);
    const items: PageItem[] = [
      { kind: 'figure', x: 0, y: (height - size) / 2, size, glyph, look: entry.look },
      ...placeBlock(textItem(text), indent, (height - text.height) / 2),
    ];
    return { items, height };
  });
  const intro = textItem(textBlock(content.chart.keyIntro, width, styles.listMuted, measure));
  const block = stack([intro, ...rows], lineHeight(styles.list) * 0.3);
  // Level with the top of the pictures, or raised beside the option names when taller than the pictures and captions.
  const top = Math.max(0, Math.min(gridTop, bottom - block.height));
  return { items: placeBlock(block, 0, top), height: top + block.height };
}

/** A picture's placement: its own one-array chart frame, and where that frame goes in the block. */
interface PlacedPicture {
  readonly frame: ChartFrame;
  readonly x: number;
  readonly y: number;
  readonly width: number;
}

/** The pictures, key and outcome rows, `width` millimetres wide. */
export function picturesBlock(
  content: HandoutContent,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): PicturesBlock {
  const PAD_Y = settings.rowPadding;
  const model = content.chart.model;
  const first = model.arrays[0];
  const count = model.arrays.length;
  if (first === undefined) return { ok: true, block: { items: [], height: 0 } };
  const measureMm = chartMeasure(measure);
  const labelWidth = width * labelShare(count, model.denominator);
  // Each option has an equal slot: its picture centred in it, its caption and table cells across it.
  const slot = (width - labelWidth) / count;
  const slotLeft = (index: number) => labelWidth + index * slot;
  const fontSize = settings.chartText / POINTS_PER_MM;
  // chartFrame's own margin is half an em on each side of its one array.
  const margin = fontSize * 0.5;
  const unit = first.layout.geometry;
  const column = Math.min(slot - fontSize * 1.2, (model.denominator === 1000 ? settings.cell1000 : settings.cell100) * unit.width);
  const frameWidth = column + 2 * margin;
  const frames = model.arrays.map((array) => chartFrame({ ...model, arrays: [array] }, { width: frameWidth, fontSize, measure: measureMm }));
  if (frames.some((frame) => frame.arrays.some((array) => overflows(array.title, array.x + array.width, measureMm)))) {
    return { ok: false, part: 'options' };
  }
  // The option names as column headings across their slots, bottom-aligned over the pictures.
  const titleStyle: TextStyle = { ...styles.tableBold, size: settings.chartText * 1.05 };
  const titles = content.chart.titles.map((title) => centred(title, slot - 2 * CAPTION_PAD, titleStyle, measure));
  const titlesHeight = Math.max(0, ...titles.map((title) => title.height));
  const gridOf = (frame: ChartFrame) => frame.arrays[0]?.grid.y ?? 0;
  const gridTop = titlesHeight + Math.max(...frames.map(gridOf));
  const pictures: PlacedPicture[] = frames.map((frame, index) => ({
    frame,
    x: slotLeft(index) + (slot - frameWidth) / 2,
    y: gridTop - gridOf(frame),
    width: frameWidth,
  }));
  const firstFrame = frames[0] as ChartFrame;
  const picturesBottom = gridTop + firstFrame.height - gridOf(firstFrame);
  const gridBottom = gridTop + (firstFrame.arrays[0]?.grid.layout.geometry.height ?? 0);

  // Under each picture, its option's two frames in words, across its slot.
  const captions = content.chart.captions.map((caption) => textBlock(caption, slot - 2 * CAPTION_PAD, styles.list, measure));
  const captionsBottom = picturesBottom + Math.max(0, ...captions.map((caption) => caption.height));
  const key = keyBlock(content, labelWidth - PAD_X, gridTop, Math.max(gridBottom, captionsBottom), styles, measure);
  const items: PageItem[] = [
    ...pictures.map((picture, index): PageItem => ({
      kind: 'chart',
      x: picture.x,
      y: picture.y,
      width: picture.width,
      height: picture.frame.height,
      model: { ...model, arrays: model.arrays.slice(index, index + 1) },
      fontSize,
    })),
    ...key.items,
    ...titles.flatMap((title, index) => textItem(title, slotLeft(index) + CAPTION_PAD, titlesHeight - title.height).items),
  ];

  captions.forEach((caption, index) => items.push(...textItem(caption, slotLeft(index) + CAPTION_PAD, picturesBottom).items));
  // The key may run on beside the captions; the table starts below both.
  let top = Math.max(captionsBottom, key.height + lineHeight(styles.list) * 0.3);
  if (content.table.sections.length === 0 && content.table.noSideEffects === null) {
    return { ok: true, block: { items, height: top } };
  }

  top += lineHeight(styles.list) * 0.45;
  items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.strongRule, thickness: 0.4 });

  const cellWidth = slot - 2 * PAD_X;
  const cellLeft = (index: number) => slotLeft(index) + PAD_X;
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
          ...found.cells.map((cell, column) => ({ block: cellBlock(cell, cellWidth, styles, measure), x: cellLeft(column) })),
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
