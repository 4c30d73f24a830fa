/**
 * Everything a handout says, as plain data and before any layout: the header, one
 * section per outcome (benefits and side effects with the same elements: pictures,
 * both frames, the change, its range, its certainty and its assumptions), the table
 * of every outcome side by side, evidence, the values prompt, questions, caution and footer.
 */
import type { Topic } from '../core/topic/topic.ts';
import type { OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import { populationSentence } from '../core/wording/topic-wording.ts';
import { aboutSheetLine, effectSourceGroups } from './about-sheet.ts';
import type { HandoutWords } from './handout-words.ts';
import { type OutcomeSection, outcomeSections } from './outcome-sections.ts';
import { type OutcomeTable, outcomeTable } from './outcome-table.ts';
import { type ScreeningSection, screeningSection } from './screening-section.ts';
import { valuesPrompt } from './values-prompt.ts';

export interface HandoutContent {
  readonly title: string;
  /** The badge of an invented demonstration topic; null for real numbers. */
  readonly illustrative: string | null;
  /** Who the numbers are for (the wording's population sentence) and the one period and denominator. */
  readonly audience: readonly string[];
  /** The option names over the pictures and the table, in the pictures' order (comparison first). */
  readonly titles: readonly string[];
  /** Before the first key: what one figure is. */
  readonly keyIntro: string;
  /** Every outcome, the headline first, then other benefits, then side effects. */
  readonly outcomes: readonly OutcomeSection[];
  /** Every outcome side by side, lined up under the pictures. */
  readonly table: OutcomeTable;
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
  /** The same, with each option's sentences in the short form printed with the compact pictures. */
  readonly shortWordingSentences: readonly string[];
}

export interface ContentOptions {
  readonly date: string;
  readonly appVersion: string;
  readonly showNnt: boolean;
  /** Overrides the topic's clinician or practice when not empty. */
  readonly clinician: string;
  /** The sheet's one language: its sentences, its pictures' words and every other string. */
  readonly words: HandoutWords;
}

/** The outcome the pictures lead with: the headline, or the first outcome. */
export function headlineOutcome(result: TopicResult): OutcomeResult {
  const found = result.outcomes.find((outcome) => outcome.isHeadline) ?? result.outcomes[0];
  if (found === undefined) throw new RangeError('a handout requires a topic with at least one outcome');
  return found;
}

/**
 * The content of a handout for a computed topic. Numbers come from the result's
 * rounded people counts (the same as the charts); sentences come from the wording
 * catalogue and the pictures' words from the chart catalogue; every other string comes from
 * the handout catalogue, all three from `options.words`.
 *
 * @param result - the computed topic
 * @param topic - the topic it was computed from (evidence, questions, clinician)
 * @param options - date, version, clinician and catalogue
 * @returns the content, ready for layout
 */
export function handoutContent(result: TopicResult, topic: Topic, options: ContentOptions): HandoutContent {
  const { words } = options;
  const messages = words.handout;
  const headline = headlineOutcome(result);
  const outcomes = outcomeSections(result, { showNnt: options.showNnt, words });
  const arrays = outcomes[0]?.pictures.model.arrays ?? [];
  const table = outcomeTable(
    result,
    arrays.map((array) => array.optionId),
    messages,
  );
  const sheet = {
    denominator: result.denominator,
    wordsDenominator: result.wordsDenominator,
    years: result.periodYears,
    unit: result.periodUnit,
  };
  const sentence = populationSentence(result, { catalogue: words.wording });
  const population = sentence === null ? [] : [sentence];
  const evidence = [
    messages.evidenceSummary(topic.evidence.summary),
    messages.evidenceReviewed(messages.formatDate(topic.evidence.reviewed)),
  ];
  if (headline.baselineSource.trim() !== '') evidence.push(messages.baselineSource(headline.name, headline.baselineSource));
  const clinician = options.clinician.trim() !== '' ? options.clinician.trim() : topic.clinician.trim();
  const questions = topic.questions.map((question) => question.trim()).filter((question) => question !== '');
  const printed = messages.printed(messages.formatDate(options.date));
  return {
    title: topic.title.trim(),
    illustrative: result.illustrative ? messages.illustrativeBadge : null,
    audience: [...population.map((sentence) => sentence.text), messages.numbersFor(sheet)],
    titles: arrays.map((array) => messages.capitalise(array.name.trim())),
    keyIntro: messages.keyIntro(sheet),
    outcomes,
    table,
    sentencesHeading: messages.sentencesHeading,
    evidence: { heading: messages.evidenceHeading, items: evidence },
    matters: { heading: messages.mattersHeading, prompt: valuesPrompt(result, headline, messages) },
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
      ...outcomes.flatMap((section) => section.wordingSentences),
    ],
    shortWordingSentences: [
      ...population.map((sentence) => sentence.text),
      ...outcomes.flatMap((section) => section.shortWordingSentences),
    ],
  };
}
