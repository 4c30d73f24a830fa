/**
 * The screening section laid out: one paragraph at the lists' size led by its bold heading
 * ("If you have the test: …"), measured like every other section.
 */
import type { HandoutStyles } from './handout-styles.ts';
import type { Block } from './page-items.ts';
import type { ScreeningSection } from './screening-section.ts';
import { runInParagraph } from './section-blocks.ts';
import type { MeasureWidth } from './text-layout.ts';

/** The section's block, or an empty block (no height, so no gap) when the sheet has none. */
export function screeningBlock(
  screening: ScreeningSection | null,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  if (screening === null) return { items: [], height: 0 };
  return runInParagraph(screening.heading, screening.items.join(' '), width, styles.list, measure);
}
