/**
 * The top of the sheet: the decision in one line, the illustrative badge when
 * the numbers are invented, and who the numbers are for over which period.
 */
import type { HandoutContent } from './handout-content.ts';
import type { HandoutStyles } from './handout-styles.ts';
import { type Block, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { type MeasureWidth, POINTS_PER_MM, lineHeight, textBlock } from './text-layout.ts';

/** Padding inside the illustrative badge, in millimetres. */
const BADGE_PADDING = 1.6;

/** Space between the title's last word and the badge beside it, in millimetres. */
const BADGE_GAP = 4;

/** The illustrative badge, or null for a topic with real numbers. */
function illustrativeBlock(
  content: HandoutContent,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): { block: Block; width: number } | null {
  if (content.illustrative === null) return null;
  const text = textBlock(content.illustrative, width - 2 * BADGE_PADDING, styles.listBold, measure);
  const badgeWidth = text.width + 2 * BADGE_PADDING;
  const badgeHeight = text.height + BADGE_PADDING;
  const items: PageItem[] = [
    { kind: 'box', x: 0, y: 0, width: badgeWidth, height: badgeHeight, fill: styles.colours.badge, radius: 1.2 },
    ...placeBlock(textItem(text), BADGE_PADDING, BADGE_PADDING / 2),
  ];
  return { block: { items, height: badgeHeight }, width: badgeWidth };
}

/**
 * The title, with the illustrative badge on its last line when there is room
 * there, else on a line of its own above it.
 */
function titleBlock(content: HandoutContent, width: number, styles: HandoutStyles, measure: MeasureWidth, gap: number): Block {
  const title = textBlock(content.title, width, styles.title, measure);
  const badge = illustrativeBlock(content, width, styles, measure);
  if (badge === null) return textItem(title);
  const last = title.lines[title.lines.length - 1];
  const lastWidth = last === undefined ? width : measure(last.text, styles.title.size, true);
  if (last !== undefined && lastWidth + BADGE_GAP + badge.width <= width) {
    const top = last.y - (styles.title.size * 0.36) / POINTS_PER_MM - badge.block.height / 2;
    return { items: [...textItem(title).items, ...placeBlock(badge.block, lastWidth + BADGE_GAP, top)], height: title.height };
  }
  return stack([badge.block, textItem(title)], gap);
}

/**
 * The header block, `width` millimetres wide; who the numbers are for in the body size, or in
 * the list size when the page sets every outcome's sentences so (`small`).
 */
export function headerBlock(
  content: HandoutContent,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
  small = false,
): Block {
  const gap = lineHeight(styles.body) * 0.35;
  const title = titleBlock(content, width, styles, measure, gap);
  const audience = textItem(textBlock(content.audience.join(' '), width, small ? styles.list : styles.body, measure));
  const body = stack([title, audience], gap);
  const ruleGap = gap * 0.8;
  return {
    items: [
      ...body.items,
      { kind: 'rule', x: 0, y: body.height + ruleGap, width, colour: styles.colours.strongRule, thickness: 0.5 },
    ],
    height: body.height + ruleGap + 0.5,
  };
}
