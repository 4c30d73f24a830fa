/**
 * Everything a handout says, as plain data and before any layout: the header,
 * the headline outcome's pictures and their key, the table of every outcome (side
 * effects with their frequency bands), the plain sentences from the wording
 * module, evidence, prompts, questions, caution and footer.
 */
import type { Certainty, Topic } from '../core/topic/topic.ts';
import { type PersonLook, lookOf } from '../core/direction.ts';
import { peopleFor } from '../core/people-counts.ts';
import type { Notice, PersonGroup, WordsDenominator } from '../core/types.ts';
import { duration } from '../core/messages/en/wording.ts';
import { isTimeUnit, yearsFrom } from '../core/time-unit.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import { amountOf } from '../core/wording/amount-of.ts';
import { frequencyBand } from '../core/wording/frequency-band.ts';
import { optionRisk } from '../core/wording/option-context.ts';
import { handoutSentences } from '../core/wording/topic-wording.ts';
import type { WordingSentence } from '../core/wording/wording-sentence.ts';
import { type ChartModel, outcomeChart } from '../render/chart-model.ts';
import { blockLayout, closeUpBlock } from '../render/close-up.ts';
import { FILL_ORDER } from '../render/fill-sequence.ts';
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import { aboutSheetLine, effectSourceGroups } from './about-sheet.ts';
import { bandOfCount, rowDenominator } from './band-denominator.ts';
import { type ScreeningSection, screeningSection } from './screening-section.ts';
import type { BenefitAim, HandoutMessages } from './messages/en.ts';

/** The two periods of a baseline conversion as words ("10 years", "15 years"), or null when there was none. */
function convertedSpans(conversion: Notice | null): { readonly from: string; readonly to: string } | null {
  if (conversion === null) return null;
  const span = (amount: unknown, unit: unknown): string | null =>
    typeof amount === 'number' && isTimeUnit(unit) ? duration({ years: yearsFrom(amount, unit), unit }) : null;
  const from = span(conversion.values.from, conversion.values.fromUnit ?? 'years');
  const to = span(conversion.values.to, conversion.values.toUnit ?? 'years');
  return from === null || to === null ? null : { from, to };
}

/** One cell of the outcomes table: the people count, and how sure the research is. */
export interface TableCell {
  readonly value: string;
  readonly note: string | null;
}

export interface TableRow {
  readonly outcomeId: string;
  readonly outcome: string;
  /** The outcome the pictures show. */
  readonly isHeadline: boolean;
  /** The people every cell of the row is out of: the topic's words denominator, or more for a rare side effect. */
  readonly denominator: WordsDenominator;
  /** One cell per option, in the order of the pictures (comparison first). */
  readonly cells: readonly TableCell[];
}

/** A run of rows under a sub-heading (none when every outcome is of one kind). */
export interface TableSection {
  readonly heading: string | null;
  readonly rows: readonly TableRow[];
}

/** The table of every outcome, its columns lined up under the pictures. */
export interface OutcomeTable {
  readonly sections: readonly TableSection[];
  /** Said under the table when no side effect was entered; null otherwise. */
  readonly noSideEffects: string | null;
}

/** One line of the key to the pictures. */
export interface KeyEntry {
  readonly group: PersonGroup;
  /** How the group's figures are drawn: `lookOf(group, wanted)`. */
  readonly look: PersonLook;
  readonly text: string;
}

