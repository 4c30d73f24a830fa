/**
 * The text sections of the sheet: a heading followed by paragraphs, bullet
 * lists, or ruled lines to write on.
 */
import type { HandoutStyles } from './handout-styles.ts';
import { type Block, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { type MeasureWidth, type TextStyle, lineHeight, textBlock } from './text-layout.ts';

/** The bullet before list items. */
const BULLET = '•';

/** A section heading with the space under it. */
export function headingBlock(text: string, width: number, styles: HandoutStyles, measure: MeasureWidth): Block {
  const block = textBlock(text, width, styles.heading, measure);
  return { items: textItem(block).items, height: block.height + lineHeight(styles.heading) * 0.15 };
}

/** Paragraphs, each a run of sentences, a little apart. */
export function paragraphsBlock(
  paragraphs: readonly (readonly string[])[],
  width: number,
  style: TextStyle,
  measure: MeasureWidth,
): Block {
  return stack(
    paragraphs.map((sentences) => textItem(textBlock(sentences.join(' '), width, style, measure))),
    lineHeight(style) * 0.35,
  );
}

/** A bullet list, items hanging from their bullet. */
export function bulletsBlock(items: readonly string[], width: number, style: TextStyle, measure: MeasureWidth): Block {
  const indent = measure(`${BULLET}  `, style.size, style.bold);
  return stack(
    items.map((item) => {
      const text = textBlock(item, width, style, measure, indent);
      const bullet = textBlock(BULLET, width, style, measure);
      return { items: [...textItem(bullet).items, ...textItem(text).items], height: text.height };
    }),
    lineHeight(style) * 0.25,
  );
}

/**
 * A paragraph led by a bold run-in heading on its first line ("Please keep in
 * mind. These numbers…"), both in `style`'s size.
 */
export function runInParagraph(heading: string, text: string, width: number, style: TextStyle, measure: MeasureWidth): Block {
  const bold = { ...style, bold: true };
  const lead = textBlock(heading, width, bold, measure);
  const leadWidth = lead.lines.length === 1 ? lead.width + measure(' ', style.size, false) : 0;
  const body = textBlock(text, width, style, measure, 0, leadWidth);
  const bodyTop = lead.lines.length === 1 ? 0 : lead.height;
  return { items: [...textItem(lead).items, ...textItem(body, 0, bodyTop).items], height: bodyTop + body.height };
}

/** A heading above a body block. */
export function section(heading: Block, body: Block): Block {
  return stack([heading, body], 0);
}

/** Ruled lines to write on, `spacing` millimetres apart. */
export function writingLines(count: number, width: number, spacing: number, colour: string): Block {
  const items: PageItem[] = Array.from({ length: count }, (_, index) => ({
    kind: 'rule' as const,
    x: 0,
    y: (index + 1) * spacing,
    width,
    colour,
    thickness: 0.25,
  }));
  return { items, height: count * spacing + (count > 0 ? 0.5 : 0) };
}

/** A shaded box around a block, with padding on every side. */
export function shadedBox(inner: Block, width: number, padding: number, fill: string): Block {
  const height = inner.height + 2 * padding;
  return {
    items: [{ kind: 'box', x: 0, y: 0, width, height, fill, radius: 2 }, ...placeBlock(inner, padding, padding)],
    height,
  };
}
