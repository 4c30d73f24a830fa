/**
 * The pictures of every outcome at a smaller scale, for a page where the full-size pictures do
 * not fit: one row per outcome, its options' pictures side by side with the option's name over
 * each and its two frames under each, and the outcome's other sentences in small text beside
 * the pictures or under them, whichever takes less height. One scale for the whole page, the
 * benefits' and the side effects' alike (Trevena et al. 2013: the same format for every outcome
 * compared), and one key, printed once over the rows.
 */
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import { scaleLayout } from '../render/icon-array-layout.ts';
import type { FitSettings } from './fit-settings.ts';
import type { HandoutStyles } from './handout-styles.ts';
import type { KeyEntry, OutcomeSection } from './outcome-sections.ts';
import { outcomePieces, wordsGaps } from './outcome-words.ts';
import { type Block, EMPTY_BLOCK, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { blockOutline, centred, underPicture } from './pictures-block.ts';
import { headingBlock } from './section-blocks.ts';
import { type MeasureWidth, type TextStyle, lineHeight, textBlock } from './text-layout.ts';

/** The row, or the part whose words cannot fit their column. */
export type CompactRow = { readonly ok: true; readonly block: Block } | { readonly ok: false; readonly part: 'options' };

/**
 * Distance between people in a compact picture of 100, in millimetres: 0.6 of the full size,
 * kept between 2.5 and 2.9 mm, so a picture of 100 is about 26 to 30 mm wide (its figures
 * still about 2.2 mm, larger than 6 pt type). Common practice, not a standard.
 */
const CELL_100 = { share: 0.6, least: 2.5, most: 2.9 };
/** Distance between people in a compact picture of 1000, as a share of the full size. */
const CELL_1000_SHARE = 0.6;
/** Space between two pictures' slots, in millimetres. */
const SLOT_GAP = 4;
/** Space between the pictures and the words beside them, in millimetres. */
const WORDS_GUTTER = 6;
/** The narrowest column of words set beside the pictures, in millimetres (about 30 characters at 9 pt). */
const LEAST_WORDS_WIDTH = 55;
/** How much wider than its picture a slot may be made for its caption, in millimetres, and in what steps. */
const MOST_SLOT_EXTRA = 24;
const SLOT_STEP = 3;
/** Space between a picture and a caption beside it, and the narrowest such caption, in millimetres. */
const CAPTION_GAP = 3;
const LEAST_CAPTION_BESIDE = 30;

/** The width of each option's slot, and whether its caption sits beside its picture rather than under it. */
interface Slot {
  readonly width: number;
  readonly captionBeside: boolean;
}

/** The page's one compact scale: distance between people, in millimetres, for pictures of `denominator`. */
export function compactCell(denominator: number, settings: FitSettings): number {
  if (denominator === 1000) return settings.cell1000 * CELL_1000_SHARE;
  return Math.min(CELL_100.most, Math.max(CELL_100.least, settings.cell100 * CELL_100.share));
}

/**
 * The page's compact scale and slot width for `count` pictures of `layout` across `width`: the
 * compact cell, made smaller only where the pictures would not fit side by side (pictures of 1000).
 */
export function compactScale(
  layout: IconArrayLayout,
  count: number,
  width: number,
  settings: FitSettings,
): { readonly cell: number; readonly pictureWidth: number } {
  const unit = layout.geometry.width / layout.geometry.cellSize;
  const fits = (width - (count - 1) * SLOT_GAP) / Math.max(1, count) / unit;
  const cell = Math.min(compactCell(layout.denominator, settings), fits);
  return { cell, pictureWidth: unit * cell };
}

/** Every key entry of the outcomes, once each, in the order first drawn. */
export function sharedKey(outcomes: readonly OutcomeSection[]): KeyEntry[] {
  const seen = new Map<string, KeyEntry>();
  for (const entry of outcomes.flatMap((outcome) => outcome.pictures.key)) {
    const id = `${entry.look}\n${entry.text}`;
    if (!seen.has(id)) seen.set(id, entry);
  }
  return [...seen.values()];
}

/**
 * The key, once for every row: what one figure is, then each look of figure with its meaning,
 * the entries set one after another along the line and wrapped as words are.
 */
export function compactKeyBlock(
  outcomes: readonly OutcomeSection[],
  keyIntro: string,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const glyph = outcomes[0]?.pictures.model.arrays[0]?.layout.geometry.glyph ?? 'person';
  const style = styles.list;
  const line = lineHeight(style);
  const size = line * 0.95;
  const indent = size + 1.5;
  const gap = 5;
  const items: PageItem[] = [];
  let x = 0;
  let y = 0;
  // What one figure is leads the line, then each look with its meaning.
  const intro = textBlock(keyIntro, width, styles.listMuted, measure);
  items.push(...textItem(intro).items);
  if (intro.lines.length > 1) y = intro.height;
  else x = intro.width + gap;
  for (const entry of sharedKey(outcomes)) {
    const text = textBlock(entry.text, width - indent, style, measure);
    const entryWidth = indent + text.width;
    // An entry goes on the line when it fits; one that wraps has its lines to itself.
    if (x > 0 && (x + entryWidth > width || text.lines.length > 1)) {
      x = 0;
      y += line;
    }
    items.push(
      { kind: 'figure', x, y: y + (line - size) / 2, size, glyph, look: entry.look },
      ...textItem(text, x + indent, y).items,
    );
    if (text.lines.length > 1) {
      x = 0;
      y += text.height;
    } else {
      x += entryWidth + gap;
    }
  }
  return { items, height: x === 0 ? y : y + line };
}

/** A row's pictures with the option names over them and the captions under them, in slots `slot` wide. */
function picturesRow(
  outcome: OutcomeSection,
  titleTexts: readonly string[],
  cell: number,
  { width: slot, captionBeside }: Slot,
  closeUps: boolean,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): CompactRow {
  const { model, closeUp } = outcome.pictures;
  const titleStyle: TextStyle = styles.listBold;
  const titleWidth = slot - SLOT_GAP;
  const titles = titleTexts.map((title) => centred(title, titleWidth, titleStyle, measure));
  if (titles.some((title) => title.width > titleWidth + 0.01)) return { ok: false, part: 'options' };
  const titlesHeight = Math.max(0, ...titles.map((title) => title.height));
  const gap = lineHeight(styles.list) * 0.25;
  const items: PageItem[] = [];
  let bottom = 0;
  model.arrays.forEach((array, index) => {
    const left = index * slot;
    const scale = cell / array.layout.geometry.cellSize;
    const scaled = scaleLayout(array.layout, scale);
    const pictureWidth = scaled.geometry.width;
    const pictureX = captionBeside ? left : left + (titleWidth - pictureWidth) / 2;
    const pictureY = titles.length > 0 ? titlesHeight + gap : 0;
    const title = titles[index];
    if (title !== undefined) items.push(...textItem(title, left, titlesHeight - title.height).items);
    items.push({
      kind: 'people',
      x: pictureX,
      y: pictureY,
      width: scaled.geometry.width,
      layout: array.layout,
      wanted: model.wanted,
    });
    const enlarged = closeUps && closeUp !== null ? (closeUp.layouts[index] ?? null) : null;
    if (enlarged !== null && closeUp !== null) {
      items.push(blockOutline(scaled, closeUp.block, pictureX, pictureY, styles.colours.text));
    }
    const captionWidth = captionBeside ? titleWidth - pictureWidth - CAPTION_GAP : titleWidth;
    const under = underPicture(
      outcome.pictures.captions[index] ?? '',
      outcome.pictures.notes[index] ?? null,
      enlarged === null || closeUp === null ? null : { layout: enlarged, label: closeUp.label },
      captionWidth,
      model.wanted,
      settings,
      styles,
      measure,
    );
    const underX = captionBeside ? left + pictureWidth + CAPTION_GAP : left;
    const underY = captionBeside ? pictureY : pictureY + scaled.geometry.height + gap;
    items.push(...placeBlock(under, underX, underY));
    bottom = Math.max(bottom, underY + under.height, pictureY + scaled.geometry.height);
  });
  return { ok: true, block: { items, height: bottom } };
}

/** How the compact rows set an outcome's words: small, short, the frames under the pictures. */
const ROW_WORDS = { pictures: true, small: true, short: true } as const;

/** What an outcome's row is the same at every slot width: its heading, and its words set across the page. */
interface RowText {
  readonly heading: Block;
  readonly across: readonly Block[];
}

/** One outcome's row at one slot width: the lowest way to set its words, or the part that cannot fit. */
function rowAtSlot(
  outcome: OutcomeSection,
  { heading, across }: RowText,
  titleTexts: readonly string[],
  cell: number,
  slot: Slot,
  closeUps: boolean,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): CompactRow {
  const count = Math.max(1, outcome.pictures.model.arrays.length);
  const paragraphGap = wordsGaps(ROW_WORDS, styles).paragraph;
  const underGap = lineHeight(styles.list) * 0.4;
  const row = picturesRow(outcome, titleTexts, cell, slot, closeUps, settings, styles, measure);
  if (!row.ok) return row;
  // All under the pictures, across the page.
  const candidates: Block[] = [stack([row.block, stack(across, paragraphGap)], underGap)];
  // Or the first paragraphs beside the pictures, in what is left of the width, the rest across the page under them.
  const wordsWidth = width + SLOT_GAP - count * slot.width - WORDS_GUTTER;
  if (wordsWidth >= LEAST_WORDS_WIDTH) {
    const beside = outcomePieces(outcome, ROW_WORDS, wordsWidth, styles, measure);
    const wordsX = count * slot.width - SLOT_GAP + WORDS_GUTTER;
    for (let split = 1; split <= beside.length; split += 1) {
      const left = stack(beside.slice(0, split), paragraphGap);
      const rest = stack(across.slice(split), paragraphGap);
      const top = Math.max(row.block.height, left.height);
      candidates.push({
        items: [...row.block.items, ...placeBlock(left, wordsX, 0), ...placeBlock(rest, 0, top + underGap)],
        height: rest.height > 0 ? top + underGap + rest.height : top,
      });
    }
  }
  const lowest = candidates.reduce((best, found) => (found.height < best.height ? found : best), candidates[0] ?? EMPTY_BLOCK);
  return { ok: true, block: stack([heading, lowest], 0) };
}

/**
 * Every outcome's compact row under its heading: the pictures at the page's one scale, in slots
 * of one width for the whole page (so the options line up from row to row, under their names
 * printed once over the first row), and each outcome's
 * other sentences (change, range, certainty, the NNT when asked for, the assumptions) in small
 * text beside its pictures, running on across the page once past them, or all under them. The
 * slot width is the one that gives the lowest rows: as narrow as the pictures with the words
 * beside them, a little wider so the captions take fewer lines, wide enough for each caption
 * beside its picture (pictures of 1000 are wide and low), or the whole width shared.
 */
export function compactOutcomeRows(
  outcomes: readonly OutcomeSection[],
  titleTexts: readonly string[],
  scale: { readonly cell: number; readonly pictureWidth: number },
  closeUps: boolean,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): CompactRow[] {
  const count = Math.max(1, titleTexts.length);
  const least = scale.pictureWidth + SLOT_GAP;
  const widest = Math.max(least, (width + SLOT_GAP) / count);
  const slots: Slot[] = [{ width: widest, captionBeside: false }];
  for (let extra = 0; extra <= MOST_SLOT_EXTRA && least + extra < widest; extra += SLOT_STEP) {
    slots.push({ width: least + extra, captionBeside: false });
  }
  // Captions beside their pictures, for pictures low enough (of 1000) or slots wide enough.
  for (let caption = LEAST_CAPTION_BESIDE; least + CAPTION_GAP + caption <= widest; caption += SLOT_STEP) {
    slots.push({ width: least + CAPTION_GAP + caption, captionBeside: true });
  }
  // The option names head the columns once, over the first row: the slots line up from row to row,
  // and every caption under a picture starts with its option's name.
  const texts: RowText[] = outcomes.map((outcome) => ({
    heading: headingBlock(outcome.heading, width, styles, measure),
    across: outcomePieces(outcome, ROW_WORDS, width, styles, measure),
  }));
  const tried = slots.map((slot) =>
    outcomes.map((outcome, index) =>
      rowAtSlot(
        outcome,
        texts[index] ?? { heading: EMPTY_BLOCK, across: [] },
        index === 0 ? titleTexts : [],
        scale.cell,
        slot,
        closeUps,
        width,
        settings,
        styles,
        measure,
      ),
    ),
  );
  const heightOf = (rows: readonly CompactRow[]) =>
    rows.every((row) => row.ok) ? rows.reduce((sum, row) => sum + (row.ok ? row.block.height : 0), 0) : Number.POSITIVE_INFINITY;
  // The lowest page; when no slot width lets every option's name fit, the widest slots' refusal.
  return tried.reduce((best, rows) => (heightOf(rows) < heightOf(best) ? rows : best), tried[0] ?? []);
}
