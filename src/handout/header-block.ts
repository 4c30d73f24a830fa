/**
 * The top of the sheet: the decision in one line, the illustrative badge when
 * the numbers are invented, and who the numbers are for over which period.
 */
import type { HandoutContent } from './handout-content.ts';
import type { HandoutStyles } from './handout-styles.ts';
import { type Block, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { type MeasureWidth, lineHeight, textBlock } from './text-layout.ts';

/** Padding inside the illustrative badge, in millimetres. */
const BADGE_PADDING = 1.6;

function illustrativeBlock(content: HandoutContent, width: number, styles: HandoutStyles, measure: MeasureWidth): Block {
  if (content.illustrative === null) return { items: [], height: 0 };
  const badgeText = textBlock(content.illustrative.badge, width, styles.listBold, measure);
  const badgeWidth = badgeText.width + 2 * BADGE_PADDING;
  const badgeHeight = badgeText.height + BADGE_PADDING;
  const noteLeft = badgeWidth + 3;
  const note = textBlock(content.illustrative.note, width - noteLeft, styles.listMuted, measure);
  const items: PageItem[] = [
    { kind: 'box', x: 0, y: 0, width: badgeWidth, height: badgeHeight, fill: styles.colours.badge, radius: 1.2 },
    ...placeBlock(textItem(badgeText), BADGE_PADDING, BADGE_PADDING / 2),
    ...placeBlock(textItem(note), noteLeft, (badgeHeight - Math.min(note.height, lineHeight(styles.listMuted))) / 2),
  ];
  return { items, height: Math.max(badgeHeight, note.height) };
}

/** The header block, `width` millimetres wide. */
export function headerBlock(content: HandoutContent, width: number, styles: HandoutStyles, measure: MeasureWidth): Block {
  const title = textItem(textBlock(content.title, width, styles.title, measure));
  const audience = textItem(textBlock(content.audience.join(' '), width, styles.body, measure));
  const gap = lineHeight(styles.body) * 0.35;
  const body = stack([illustrativeBlock(content, width, styles, measure), title, audience], gap);
  const ruleGap = gap;
  return {
    items: [
      ...body.items,
      { kind: 'rule', x: 0, y: body.height + ruleGap, width, colour: styles.colours.strongRule, thickness: 0.5 },
    ],
    height: body.height + ruleGap + 0.5,
  };
}
