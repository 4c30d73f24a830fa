import { english } from '../messages/en/index.ts';
import type { TimeUnit } from '../time-unit.ts';
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../topic/topic-result.ts';
import { bandSentence } from './band-sentence.ts';
import { certaintySentence } from './certainty-sentence.ts';
import { changeSentence } from './change-sentence.ts';
import { frequencySentences } from './frequency-sentences.ts';
import { nntSentence } from './nnt-sentence.ts';
import type { OptionContext } from './option-context.ts';
import { rangeSentence } from './range-sentence.ts';
import { relativeSentence } from './relative-sentence.ts';
import { shortCertaintySentence, shortEffectSentence, shortNntSentence } from './short-sentences.ts';
import type { WordingMessages } from './wording-catalogue.ts';
import type { SentenceKind, WordingSentence } from './wording-sentence.ts';

/** The sentences about one option for one outcome, in reading order. */
export interface OptionWording {
  readonly optionId: string;
  readonly name: string;
  readonly isComparison: boolean;
  readonly sentences: readonly WordingSentence[];
}

/** The sentences about one outcome, option by option. */
export interface OutcomeWording {
  readonly outcomeId: string;
  readonly name: string;
  readonly kind: 'benefit' | 'harm';
  /** The event is one people want. */
  readonly wanted: boolean;
  readonly isHeadline: boolean;
  readonly options: readonly OptionWording[];
}

/** All the wording of a computed topic. */
export interface TopicWording {
  /** Who the numbers are for, from the topic's population; null when it is empty. */
  readonly population: WordingSentence | null;
  readonly outcomes: readonly OutcomeWording[];
}

export interface WordingOptions {
  /** The language; English unless given. */
  readonly catalogue?: WordingMessages;
  /** A reference-class phrase in place of the catalogue's ("people like you"), in its two plural forms. */
  readonly groupPhrase?: { readonly one: string; readonly other: string };
}

/** The reference-class phrase: the caller's, or the catalogue's. */
function groupOf(options: WordingOptions, catalogue: WordingMessages): (count: number) => string {
  const phrase = options.groupPhrase;
  return phrase === undefined ? catalogue.group : (count: number) => (count === 1 ? phrase.one : phrase.other);
}

function contextOf(
  outcome: OutcomeResult,
  option: OptionOutcomeResult,
  period: { readonly years: number; readonly unit: TimeUnit },
  denominator: number,
  options: WordingOptions,
): OptionContext {
  const catalogue = options.catalogue ?? english.wording;
  return { outcome, option, denominator, ...period, catalogue, group: groupOf(options, catalogue) };
}

function optionWording(
  outcome: OutcomeResult,
  option: OptionOutcomeResult,
  period: { readonly years: number; readonly unit: TimeUnit },
  denominator: number,
  options: WordingOptions,
): OptionWording {
  const context = contextOf(outcome, option, period, denominator, options);
  const sentences: (WordingSentence | null)[] = [...frequencySentences(context)];
  if (!option.isComparison) {
    sentences.push(
      changeSentence(context),
      rangeSentence(context),
      certaintySentence(context),
      outcome.kind === 'harm' ? bandSentence(context) : null,
      nntSentence(context),
      relativeSentence(context),
    );
  }
  return {
    optionId: option.optionId,
    name: option.name,
    isComparison: option.isComparison,
    sentences: sentences.filter((found): found is WordingSentence => found !== null),
  };
}

/**
 * The plain wording of a computed topic: for every outcome and option, natural
 * frequencies in both frames, the change as people, its range, a GRADE
 * statement, frequency bands for harms, and NNT and relative sentences for the
 * clinician. Every number comes from the result's rounded people counts (or its
 * NNT and risk ratio), on the topic's one denominator and period.
 *
 * @param result - a computed topic
 * @param options - the catalogue and reference-class phrase to use
 * @returns the sentences, grouped by outcome and option
 * @example topicWording(result).outcomes[0]?.options[0]?.sentences[0]?.kind // => 'event-frame'
 */