export interface HandoutContent {
  readonly title: string;
  /** The badge of an invented demonstration topic; null for real numbers. */
  readonly illustrative: string | null;
  /** Who the numbers are for (the wording's population sentence) and the one period and denominator. */
  readonly audience: readonly string[];
  /**
   * The headline outcome's pictures: the chart model without its own titles and
   * legend (the option names, the key, the captions and the table take their
   * place), the key, and under each picture its option's two frames in words.
   */
  readonly chart: {
    readonly heading: string;
    readonly model: ChartModel;
    readonly keyIntro: string;
    readonly key: readonly KeyEntry[];
    /** The option names over the pictures, in the pictures' order. */
    readonly titles: readonly string[];
    /** One caption per picture, in the pictures' order: the wording's event and free frames. */
    readonly captions: readonly string[];
    /** Under each caption, the chart's note when the picture shows no one changed (a difference below one person), or null. */
    readonly notes: readonly (string | null)[];
    /** For pictures of 1000, the block of 100 holding the people who differ, enlarged; null otherwise. */
    readonly closeUp: CloseUp | null;
  };
  /** The other outcomes, lined up under the pictures. */
  readonly table: OutcomeTable;
  /** The headline outcome's other plain sentences (change, range, certainty), a paragraph per option. */
  readonly paragraphs: readonly (readonly string[])[];
  readonly sentencesHeading: string;
  readonly evidence: { readonly heading: string; readonly items: readonly string[] };
  readonly matters: { readonly heading: string; readonly prompt: string };
  readonly questions: { readonly heading: string; readonly items: readonly string[] };
  readonly caution: { readonly heading: string; readonly text: string };
  readonly footer: { readonly left: string; readonly right: string };
  /** Where each effect comes from, printed after the evidence; citations, so not scored for readability. */
  readonly effectSources: string | null;
  /** The disclosures in one small line: who prepared the topic, funding, interests, review date. */
  readonly about: string;
  /** What having the screening test leads to; null when the topic has no screening entries. */
  readonly screening: ScreeningSection | null;
  /** Every sentence taken from the wording module, in the order printed. */
  readonly wordingSentences: readonly string[];
}

/** One block of 100 of every picture of 1000, to be printed larger and outlined in the pictures. */
export interface CloseUp {
  /** The block (0 to 9, from the bottom-left) outlined in each picture. */
  readonly block: number;
  /** The block of each picture as a picture of 100, in the pictures' order. */
  readonly layouts: readonly IconArrayLayout[];
  readonly label: string;
}

export interface ContentOptions {
  readonly date: string;
  readonly appVersion: string;
  readonly showNnt: boolean;
  /** Overrides the topic's clinician or practice when not empty. */
  readonly clinician: string;
  readonly messages: HandoutMessages;
}

/** The outcome the chart shows: the headline, or the first outcome. */
export function headlineOutcome(result: TopicResult): OutcomeResult {
  const found = result.outcomes.find((outcome) => outcome.isHeadline) ?? result.outcomes[0];
  if (found === undefined) throw new RangeError('a handout requires a topic with at least one outcome');
  return found;
}

/** Consecutive sentences about the same option, as paragraphs. */
function paragraphsOf(sentences: readonly WordingSentence[]): string[][] {
  const paragraphs: string[][] = [];
  let previous: string | null | undefined;
  for (const sentence of sentences) {
    const last = paragraphs[paragraphs.length - 1];
    if (last !== undefined && sentence.optionId === previous) last.push(sentence.text);
    else paragraphs.push([sentence.text]);
    previous = sentence.optionId;
  }
  return paragraphs;
}

/**
 * The paragraphs with the level of each range said: once, after the last range, when every
 * option's interval has the same level ("Each range is the research's 95% interval."), or
 * after each range when they differ.
 */
function withLevels(sentences: readonly WordingSentence[], outcome: OutcomeResult, messages: HandoutMessages): string[][] {
  const levelOf = (sentence: WordingSentence) =>
    outcome.options.find((option) => option.optionId === sentence.optionId)?.level ?? null;
  const ranges = sentences.filter((sentence) => sentence.kind === 'range' && levelOf(sentence) !== null);
  const levels = new Set(ranges.map(levelOf));
  const last = ranges[ranges.length - 1];
  const [only] = levels;
  const shared = levels.size === 1 && only !== undefined && only !== null ? only : null;
  return paragraphsOf(
    sentences.flatMap((sentence) => {
      if (!ranges.includes(sentence)) return [sentence];
      const level = shared ?? levelOf(sentence);
      if (level === null || (shared !== null && sentence !== last)) return [sentence];
      return [sentence, { ...sentence, kind: 'range', text: messages.rangeLevel(level, shared === null ? 1 : ranges.length) }];
    }),
  );
}

