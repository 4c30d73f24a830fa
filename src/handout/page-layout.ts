/**
 * The whole page for one set of fit settings: sections in priority order down
 * the page, what matters and the questions side by side, and the caution (with
 * where the numbers come from) and the footer kept at the foot. Says whether it fits and, if not, what is too long.
 */
import type { ChartPalette } from '../render/palette.ts';
import type { FitSettings } from './fit-settings.ts';
import type { HandoutContent } from './handout-content.ts';
import { handoutStyles } from './handout-styles.ts';
import type { HandoutStyles } from './handout-styles.ts';
import { headerBlock } from './header-block.ts';
import type { HandoutPart } from './messages/en.ts';
import { type Block, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import {
  bulletsBlock,
  headingBlock,
  paragraphsBlock,
  runInParagraph,
  section,
  shadedBox,
  writingLines,
} from './section-blocks.ts';
import { picturesBlock } from './pictures-block.ts';
import { screeningBlock } from './screening-block.ts';
import { type MeasureWidth, inkDepth, lineHeight, textBlock } from './text-layout.ts';

/** The content box of the page, in millimetres. */
export interface PageBox {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** A laid-out page: its items, whether they fit, and the height each part took. */
export interface PageLayout {
  readonly items: readonly PageItem[];
  readonly fits: boolean;
  /** Height the content needs, in millimetres (more than the box when it does not fit). */
  readonly needed: number;
  /** The part to shorten when it does not fit. */
  readonly tooLong: HandoutPart | null;
  /** Height of each part, in millimetres (the short sections at half, as they share a row). */
  readonly parts: Readonly<Record<HandoutPart, number>>;
}

/** Space between two columns side by side, in millimetres. */
const COLUMN_GUTTER = 9;

/**
 * A fair share of the page for each part, used to say which one to shorten:
 * the part furthest over its share is named. Common practice, not a standard.
 */
const PART_SHARE: Readonly<Record<HandoutPart, number>> = {
  header: 0.14,
  options: 0.5,
  outcomes: 0.16,
  screening: 0.1,
  evidence: 0.08,
  questions: 0.12,
};

/** Two blocks side by side, each half the width less the gutter. */
function sideBySide(left: Block, right: Block, width: number): Block {
  const columnWidth = (width - COLUMN_GUTTER) / 2;
  return {
    items: [...left.items, ...placeBlock(right, columnWidth + COLUMN_GUTTER, 0)],
    height: Math.max(left.height, right.height),
  };
}

/**
 * What matters to the patient (a prompt and ruled lines to write on) beside the
 * questions to ask: at least the settings' number of lines, more where the
 * questions leave room.
 */
function promptsBlock(
  content: HandoutContent,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const columnWidth = (width - COLUMN_GUTTER) / 2;
  const heading = (text: string) => headingBlock(text, columnWidth, styles, measure);
  const spacing = lineHeight(styles.list) * 1.6;
  const questions = section(
    heading(content.questions.heading),
    bulletsBlock(content.questions.items, columnWidth, styles.list, measure),
  );
  const prompt = section(
    heading(content.matters.heading),
    textItem(textBlock(content.matters.prompt, columnWidth, styles.listMuted, measure)),
  );
  const room = Math.floor((questions.height - prompt.height - 0.5) / spacing);
  const writing = writingLines(Math.max(settings.writingLines, room), columnWidth, spacing, styles.colours.rule);
  return sideBySide(stack([prompt, writing], 0), questions, width);
}

function footBlock(
  content: HandoutContent,
  width: number,
  settings: FitSettings,
  styles: HandoutStyles,
  measure: MeasureWidth,
): Block {
  const padding = 3;
  const inner = width - 2 * padding;
  // The caution and where the numbers come from, together in one calm box.
  const caution = shadedBox(
    stack(
      [
        runInParagraph(content.caution.heading, content.caution.text, inner, styles.list, measure),
        runInParagraph(
          content.evidence.heading,
          [...content.evidence.items, content.effectSources ?? ''].join(' ').trim(),
          inner,
          styles.list,
          measure,
        ),
      ],
      lineHeight(styles.list) * 0.3,
    ),
    width,
    padding,
    styles.colours.shade,
  );
  const left = textBlock(content.footer.left, width, styles.footer, measure);
  const rightWidth = measure(content.footer.right, styles.footer.size, false);
  const oneLine = left.width + rightWidth + 8 <= width && left.lines.length === 1;
  const right = textBlock(content.footer.right, width, styles.footer, measure);
  const about = textItem(textBlock(content.about, width, styles.footer, measure));
  const rightBlock = {
    ...right,
    lines: right.lines.map((line) => ({ ...line, x: width - measure(line.text, styles.footer.size, false) })),
  };
  // The footer sits on the bottom margin, so its height reaches down to the descenders.
  const footer: Block = oneLine
    ? { items: [...textItem(left).items, ...textItem(rightBlock).items], height: inkDepth(left) }
    : {
        items: [...textItem(left).items, ...textItem(rightBlock, 0, left.height).items],
        height: left.height + inkDepth(rightBlock),
      };
  const rule: Block = {
    items: [{ kind: 'rule', x: 0, y: 0, width, colour: styles.colours.rule, thickness: 0.25 }],
    height: 0.25,
  };
  // The disclosures are the footer's first line, so they take a line and no gap of their own.
  return stack([caution, rule, stack([about, footer], 0)], settings.space * 0.45);
}

/** The most spare space added to each gap between sections, in millimetres. */
const MOST_EXTRA_GAP = 5;

/**
 * Lay out the page in `box` with `settings`; measure text with `measure` (the
 * embedded font's metrics).
 */
export function layoutPage(
  content: HandoutContent,
  settings: FitSettings,
  box: PageBox,
  palette: ChartPalette,
  measure: MeasureWidth,
): PageLayout {
  const styles = handoutStyles(settings, palette);
  const width = box.width;
  const heading = (text: string) => headingBlock(text, width, styles, measure);
  const pictures = picturesBlock(content, width, settings, styles, measure);
  const header = headerBlock(content, width, styles, measure);
  const picturesSection = pictures.ok ? section(heading(content.chart.heading), pictures.block) : { items: [], height: 0 };
  const sentences = section(heading(content.sentencesHeading), paragraphsBlock(content.paragraphs, width, styles.body, measure));
  const screening = screeningBlock(content.screening, width, styles, measure);
  const prompts = promptsBlock(content, width, settings, styles, measure);
  const foot = footBlock(content, width, settings, styles, measure);

  const mainOf = (gap: number) => stack([header, picturesSection, sentences, screening, prompts], gap);
  const needed = mainOf(settings.space).height + settings.space + foot.height;

  const rows = content.table.sections.reduce((sum, found) => sum + found.rows.length, 0);
  const outcomesShare = picturesSection.height * (rows / (rows + 4));
  const partHeights: Record<HandoutPart, number> = {
    header: header.height,
    options: picturesSection.height - outcomesShare + sentences.height,
    outcomes: outcomesShare,
    screening: screening.height,
    evidence: foot.height / 3,
    questions: prompts.height,
  };
  const overBudget = (part: HandoutPart) => partHeights[part] - PART_SHARE[part] * box.height;
  const worst = (Object.keys(PART_SHARE) as HandoutPart[]).reduce((found, part) =>
    overBudget(part) > overBudget(found) ? part : found,
  );

  if (!pictures.ok || needed > box.height) {
    return { items: [], fits: false, needed, tooLong: pictures.ok ? worst : pictures.part, parts: partHeights };
  }
  // Share the spare height between the gaps, a little each, and leave the rest above the caution.
  const gaps = screening.height > 0 ? 4 : 3;
  const extra = Math.min(MOST_EXTRA_GAP, (box.height - needed) / (gaps + 1));
  const main = mainOf(settings.space + extra);
  const items = [...placeBlock(main, box.x, box.y), ...placeBlock(foot, box.x, box.y + box.height - foot.height)];
  return { items, fits: true, needed, tooLong: null, parts: partHeights };
}
