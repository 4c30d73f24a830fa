/**
 * One outcome's pictures: the render module's chart frame on the right (one array
 * per option, same size, drawn by its PDF renderer), the key to the figures on the
 * left, and under each picture its option's numbers in words. Every outcome's
 * pictures use the same columns and the same cell size, so a side effect's pictures
 * are at the same scale as the benefit's.
 */
import { chartFrame } from '../render/chart-frame.ts';
import type { ChartFrame, FrameText } from '../render/chart-frame.ts';
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import type { MeasureText } from '../render/text/measure-text.ts';
import type { FitSettings } from './fit-settings.ts';
import type { OutcomePictures } from './outcome-sections.ts';
import type { HandoutStyles } from './handout-styles.ts';
import { type Block, EMPTY_BLOCK, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { type MeasureWidth, POINTS_PER_MM, type TextBlock, type TextStyle, lineHeight, textBlock } from './text-layout.ts';

/** The block, or the part whose words cannot fit their column. */
export type PicturesBlock = { readonly ok: true; readonly block: Block } | { readonly ok: false; readonly part: 'options' };

/** Padding left and right of table text, in millimetres. */
export const PAD_X = 1.8;
/** Space between a caption and the edges of its slot, in millimetres. */
const CAPTION_PAD = 2;
/** Tolerance for a line that ends exactly at its column edge, in millimetres. */
const EDGE = 0.01;
/** The narrowest caption set beside an enlarged block; narrower slots put the block under the caption, in millimetres. */
const CAPTION_BESIDE_CLOSE_UP = 30;
/** Space between an enlarged block and its caption, in millimetres. */
const CLOSE_UP_GAP = 3;
/** The outlines of a block and of its enlargement, in millimetres. */
const OUTLINE_WIDTH = 0.35;
/** How far an outline stands off the people it frames, in cells (inside the gutter between blocks). */
const OUTLINE_OFFSET = 0.4;

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
export function centred(text: string, width: number, style: TextStyle, measure: MeasureWidth): TextBlock {
  const block = textBlock(text, width, style, measure);
  return {
    ...block,
    lines: block.lines.map((line) => ({ ...line, x: (width - measure(line.text, style.size, style.bold)) / 2 })),
  };
}

/** The key: what each look of figure means, each line led by a figure drawn as in the pictures. */
function keyBlock(
  pictures: OutcomePictures,
  keyIntro: string | null,
  width: number,
  gridTop: number,
  bottom: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const glyph = pictures.model.arrays[0]?.layout.geometry.glyph ?? 'person';
  const size = lineHeight(styles.list) * 1.05;
  const indent = size + 2;
  const rows = pictures.key.map((entry) => {
    const text = textBlock(entry.text, width - indent, styles.list, measure);
    const height = Math.max(size, text.height);
    const items: PageItem[] = [
      { kind: 'figure', x: 0, y: (height - size) / 2, size, glyph, look: entry.look },
      ...placeBlock(textItem(text), indent, (height - text.height) / 2),
    ];
    return { items, height };
  });
  const intro = keyIntro === null ? EMPTY_BLOCK : textItem(textBlock(keyIntro, width, styles.listMuted, measure));
  const block = stack([intro, ...rows], lineHeight(styles.list) * 0.3);
  // Level with the top of the pictures, or raised beside the option names when taller than the pictures and captions.
  const top = Math.max(0, Math.min(gridTop, bottom - block.height));
  return { items: placeBlock(block, 0, top), height: top + block.height };
}

/** A rectangle's outline around the people of `block` in a placed, scaled layout. */
export function blockOutline(layout: IconArrayLayout, block: number, x: number, y: number, colour: string): PageItem {
  const { cellSize, iconSize } = layout.geometry;
  const people = layout.people.filter((person) => person.block === block);
  const offset = OUTLINE_OFFSET * cellSize;
  const left = Math.min(...people.map((person) => person.x)) - offset;
  const top = Math.min(...people.map((person) => person.y)) - offset;
  const right = Math.max(...people.map((person) => person.x)) + iconSize + offset;
  const bottom = Math.max(...people.map((person) => person.y)) + iconSize + offset;
  return {
    kind: 'outline',
    x: x + left,
    y: y + top,
    width: right - left,
    height: bottom - top,
    colour,
    thickness: OUTLINE_WIDTH,
  };
}

/** The enlarged block: its people at the close-up's cell size, outlined as the block is in the picture, and its label under it. */
function closeUpFigure(
  layout: IconArrayLayout,
  label: string,
  wanted: boolean,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const width = layout.geometry.width * settings.closeUpCell;
  const scale = width / layout.geometry.width;
  const offset = OUTLINE_OFFSET * settings.closeUpCell;
  const boxWidth = width + 2 * offset;
  const boxHeight = layout.geometry.height * scale + 2 * offset;
  const text = centred(label, boxWidth, styles.tableNote, measure);
  const items: PageItem[] = [
    { kind: 'people', x: offset, y: offset, width, layout, wanted },
    { kind: 'outline', x: 0, y: 0, width: boxWidth, height: boxHeight, colour: styles.colours.text, thickness: OUTLINE_WIDTH },
    ...textItem(text, 0, boxHeight + 0.8).items,
  ];
  return { items, height: boxHeight + 0.8 + text.height };
}

/**
 * Under a picture: its caption and any note in words; for a picture of 1000, the enlarged
 * block beside them (or under them where the slot is narrow).
 */
export function underPicture(
  caption: string,
  note: string | null,
  closeUp: { readonly layout: IconArrayLayout; readonly label: string } | null,
  width: number,
  wanted: boolean,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const gap = lineHeight(styles.list) * 0.3;
  const captionOf = (columnWidth: number) => textItem(textBlock(caption, columnWidth, styles.list, measure));
  const noteBlock = note === null ? EMPTY_BLOCK : textItem(textBlock(note, width, styles.listMuted, measure));
  if (closeUp === null) return stack([captionOf(width), noteBlock], gap);
  const figure = closeUpFigure(closeUp.layout, closeUp.label, wanted, settings, styles, measure);
  const figureWidth = closeUp.layout.geometry.width * settings.closeUpCell + 2 * OUTLINE_OFFSET * settings.closeUpCell;
  const besideWidth = width - figureWidth - CLOSE_UP_GAP;
  if (besideWidth >= CAPTION_BESIDE_CLOSE_UP) {
    // The block under the picture's outlined block, the caption beside it, any note across both.
    const text = captionOf(besideWidth);
    const top: Block = {
      items: [...figure.items, ...placeBlock(text, figureWidth + CLOSE_UP_GAP, 0)],
      height: Math.max(figure.height, text.height),
    };
    return stack([top, noteBlock], gap);
  }
  const centredFigure: Block = { items: placeBlock(figure, Math.max(0, (width - figureWidth) / 2), 0), height: figure.height };
  return stack([captionOf(width), noteBlock, centredFigure], gap);
}

/** A picture's placement: its own one-array chart frame, and where that frame goes in the block. */
interface PlacedPicture {
  readonly frame: ChartFrame;
  readonly x: number;
  readonly y: number;
  readonly width: number;
}

/** The columns every outcome's pictures and the table share: the label column, then one equal slot per option. */
export interface Columns {
  readonly labelWidth: number;
  readonly slot: number;
}

/** The columns for `count` options on pictures of `denominator`, `width` millimetres wide. */
export function columnsOf(count: number, denominator: number, width: number): Columns {
  const labelWidth = width * labelShare(count, denominator);
  return { labelWidth, slot: (width - labelWidth) / Math.max(1, count) };
}

/** The left edge of option `index`'s slot. */
export function slotLeft(columns: Columns, index: number): number {
  return columns.labelWidth + index * columns.slot;
}

/**
 * One outcome's pictures with the option names over them, the key beside them and
 * the captions under them, `width` millimetres wide.
 *
 * @param keyIntro - what one figure is, before the key (the first outcome's only), or null
 */
export function picturesBlock(
  pictures: OutcomePictures,
  titleTexts: readonly string[],
  keyIntro: string | null,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): PicturesBlock {
  const model = pictures.model;
  const first = model.arrays[0];
  const count = model.arrays.length;
  if (first === undefined) return { ok: true, block: { items: [], height: 0 } };
  const measureMm = chartMeasure(measure);
  const columns = columnsOf(count, model.denominator, width);
  const { labelWidth, slot } = columns;
  const left = (index: number) => slotLeft(columns, index);
  const fontSize = settings.chartText / POINTS_PER_MM;
  // chartFrame's own margin is half an em on each side of its one array.
  const margin = fontSize * 0.5;
  const unit = first.layout.geometry;
  const column = Math.min(
    slot - fontSize * 1.2,
    (model.denominator === 1000 ? settings.cell1000 : settings.cell100) * unit.width,
  );
  const frameWidth = column + 2 * margin;
  const frames = model.arrays.map((array) =>
    chartFrame({ ...model, arrays: [array] }, { width: frameWidth, fontSize, measure: measureMm }),
  );
  if (frames.some((frame) => frame.arrays.some((array) => overflows(array.title, array.x + array.width, measureMm)))) {
    return { ok: false, part: 'options' };
  }
  // The option names as column headings across their slots, bottom-aligned over the pictures.
  const titleStyle: TextStyle = { ...styles.tableBold, size: settings.chartText * 1.05 };
  const titles = titleTexts.map((title) => centred(title, slot - 2 * CAPTION_PAD, titleStyle, measure));
  const titlesHeight = Math.max(0, ...titles.map((title) => title.height));
  const gridOf = (frame: ChartFrame) => frame.arrays[0]?.grid.y ?? 0;
  const gridTop = titlesHeight + Math.max(...frames.map(gridOf));
  const placed: PlacedPicture[] = frames.map((frame, index) => ({
    frame,
    x: left(index) + (slot - frameWidth) / 2,
    y: gridTop - gridOf(frame),
    width: frameWidth,
  }));
  const firstFrame = frames[0] as ChartFrame;
  const picturesBottom = gridTop + firstFrame.height - gridOf(firstFrame);
  const gridBottom = gridTop + (firstFrame.arrays[0]?.grid.layout.geometry.height ?? 0);

  // Under each picture, its option's two frames in words, across its slot, and for 1000 people the enlarged block.
  const closeUp = pictures.closeUp;
  const captions = pictures.captions.map((caption, index) => {
    const layout = closeUp?.layouts[index];
    const enlarged = closeUp === null || layout === undefined ? null : { layout, label: closeUp.label };
    return underPicture(
      caption,
      pictures.notes[index] ?? null,
      enlarged,
      slot - 2 * CAPTION_PAD,
      model.wanted,
      settings,
      styles,
      measure,
    );
  });
  const captionsBottom = picturesBottom + Math.max(0, ...captions.map((caption) => caption.height));
  const key = keyBlock(pictures, keyIntro, labelWidth - PAD_X, gridTop, Math.max(gridBottom, captionsBottom), styles, measure);
  const items: PageItem[] = [
    ...placed.map((picture, index): PageItem => ({
      kind: 'chart',
      x: picture.x,
      y: picture.y,
      width: picture.width,
      height: picture.frame.height,
      model: { ...model, arrays: model.arrays.slice(index, index + 1) },
      fontSize,
    })),
    ...key.items,
    ...titles.flatMap((title, index) => textItem(title, left(index) + CAPTION_PAD, titlesHeight - title.height).items),
  ];
  if (closeUp !== null) {
    placed.forEach((picture) => {
      const grid = picture.frame.arrays[0]?.grid;
      if (grid !== undefined)
        items.push(blockOutline(grid.layout, closeUp.block, picture.x + grid.x, picture.y + grid.y, styles.colours.text));
    });
  }
  captions.forEach((caption, index) => items.push(...placeBlock(caption, left(index) + CAPTION_PAD, picturesBottom)));
  // The key may run on beside the captions.
  const height = Math.max(captionsBottom, key.height + lineHeight(styles.list) * 0.3);
  return { ok: true, block: { items, height } };
}