/** The enlarged block of every picture of 1000 that holds the people who differ; null for 100 or when no one differs. */
function closeUpOf(model: ChartModel, messages: HandoutMessages): CloseUp | null {
  const layouts = model.arrays.map((array) => array.layout);
  const block = closeUpBlock(layouts);
  if (block === null) return null;
  return { block, layouts: layouts.map((layout) => blockLayout(layout, block)), label: messages.closeUpLabel };
}

/**
 * A cell: the option's count at the row's denominator (the words' one, as in the sentences);
 * for a side effect, its EU SmPC frequency band with the number beside the word, the row
 * written per as many people as it takes for the word and the number to agree.
 */
function tableCell(
  option: OptionOutcomeResult,
  kind: 'benefit' | 'harm',
  denominator: WordsDenominator,
  messages: HandoutMessages,
): TableCell {
  const risk = optionRisk(option);
  const count =
    denominator === option.wordsPeople.denominator ? option.wordsPeople.intervention : peopleFor(risk ?? 0, denominator);
  const amount = amountOf(count, denominator, risk);
  const certainty: Certainty | null = option.isComparison ? null : option.certainty;
  const band = frequencyBand(risk);
  // Only a risk within rounding of a band's edge, even per million, reads otherwise: then the word follows the number.
  const written = risk === null || risk === 0 ? band : (bandOfCount(count, denominator) ?? band);
  const value = kind === 'harm' ? messages.bandCell(written, amount, denominator) : messages.tableCell(amount, denominator);
  return { value, note: certainty === null ? null : messages.certaintyShort[certainty] };
}

/** An outcome's options in the order of the pictures: the comparison, then the others as in the chart. */
function cellsInChartOrder(outcome: OutcomeResult, model: ChartModel): OptionOutcomeResult[] {
  return model.arrays.map((array) => {
    const found = outcome.options.find((option) => option.optionId === array.optionId);
    if (found === undefined) throw new RangeError(`a handout requires every outcome to have option ${array.optionId}`);
    return found;
  });
}

/** Every outcome but the headline: other benefits, then side effects, each under its sub-heading. */
function outcomeTable(result: TopicResult, model: ChartModel, headlineId: string, messages: HandoutMessages): OutcomeTable {
  const rowOf = (outcome: OutcomeResult): TableRow => {
    const options = cellsInChartOrder(outcome, model);
    const denominator =
      outcome.kind === 'harm' ? rowDenominator(options.map(optionRisk), result.wordsDenominator) : result.wordsDenominator;
    return {
      outcomeId: outcome.outcomeId,
      outcome: messages.capitalise(outcome.name.trim()),
      isHeadline: false,
      denominator,
      cells: options.map((option) => tableCell(option, outcome.kind, denominator, messages)),
    };
  };
  const others = result.outcomes.filter((outcome) => outcome.outcomeId !== headlineId);
  const benefits = others.filter((outcome) => outcome.kind === 'benefit');
  const sections: TableSection[] = [
    { heading: messages.tableBenefitRows(benefitAim(benefits)), rows: benefits.map(rowOf) },
    { heading: messages.tableHarmRows, rows: others.filter((outcome) => outcome.kind === 'harm').map(rowOf) },
  ].filter((section) => section.rows.length > 0);
  return {
    sections,
    noSideEffects: result.outcomes.some((outcome) => outcome.kind === 'harm') ? null : messages.noSideEffects,
  };
}