export function topicWording(result: TopicResult, options: WordingOptions = {}): TopicWording {
  return {
    population: populationSentence(result, options),
    outcomes: result.outcomes.map((outcome) => ({
      outcomeId: outcome.outcomeId,
      name: outcome.name,
      kind: outcome.kind,
      wanted: outcome.wanted,
      isHeadline: outcome.isHeadline,
      options: outcome.options.map((option) =>
        optionWording(outcome, option, { years: result.periodYears, unit: result.periodUnit }, result.wordsDenominator, options),
      ),
    })),
  };
}

/**
 * Who the numbers are for, as a sentence from the topic's population; null when it is empty.
 *
 * @example populationSentence(result)?.kind // => 'population'
 */
export function populationSentence(result: TopicResult, options: WordingOptions = {}): WordingSentence | null {
  const catalogue = options.catalogue ?? english.wording;
  const population = result.population.trim();
  if (population === '') return null;
  return {
    kind: 'population',
    audience: 'patient',
    outcomeId: null,
    optionId: null,
    text: catalogue.population({ population, group: groupOf(options, catalogue)(2) }),
    numbers: {},
  };
}

export interface HandoutWordingOptions extends WordingOptions {
  /** Show the NNT sentences (clinician wording) on the handout. */
  readonly showNnt: boolean;
  /** Show frequency-band words beside the side-effect numbers. */
  readonly showBands?: boolean;
  /** Show the relative change (always with its absolute numbers). */
  readonly showRelative?: boolean;
}

const FRAME_KINDS: ReadonlySet<SentenceKind> = new Set(['event-frame', 'free-frame']);

/**
 * The handout's sentences in reading order: the population line; then, headline
 * outcome first, every option's two frames (comparison first), followed by each
 * option's change, range and certainty. Bands, NNT and relative sentences appear
 * only when asked for.
 *
 * @param result - a computed topic
 * @param options - which optional sentences to show, and the catalogue
 * @returns the sentences to print
 * @example handoutSentences(result, { showNnt: false }).some((found) => found.kind === 'nnt') // => false
 */
export function handoutSentences(result: TopicResult, options: HandoutWordingOptions): readonly WordingSentence[] {
  const wording = topicWording(result, options);
  const shown = (found: WordingSentence): boolean => {
    if (found.kind === 'nnt' || found.kind === 'nnt-none') return options.showNnt;
    if (found.kind === 'band') return options.showBands === true;
    if (found.kind === 'relative') return options.showRelative === true;
    return found.audience === 'patient';
  };
  const outcomes = [...wording.outcomes].sort((first, second) => Number(second.isHeadline) - Number(first.isHeadline));
  const sentences: WordingSentence[] = wording.population === null ? [] : [wording.population];
  for (const outcome of outcomes) {
    const ordered = [...outcome.options].sort((first, second) => Number(second.isComparison) - Number(first.isComparison));
    for (const option of ordered) sentences.push(...option.sentences.filter((found) => FRAME_KINDS.has(found.kind)));
    for (const option of ordered) {
      sentences.push(...option.sentences.filter((found) => !FRAME_KINDS.has(found.kind) && shown(found)));
    }
  }
  return sentences;
}

/**
 * The handout's short sentences, for pictures whose captions carry the frames: for every
 * outcome (headline first) and every option but the comparison, its change with its range,
 * its certainty statement, and the NNT when asked for, each naming the option once and the
 * outcome as "it" (see `short-sentences.ts`).
 *
 * @param result - a computed topic
 * @param options - whether to show the NNT, and the catalogue
 * @returns the short sentences to print, in reading order
 * @example shortHandoutSentences(result, { showNnt: false })[0]?.kind // => 'short-effect'
 */
export function shortHandoutSentences(result: TopicResult, options: HandoutWordingOptions): readonly WordingSentence[] {
  const outcomes = [...result.outcomes].sort((first, second) => Number(second.isHeadline) - Number(first.isHeadline));
  const period = { years: result.periodYears, unit: result.periodUnit };
  return outcomes.flatMap((outcome) =>
    outcome.options
      .filter((option) => !option.isComparison)
      .flatMap((option) => {
        const context = contextOf(outcome, option, period, result.wordsDenominator, options);
        return [
          shortEffectSentence(context),
          shortCertaintySentence(context),
          options.showNnt ? shortNntSentence(context) : null,
        ].filter((found): found is WordingSentence => found !== null);
      }),
  );
}
