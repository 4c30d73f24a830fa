/**
 * One section per outcome that matters, benefits and harms alike, each with the same
 * elements (Trevena et al. 2013; the IPDAS certification criterion of equal detail for
 * positive and negative features, Joseph-Williams et al. 2014): its pictures at the
 * sheet's one denominator, under each picture the option's two frames, and then every
 * option's change as people, its range and its GRADE statement (Santesso et al. 2020),
 * with the assumptions behind the numbers.
 */
import { type PersonLook, lookOf } from '../core/direction.ts';
import type { OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import type { PersonGroup } from '../core/types.ts';
import { handoutSentences, shortHandoutSentences } from '../core/wording/topic-wording.ts';
import type { WordingSentence } from '../core/wording/wording-sentence.ts';
import { type ChartModel, outcomeChart } from '../render/chart-model.ts';
import { blockLayout, closeUpBlock } from '../render/close-up.ts';
import { FILL_ORDER } from '../render/fill-sequence.ts';
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import { assumptionLines } from './assumption-lines.ts';
import type { HandoutWords } from './handout-words.ts';
import type { HandoutMessages } from './messages/handout-messages.ts';

/** One line of the key to the pictures. */
export interface KeyEntry {
  readonly group: PersonGroup;
  /** How the group's figures are drawn: `lookOf(group, wanted)`. */
  readonly look: PersonLook;
  readonly text: string;
}

/** One block of 100 of every picture of 1000, to be printed larger and outlined in the pictures. */
export interface CloseUp {
  /** The block (0 to 9, from the bottom-left) outlined in each picture. */
  readonly block: number;
  /** The block of each picture as a picture of 100, in the pictures' order. */
  readonly layouts: readonly IconArrayLayout[];
  readonly label: string;
}

/** An outcome's pictures: the chart model without its own text, the key, and under each picture its two frames. */
export interface OutcomePictures {
  readonly model: ChartModel;
  readonly key: readonly KeyEntry[];
  /** One caption per picture, in the pictures' order: the wording's event and free frames. */
  readonly captions: readonly string[];
  /** Under each caption, the chart's note when the picture shows no one changed, or null. */
  readonly notes: readonly (string | null)[];
  /** For pictures of 1000, the block of 100 holding the people who differ, enlarged; null otherwise. */
  readonly closeUp: CloseUp | null;
}

export interface OutcomeSection {
  readonly outcomeId: string;
  readonly kind: 'benefit' | 'harm';
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  /** Over the pictures: "Chance of another kidney stone over 5 years"; a side effect's says so. */
  readonly heading: string;
  /** Before the outcome's sentences: its name, and for a side effect that it is one. */
  readonly label: string;
  readonly pictures: OutcomePictures;
  /** Each option's two frames, a paragraph per option in the pictures' order (the captions, when drawn). */
  readonly frames: readonly (readonly string[])[];
  /**
   * The other sentences (change, range, certainty, and the NNT when asked for), a paragraph per
   * option in the pictures' order: the comparison's is empty.
   */
  readonly paragraphs: readonly (readonly string[])[];
  /**
   * The same facts in the short form, for the compact pictures: a paragraph per option of its
   * change with its range, its certainty statement and the NNT when asked for, the names said
   * once (`short-sentences.ts`); the comparison's is empty.
   */
  readonly shortParagraphs: readonly (readonly string[])[];
  /** The assumptions behind this outcome's numbers, one short line each. */
  readonly assumptions: readonly string[];
  /** Every sentence taken from the wording module, in the order printed with pictures. */
  readonly wordingSentences: readonly string[];
  /** The same with the short form of each option's sentences, as printed with the compact pictures. */
  readonly shortWordingSentences: readonly string[];
}

const FRAME_KINDS: ReadonlySet<string> = new Set(['event-frame', 'free-frame']);
/** The sentences that carry a range: the full form's, and the short form's change with its range. */
const RANGE_KINDS: ReadonlySet<string> = new Set(['range', 'short-effect']);

/**
 * The sentences with the level of each range said: once, after the sheet's last range, when
 * every interval has the same level ("Each range is a 95% interval."), or after each range
 * when they differ.
 */
function withLevels(sentences: readonly WordingSentence[], result: TopicResult, messages: HandoutMessages): WordingSentence[] {
  const levelOf = (sentence: WordingSentence) =>
    result.outcomes
      .find((outcome) => outcome.outcomeId === sentence.outcomeId)
      ?.options.find((option) => option.optionId === sentence.optionId)?.level ?? null;
  const ranges = sentences.filter((sentence) => RANGE_KINDS.has(sentence.kind) && levelOf(sentence) !== null);
  const levels = new Set(ranges.map(levelOf));
  const last = ranges[ranges.length - 1];
  const [only] = levels;
  const shared = levels.size === 1 && only !== undefined && only !== null ? only : null;
  return sentences.flatMap((sentence) => {
    if (!ranges.includes(sentence)) return [sentence];
    const level = shared ?? levelOf(sentence);
    if (level === null || (shared !== null && sentence !== last)) return [sentence];
    return [sentence, { ...sentence, text: messages.rangeLevel(level, shared === null ? 1 : ranges.length) }];
  });
}

/**
 * The chart model with the pictures alone: its heading, titles, labels, notes and
 * ranges are set by the handout as section heading, column headings, key,
 * captions and sentences.
 */
function picturesOnly(model: ChartModel): ChartModel {
  return {
    ...model,
    heading: '',
    illustrative: null,
    arrays: model.arrays.map((array) => ({ ...array, title: '', labels: [], note: null, range: null })),
  };
}

/** The key: one line per look of figure that the pictures use, in fill order. */
function keyEntries(model: ChartModel, messages: HandoutMessages): KeyEntry[] {
  const words = model.wanted ? messages.wantedKeyGroups : messages.keyGroups;
  return FILL_ORDER.filter((group) => model.arrays.some((array) => array.groups[group] > 0)).map((group) => ({
    group,
    look: lookOf(group, model.wanted),
    text: words[group],
  }));
}

/** The enlarged block of every picture of 1000 that holds the people who differ; null for 100 or when no one differs. */
function closeUpOf(model: ChartModel, messages: HandoutMessages): CloseUp | null {
  const layouts = model.arrays.map((array) => array.layout);
  const block = closeUpBlock(layouts);
  if (block === null) return null;
  return { block, layouts: layouts.map((layout) => blockLayout(layout, block)), label: messages.closeUpLabel };
}

/** The outcomes in the order printed: the headline, the other benefits, then the side effects. */
export function printedOutcomes(result: TopicResult): OutcomeResult[] {
  const rank = (outcome: OutcomeResult) => (outcome.isHeadline ? 0 : outcome.kind === 'benefit' ? 1 : 2);
  return [...result.outcomes].sort((first, second) => rank(first) - rank(second));
}

/**
 * Every outcome's section, in the order printed. Numbers come from the result's rounded
 * people counts (the same as the charts); sentences from the wording module.
 *
 * @param result - the computed topic
 * @param options - whether to add the NNT sentences, and the sheet's words
 */
export function outcomeSections(
  result: TopicResult,
  options: { readonly showNnt: boolean; readonly words: HandoutWords },
): OutcomeSection[] {
  const { words } = options;
  const messages = words.handout;
  const catalogue = words.wording;
  // "There is no number needed to treat" would repeat the change sentence's "little or no difference".
  const worded = handoutSentences(result, { showNnt: options.showNnt, catalogue }).filter(
    (sentence) => sentence.outcomeId !== null && sentence.kind !== 'nnt-none',
  );
  const sentences = withLevels(worded, result, messages);
  const shortWorded = shortHandoutSentences(result, { showNnt: options.showNnt, catalogue });
  const short = withLevels(shortWorded, result, messages);
  return printedOutcomes(result).map((outcome) => {
    const model = outcomeChart(result, outcome.outcomeId, { messages: words.chart });
    const own = sentences.filter((sentence) => sentence.outcomeId === outcome.outcomeId);
    const framesOf = (optionId: string) =>
      own.filter((sentence) => sentence.optionId === optionId && FRAME_KINDS.has(sentence.kind)).map((found) => found.text);
    const frames = model.arrays.map((array) => framesOf(array.optionId));
    const others = own.filter((sentence) => !FRAME_KINDS.has(sentence.kind));
    const heading = outcome.kind === 'harm' ? messages.sideEffectHeading(model.heading) : model.heading;
    return {
      outcomeId: outcome.outcomeId,
      kind: outcome.kind,
      wanted: outcome.wanted,
      isHeadline: outcome.isHeadline,
      heading,
      label: messages.outcomeLabel(outcome.name.trim(), outcome.kind),
      pictures: {
        model: picturesOnly(model),
        key: keyEntries(model, messages),
        captions: frames.map((texts) => texts.join(' ')),
        notes: model.arrays.map((array) => array.note),
        closeUp: closeUpOf(model, messages),
      },
      frames,
      paragraphs: model.arrays.map((array) =>
        others.filter((sentence) => sentence.optionId === array.optionId).map((sentence) => sentence.text),
      ),
      shortParagraphs: model.arrays.map((array) =>
        short
          .filter((sentence) => sentence.outcomeId === outcome.outcomeId && sentence.optionId === array.optionId)
          .map((sentence) => sentence.text),
      ),
      assumptions: assumptionLines(outcome, messages),
      wordingSentences: [
        ...frames.flat(),
        ...worded
          .filter((sentence) => sentence.outcomeId === outcome.outcomeId && !FRAME_KINDS.has(sentence.kind))
          .map((sentence) => sentence.text),
      ],
      shortWordingSentences: [
        ...frames.flat(),
        ...shortWorded.filter((sentence) => sentence.outcomeId === outcome.outcomeId).map((sentence) => sentence.text),
      ],
    };
  });
}