/** What the options aim to do to these benefit outcomes: lower events to avoid, raise wanted ones. */
function benefitAim(benefits: readonly OutcomeResult[]): BenefitAim {
  const wanted = benefits.filter((outcome) => outcome.wanted).length;
  if (wanted === 0) return 'lower';
  return wanted === benefits.length ? 'raise' : 'both';
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

const FRAME_KINDS: ReadonlySet<string> = new Set(['event-frame', 'free-frame']);

/** The key: one line per look of figure that the pictures use, in fill order. */
function keyEntries(model: ChartModel, messages: HandoutMessages): KeyEntry[] {
  const words = model.wanted ? messages.wantedKeyGroups : messages.keyGroups;
  return FILL_ORDER.filter((group) => model.arrays.some((array) => array.groups[group] > 0)).map((group) => ({
    group,
    look: lookOf(group, model.wanted),
    text: words[group],
  }));
}

/**
 * The content of a handout for a computed topic. Numbers come from the result's
 * rounded people counts (the same as the charts); sentences come from the wording
 * module; every other string comes from `options.messages`.
 *
 * @param result - the computed topic
 * @param topic - the topic it was computed from (evidence, questions, clinician)
 * @param options - date, version, clinician and catalogue
 * @returns the content, ready for layout
 */
export function handoutContent(result: TopicResult, topic: Topic, options: ContentOptions): HandoutContent {
  const { messages } = options;
  const headline = headlineOutcome(result);
  const model = outcomeChart(result, headline.outcomeId);
  const table = outcomeTable(result, model, headline.outcomeId, messages);
  const rareRows = table.sections.some((section) => section.rows.some((row) => row.denominator !== result.wordsDenominator));
  const sheet = {
    denominator: result.denominator,
    wordsDenominator: result.wordsDenominator,
    rareRows,
    years: result.periodYears,
    unit: result.periodUnit,
  };
  const sentences = handoutSentences(result, { showNnt: options.showNnt });
  const population = sentences.filter((sentence) => sentence.kind === 'population');
  const headlineSentences = sentences.filter((sentence) => sentence.outcomeId === headline.outcomeId);
  const frames = headlineSentences.filter((sentence) => FRAME_KINDS.has(sentence.kind));
  const others = headlineSentences.filter((sentence) => !FRAME_KINDS.has(sentence.kind));
  const captions = model.arrays.map((array) =>
    frames
      .filter((sentence) => sentence.optionId === array.optionId)
      .map((sentence) => sentence.text)
      .join(' '),
  );
  const evidence = [
    messages.evidenceSummary(topic.evidence.summary),
    messages.evidenceReviewed(messages.formatDate(topic.evidence.reviewed)),
  ];
  if (headline.baselineSource.trim() !== '') evidence.push(messages.baselineSource(headline.name, headline.baselineSource));
  const converted = convertedSpans(headline.baselineConversion ?? null);
  if (converted !== null) evidence.push(messages.baselineConverted(headline.name, converted.from, converted.to));
  const clinician = options.clinician.trim() !== '' ? options.clinician.trim() : topic.clinician.trim();
  const questions = topic.questions.map((question) => question.trim()).filter((question) => question !== '');
  const printed = messages.printed(messages.formatDate(options.date));
  return {
    title: topic.title.trim(),
    illustrative: result.illustrative ? messages.illustrativeBadge : null,
    audience: [...population.map((sentence) => sentence.text), messages.numbersFor(sheet)],
    chart: {
      heading: model.heading,
      model: picturesOnly(model),
      titles: model.arrays.map((array) => messages.capitalise(array.name.trim())),
      keyIntro: messages.keyIntro(sheet),
      key: keyEntries(model, messages),
      captions,
      notes: model.arrays.map((array) => array.note),
      closeUp: closeUpOf(model, messages),
    },
    table,
    paragraphs: withLevels(others, headline, messages),
    sentencesHeading: messages.sentencesHeading,
    evidence: { heading: messages.evidenceHeading, items: evidence },
    matters: { heading: messages.mattersHeading, prompt: messages.mattersPrompt },
    questions: { heading: messages.questionsHeading, items: questions.length > 0 ? questions : messages.defaultQuestions },
    caution: { heading: messages.cautionHeading, text: messages.caution(sheet) },
    footer: {
      left: [clinician === '' ? messages.preparedByBlank : messages.preparedBy(clinician), printed].join(
        messages.footerSeparator,
      ),
      right: [messages.appVersion(options.appVersion), messages.pageOfPages].join(messages.footerSeparator),
    },
    effectSources: messages.about.effectSources(effectSourceGroups(topic)),
    about: aboutSheetLine(topic, messages.about, messages.formatDate),
    screening: screeningSection(topic, result.wordsDenominator, messages.screening),
    wordingSentences: [
      ...population.map((sentence) => sentence.text),
      ...model.arrays.flatMap((array) =>
        frames.filter((sentence) => sentence.optionId === array.optionId).map((sentence) => sentence.text),
      ),
      ...others.map((sentence) => sentence.text),
    ],
  };
}
