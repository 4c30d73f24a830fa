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
import type { HandoutPart } from './messages/handout-messages.ts';
import { type Block, EMPTY_BLOCK, type PageItem, placeBlock, stack, textItem } from './page-items.ts';
import { bulletsBlock, headingBlock, runInParagraph, section, shadedBox, writingLines } from './section-blocks.ts';
import { compactKeyBlock, compactOutcomeRows, compactScale } from './compact-pictures.ts';
import { columnsOf, picturesBlock } from './pictures-block.ts';
import { outcomeWords, twoColumnWords, wordsGaps } from './outcome-words.ts';
import { screeningBlock } from './screening-block.ts';
import { tableBlock } from './table-block.ts';
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
  options: 0.28,
  outcomes: 0.32,
  screening: 0.06,
  evidence: 0.08,
  questions: 0.12,
};

/**
 * What the page draws besides the words, and the order in which it gives way (`build-handout.ts`
 * tries the modes in this order, each down the whole fit ladder, and takes the first that fits).
 *
 * Pictures are drawn for every outcome or for none: a side effect's pictures at the same scale as
 * the benefit's (Trevena et al. 2013: the same denominator and format for every outcome compared),
 * and never the benefit's alone, which would give it more weight on the page than the harms (the
 * IPDAS certification criterion of equal detail). The pictures are what the sheet is for (natural
 * frequencies shown as icon arrays are understood better than numbers alone, by people of low
 * numeracy most: Galesic et al. 2009), so they give way last, and by steps:
 *
 * 1. Full-size pictures with the enlarged block of 100 beside each picture of 1000, body-size sentences.
 * 2. The same without the enlarged blocks: they repeat what the picture shows, at a larger scale.
 * 3. Full-size pictures, every outcome's sentences at the list size (never below 9 pt).
 * 4. Compact pictures (`compact`), with the enlarged blocks when there are any, then without: every
 *    outcome still has its pictures, all at one smaller scale, the key printed once, the sentences
 *    small beside the pictures. Smaller pictures still show the proportion (the part-to-whole
 *    picture is what helps, not its size), which is why they come before any page without pictures.
 * 5. No pictures: the table and every outcome's sentences at body size; then small sentences in two
 *    columns; last in one column. Past that, the named refusal.
 */
