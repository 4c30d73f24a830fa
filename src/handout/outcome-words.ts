/**
 * Every outcome's sentences as laid-out blocks: the outcome's name leading its first
 * paragraph, a paragraph per option, then the assumptions behind its numbers, at body
 * size or, when the page is tight, every outcome alike at the list size; set in one
 * column or flowed into two balanced columns of a readable line length.
 */
import type { HandoutStyles } from './handout-styles.ts';
import type { OutcomeSection } from './outcome-sections.ts';
import { type Block, placeBlock, stack } from './page-items.ts';
import { paragraphsBlock, runInParagraph } from './section-blocks.ts';
import { type MeasureWidth, type TextStyle, lineHeight } from './text-layout.ts';

/** How an outcome's words are set. */
export interface WordsSetting {
  /** Pictures carry each option's two frames as captions; without them the frames lead the paragraphs. */
  readonly pictures: boolean;
  /** Every outcome's sentences at the list size rather than the body size. */
  readonly small: boolean;
  /** With `pictures`: each option's sentences in the short form (the compact pictures). */
  readonly short?: boolean;
}

/** An outcome's paragraphs as separate blocks, in reading order, `width` millimetres wide. */
export function outcomePieces(
  outcome: OutcomeSection,
  setting: WordsSetting,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block[] {
  const own = setting.pictures && setting.short === true ? outcome.shortParagraphs : outcome.paragraphs;
  const paragraphs = own
    .map((paragraph, index) => (setting.pictures ? paragraph : [...(outcome.frames[index] ?? []), ...paragraph]))
    .filter((paragraph) => paragraph.length > 0);
  const [first = [], ...rest] = paragraphs;
  const body: TextStyle = setting.small ? styles.list : styles.body;
  const muted: TextStyle = setting.small ? styles.listMuted : styles.bodyMuted;
  return [
    runInParagraph(outcome.label, first.join(' '), width, body, measure),
    ...rest.map((paragraph) => paragraphsBlock([paragraph], width, body, measure)),
    ...outcome.assumptions.map((line) => paragraphsBlock([[line]], width, muted, measure)),
  ];
}

/** The gap between two paragraphs of one outcome, and between outcomes, in millimetres. */
export function wordsGaps(
  setting: WordsSetting,
  styles: HandoutStyles,
): { readonly paragraph: number; readonly outcome: number } {
  const line = lineHeight(setting.small ? styles.list : styles.body);
  return setting.small ? { paragraph: line * 0.2, outcome: line * 0.4 } : { paragraph: line * 0.35, outcome: line * 0.6 };
}

/** One outcome's words in one column. */
export function outcomeWords(
  outcome: OutcomeSection,
  setting: WordsSetting,
  width: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  return stack(outcomePieces(outcome, setting, width, styles, measure), wordsGaps(setting, styles).paragraph);
}

interface Piece {
  readonly block: Block;
  /** The gap above the piece when it does not start a column. */
  readonly gap: number;
}

function columnOf(pieces: readonly Piece[]): Block {
  const items = [];
  let top = 0;
  for (const [index, piece] of pieces.entries()) {
    if (index > 0) top += piece.gap;
    items.push(...placeBlock(piece.block, 0, top));
    top += piece.block.height;
  }
  return { items, height: top };
}

/**
 * Every outcome's words flowed into two columns `gutter` apart, split between paragraphs where
 * the two columns come out most even.
 */
export function twoColumnWords(
  outcomes: readonly OutcomeSection[],
  setting: WordsSetting,
  width: number,
  gutter: number,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const columnWidth = (width - gutter) / 2;
  const gaps = wordsGaps(setting, styles);
  const pieces: Piece[] = outcomes.flatMap((outcome) =>
    outcomePieces(outcome, setting, columnWidth, styles, measure).map((block, index) => ({
      block,
      gap: index === 0 ? gaps.outcome : gaps.paragraph,
    })),
  );
  let best = { left: columnOf(pieces), right: columnOf([]) };
  for (let split = 1; split < pieces.length; split += 1) {
    const left = columnOf(pieces.slice(0, split));
    const right = columnOf(pieces.slice(split));
    if (Math.max(left.height, right.height) < Math.max(best.left.height, best.right.height)) best = { left, right };
  }
  return {
    items: [...best.left.items, ...placeBlock(best.right, columnWidth + gutter, 0)],
    height: Math.max(best.left.height, best.right.height),
  };
}
