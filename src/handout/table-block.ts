/**
 * The table of every outcome side by side: one row per outcome, each option's cell
 * straight under that option's picture (the same columns as the pictures), with the
 * option names over the columns when no pictures are printed.
 */
import type { FitSettings } from './fit-settings.ts';
import type { HandoutStyles } from './handout-styles.ts';
import type { OutcomeTable, TableCell } from './outcome-table.ts';
import { type Block, type PageItem, placeBlock, textItem } from './page-items.ts';
import { type Columns, PAD_X, centred, slotLeft } from './pictures-block.ts';
import { type MeasureWidth, type TextBlock, type TextStyle, lineHeight, textBlock } from './text-layout.ts';

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

/** A cell: its value in bold, the change under it, then how sure the research is. */
function cellBlock(cell: TableCell, width: number, styles: HandoutStyles, measure: MeasureWidth): Block {
  const parts: TextBlock[] = [cellValue(cell.value, width, styles.tableBold, measure)];
  if (cell.change !== null) parts.push(centred(cell.change, width, styles.table, measure));
  if (cell.note !== null) parts.push(centred(cell.note, width, styles.tableNote, measure));
  const items: PageItem[] = [];
  let top = 0;
  for (const part of parts) {
    items.push(...textItem(part, 0, top).items);
    top += part.height;
  }
  return { items, height: top };
}

/**
 * The table, `width` millimetres wide, in the pictures' columns.
 *
 * @param titles - the option names to print over the columns, or null when the pictures carry them
 */
export function tableBlock(
  table: OutcomeTable,
  titles: readonly string[] | null,
  columns: Columns,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const PAD_Y = settings.rowPadding;
  const items: PageItem[] = [];
  let top = 0;
  const cellWidth = columns.slot - 2 * PAD_X;
  const cellLeft = (index: number) => slotLeft(columns, index) + PAD_X;
  const row = (blocks: readonly { readonly block: Block; readonly x: number }[], shaded: boolean) => {
    const height = Math.max(...blocks.map((cell) => cell.block.height)) + 2 * PAD_Y;
    if (shaded) items.push({ kind: 'box', x: 0, y: top, width, height, fill: styles.colours.shade, radius: 0 });
    for (const cell of blocks) items.push(...placeBlock(cell.block, cell.x, top + PAD_Y));
    top += height;
  };
  if (titles !== null) {
    const heads = titles.map((title) => centred(title, cellWidth, styles.tableBold, measure));
    const tallest = Math.max(0, ...heads.map((head) => head.height));
    row(
      heads.map((head, index) => ({ block: textItem(head, 0, tallest - head.height), x: cellLeft(index) })),
      false,
    );
  }
  items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.strongRule, thickness: 0.4 });
  for (const part of table.sections) {
    if (part.heading !== null) {
      const heading = textBlock(part.heading, width - 2 * PAD_X, { ...styles.tableBold, colour: styles.colours.muted }, measure);
      top += PAD_Y * 0.5;
      row([{ block: textItem(heading), x: PAD_X }], false);
      items.push({ kind: 'rule', x: 0, y: top, width, colour: styles.colours.rule, thickness: 0.25 });
    }
    part.rows.forEach((found, index) => {
      const label = textBlock(
        found.outcome,
        columns.labelWidth - 2 * PAD_X,
        found.isHeadline ? styles.tableBold : styles.table,
        measure,
      );
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
  for (const said of [table.rareNote, table.noSideEffects]) {
    if (said === null) continue;
    const note = textBlock(said, width, styles.listMuted, measure);
    top += PAD_Y;
    items.push(...textItem(note, 0, top).items);
    top += note.height + lineHeight(styles.listMuted) * 0.1;
  }
  return { items, height: top };
}