export interface PageMode {
  readonly pictures: boolean;
  /** The enlarged block of 100 beside each picture of 1000. */
  readonly closeUps: boolean;
  /**
   * With `pictures`: every outcome's pictures at the page's one compact scale, one row per outcome,
   * the key once over the rows and the sentences at the list size (`compact-pictures.ts`).
   */
  readonly compact?: boolean;
  /**
   * The last resort for many options and outcomes: every outcome's sentences, benefits and
   * harms alike, at the list size (never below 9 pt, the EU leaflet minimum) rather than leaving
   * any outcome's detail out; without pictures, the table is left out too.
   */
  readonly small?: boolean;
  /**
   * With `small` and no pictures, the sentences flow into two columns: a line of about 60
   * characters rather than 120 at the list size (common practice for legible print).
   */
  readonly columns?: boolean;
}

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
 * Lay out the page in `box` with `settings` and `mode`; measure text with `measure` (the
 * embedded font's metrics).
 */
export function layoutPage(
  content: HandoutContent,
  settings: FitSettings,
  box: PageBox,
  palette: ChartPalette,
  measure: MeasureWidth,
  mode: PageMode = { pictures: true, closeUps: true },
): PageLayout {
  const styles = handoutStyles(settings, palette);
  const width = box.width;
  const heading = (text: string) => headingBlock(text, width, styles, measure);
  const compact = mode.pictures && mode.compact === true;
  // The header's tight form (badge beside the title) on the tightest pages: small sentences without full-size pictures.
  const header = headerBlock(content, width, styles, measure, mode.small === true && (!mode.pictures || compact));
  const firstModel = content.outcomes[0]?.pictures.model;
  const columns = columnsOf(content.titles.length, firstModel?.denominator ?? 100, width);
  const pictureSections =
    mode.pictures && !compact
      ? content.outcomes.map((outcome, index) =>
          picturesBlock(
            mode.closeUps ? outcome.pictures : { ...outcome.pictures, closeUp: null },
            content.titles,
            index === 0 ? content.keyIntro : null,
            width,
            settings,
            styles,
            measure,
          ),
        )
      : [];
  const firstLayout = firstModel?.arrays[0]?.layout;
  const compactRows =
    compact && firstLayout !== undefined
      ? compactOutcomeRows(
          content.outcomes,
          content.titles,
          compactScale(firstLayout, content.titles.length, width, settings),
          mode.closeUps,
          width,
          settings,
          styles,
          measure,
        )
      : [];
  const refused = [...pictureSections, ...compactRows].find((found) => !found.ok);
  const setting = { pictures: mode.pictures, small: mode.small === true };
  // The compact rows set their own words; every other page sets each outcome's in full.
  const words = compact ? [] : content.outcomes.map((outcome) => outcomeWords(outcome, setting, width, styles, measure));
  // With pictures, each outcome's sentences sit under its own pictures, and the captions carry the
  // numbers a table would repeat; without them, the table sets the outcomes side by side (band words
  // with the numbers beside them) before every outcome's sentences, unless the page is too tight.
  // Compact, the key is printed once, over the first outcome's row.
  const compactKey = compact ? compactKeyBlock(content.outcomes, content.keyIntro, width, styles, measure) : EMPTY_BLOCK;
  const outcomeBlocks = compact
    ? compactRows.map((row, index) =>
        stack([index === 0 ? compactKey : EMPTY_BLOCK, row.ok ? row.block : EMPTY_BLOCK], lineHeight(styles.list) * 0.3),
      )
    : mode.pictures
      ? content.outcomes.map((outcome, index) => {
          const found = pictureSections[index];
          const pictures = found === undefined || !found.ok ? EMPTY_BLOCK : found.block;
          return stack([heading(outcome.heading), pictures, words[index] ?? EMPTY_BLOCK], lineHeight(styles.body) * 0.4);
        })
      : [
          setting.small ? EMPTY_BLOCK : tableBlock(content.table, content.titles, columns, width, settings, styles, measure),
          section(
            heading(content.sentencesHeading),
            mode.columns === true
              ? twoColumnWords(content.outcomes, setting, width, COLUMN_GUTTER, styles, measure)
              : stack(words, wordsGaps(setting, styles).outcome),
          ),
        ];
  const screening = screeningBlock(content.screening, width, styles, measure);
  const prompts = promptsBlock(content, width, settings, styles, measure);
  const foot = footBlock(content, width, settings, styles, measure);

  const mainOf = (gap: number) => stack([header, ...outcomeBlocks, screening, prompts], gap);
  const needed = mainOf(settings.space).height + settings.space + foot.height;

  // The first outcome's part is the options' share; every other outcome's and the table are the outcomes'.
  const outcomesHeight = stack(outcomeBlocks, settings.space).height;
  const firstHeight = mode.pictures ? (outcomeBlocks[0]?.height ?? 0) : (words[0]?.height ?? 0);
  const partHeights: Record<HandoutPart, number> = {
    header: header.height,
    options: firstHeight,
    outcomes: outcomesHeight - firstHeight,
    screening: screening.height,
    evidence: foot.height / 3,
    questions: prompts.height,
  };
  const overBudget = (part: HandoutPart) => partHeights[part] - PART_SHARE[part] * box.height;
  const worst = (Object.keys(PART_SHARE) as HandoutPart[]).reduce((found, part) =>
    overBudget(part) > overBudget(found) ? part : found,
  );

  if (refused !== undefined && !refused.ok) {
    return { items: [], fits: false, needed, tooLong: refused.part, parts: partHeights };
  }
  if (needed > box.height) return { items: [], fits: false, needed, tooLong: worst, parts: partHeights };
  // Share the spare height between the gaps, a little each, and leave the rest above the caution.
  const gaps = 1 + outcomeBlocks.length + (screening.height > 0 ? 1 : 0);
  const extra = Math.min(MOST_EXTRA_GAP, (box.height - needed) / (gaps + 1));
  const main = mainOf(settings.space + extra);
  const items = [...placeBlock(main, box.x, box.y), ...placeBlock(foot, box.x, box.y + box.height - foot.height)];
  return { items, fits: true, needed, tooLong: null, parts: partHeights };
}
