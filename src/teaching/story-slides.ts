/**
 * The slides that tell one result with people: the decision, the baseline, the same
 * people with the option, who is helped, who is harmed, how sure we are, and the
 * sentences a patient would hear. Every number comes from the computed topic and
 * every patient sentence from the core's wording.
 */
import type { OptionOutcomeResult, OutcomeResult, TopicResult } from '../core/topic/topic-result.ts';
import { topicWording } from '../core/wording/topic-wording.ts';
import type { TopicWording, WordingOptions } from '../core/wording/topic-wording.ts';
import type { SentenceKind } from '../core/wording/wording-sentence.ts';
import { uncertainRanks } from '../render/uncertain-people.ts';
import type { Period, TeachingMessages } from './messages/teaching-messages.ts';
import { changedGroup, peoplePanel, totalsOnly } from './people-panel.ts';
import { benefitOutcome, headlineOutcome } from './presentation-item.ts';
import type { PresentationItem } from './presentation-item.ts';
import type { Callout, PeoplePanel, Slide, SlideLine } from './slide-model.ts';
import { isLessonStep } from './teaching-steps.ts';
import type { StepKind } from './teaching-steps.ts';

/** What every slide builder reads. */
export interface SlideSource {
  readonly item: PresentationItem;
  readonly messages: TeachingMessages;
  /** Which slide of a step that has several (the harm step: one slide per harm), from 0. */
  readonly part: number;
}

/** The comparison's and the presented option's results for one outcome. */
export interface OutcomeArms {
  readonly outcome: OutcomeResult;
  readonly comparison: OptionOutcomeResult;
  readonly option: OptionOutcomeResult;
}

/** The two arms of an outcome, or null when the outcome lacks either. */
export function armsOf(outcome: OutcomeResult | null, optionId: string): OutcomeArms | null {
  if (outcome === null) return null;
  const comparison = outcome.options.find((entry) => entry.isComparison);
  const option = outcome.options.find((entry) => entry.optionId === optionId && !entry.isComparison);
  return comparison === undefined || option === undefined ? null : { outcome, comparison, option };
}

/** A sentence of the core's wording, by outcome, option and kind. */
export function sentenceOf(wording: TopicWording, outcomeId: string, optionId: string, kind: SentenceKind): string | null {
  const outcome = wording.outcomes.find((entry) => entry.outcomeId === outcomeId);
  const option = outcome?.options.find((entry) => entry.optionId === optionId);
  return option?.sentences.find((entry) => entry.kind === kind)?.text ?? null;
}

/** The core's wording in the patient's language. */
function wordingOptions(source: SlideSource): WordingOptions {
  return { catalogue: source.messages.patient.wording };
}

/** A step's heading: a story step's in the topic's language, a format demonstration's in the clinician's. */
export function stepName(kind: StepKind, source: SlideSource): string {
  return isLessonStep(kind) ? source.messages.clinician.stepNames[kind] : source.messages.patient.stepNames[kind];
}

/** A slide with the given parts; everything not given is empty. */
export function slide(kind: StepKind, source: SlideSource, parts: Partial<Omit<Slide, 'kind' | 'illustrative'>>): Slide {
  return {
    kind,
    layout: parts.layout ?? 'words',
    heading: parts.heading ?? stepName(kind, source),
    panels: parts.panels ?? [],
    callouts: parts.callouts ?? [],
    cards: parts.cards ?? [],
    lines: parts.lines ?? [],
    evidence: parts.evidence ?? null,
    illustrative: source.item.result.illustrative,
  };
}

const line = (text: string, tone: SlideLine['tone'] = 'body', look: SlideLine['look'] = null): SlideLine => ({
  text,
  tone,
  look,
});

/** The comparison's array of an outcome. */
export function comparisonPanel(arms: OutcomeArms, source: SlideSource): PeoplePanel {
  return peoplePanel(
    {
      id: 'comparison',
      title: source.messages.patient.capitalise(arms.comparison.name),
      groups: arms.comparison.groups,
      outcome: arms.outcome.name,
      option: arms.option.name,
      wanted: arms.outcome.wanted,
    },
    source.messages.patient,
  );
}

/** The option's array of an outcome: with the change as its own group, or folded into the totals. */
export function optionPanel(
  arms: OutcomeArms,
  source: SlideSource,
  settings: { readonly id?: string; readonly title?: string; readonly totals?: boolean } = {},
): PeoplePanel {
  const groups = settings.totals === true ? totalsOnly(arms.option.groups) : arms.option.groups;
  return peoplePanel(
    {
      id: settings.id ?? 'option',
      title: settings.title ?? source.messages.patient.capitalise(arms.option.name),
      groups,
      outcome: arms.outcome.name,
      option: arms.option.name,
      wanted: arms.outcome.wanted,
    },
    source.messages.patient,
  );
}

/** The topic's period, in the unit it was given in. */
const periodOf = (result: TopicResult): Period => ({ years: result.periodYears, unit: result.periodUnit });

function titleSlide(source: SlideSource): Slide {
  const { topic, result, optionId } = source.item;
  const words = source.messages.patient.title;
  const comparison = topic.options.find((option) => option.isComparison)?.name ?? '';
  const option = topic.options.find((entry) => entry.id === optionId)?.name ?? '';
  const lines: SlideLine[] = [];
  if (result.population.trim() !== '') lines.push(line(words.who(result.population.trim().replace(/[.!?]$/, ''))));
  lines.push(line(words.period(periodOf(result))), line(words.comparing(option, comparison)));
  if (result.illustrative) lines.push(line(words.illustrative, 'notice'));
  lines.push(line(source.messages.clinician.view.keysHint, 'note'));
  return slide('title', source, { heading: topic.title, lines });
}

function baselineSlide(source: SlideSource): Slide {
  const { result, optionId } = source.item;
  const arms = armsOf(headlineOutcome(result), optionId);
  if (arms === null) return slide('baseline', source, {});
  const { comparison, outcome } = arms;
  const words = source.messages.patient.callouts;
  const { denominator } = result;
  const callouts: Callout[] = [
    {
      look: 'event',
      value: words.countIn(comparison.groups.event, denominator),
      text: words.have(comparison.groups.event, outcome.name, periodOf(result)),
    },
    {
      look: 'free',
      value: words.countIn(comparison.groups.free, denominator),
      text: words.doNot(comparison.groups.free, outcome.name),
    },
  ];
  const population = result.population.trim().replace(/[.!?]$/, '');
  const lines = population === '' ? [] : [line(words.peopleLikeYou(denominator, population), 'note')];
  return slide('baseline', source, {
    layout: 'single',
    panels: [comparisonPanel(arms, source)],
    callouts,
    lines,
  });
}

function withOptionSlide(source: SlideSource): Slide {
  const { result, optionId } = source.item;
  const arms = armsOf(headlineOutcome(result), optionId);
  if (arms === null) return slide('with-option', source, {});
  const { comparison, option, outcome } = arms;
  const words = source.messages.patient.callouts;
  const withCount = option.groups.event + option.groups.caused;
  return slide('with-option', source, {
    layout: 'pair',
    panels: [comparisonPanel(arms, source), optionPanel(arms, source, { totals: true })],
    callouts: [
      { look: 'event', value: words.countIn(comparison.groups.event, result.denominator), text: words.without(comparison.name) },
      {
        look: 'event',
        value: words.countIn(withCount, result.denominator),
        text: words.haveWith(withCount, outcome.name, option.name),
      },
    ],
  });
}

/**
 * The people an option changes on one outcome, beside the comparison: those drawn in the
 * helped or harmed look (which group that is follows from whether the event is wanted) and
 * those who have the outcome anyway, as callouts; or one line when the option changes nobody.
 */
function changedPeopleSlide(kind: 'helped' | 'harmed', source: SlideSource, arms: OutcomeArms, heading?: string): Slide {
  const { option, outcome } = arms;
  const words = source.messages.patient.callouts;
  const { denominator } = source.item.result;
  const group = changedGroup(kind, outcome.wanted);
  const changed = option.groups[group];
  const callouts: Callout[] =
    changed > 0
      ? [
          {
            look: kind,
            value: words.countIn(changed, denominator),
            text: words.changedBecause(group, outcome.wanted, changed, outcome.name, option.name),
          },
          {
            look: 'event',
            value: words.countIn(option.groups.event, denominator),
            text: words.anyway(option.groups.event, outcome.name),
          },
        ]
      : [];
  const lines: SlideLine[] = [];
  if (changed === 0) {
    lines.push(line(source.messages.patient.story.noOneChanged(group, outcome.wanted, denominator, outcome.name, option.name)));
    // The option may change people the other way on this outcome: say so, in their own look.
    const other = kind === 'helped' ? 'harmed' : 'helped';
    const otherGroup = changedGroup(other, outcome.wanted);
    const moved = option.groups[otherGroup];
    if (moved > 0) {
      const because = source.messages.patient.callouts.changedBecause(
        otherGroup,
        outcome.wanted,
        moved,
        outcome.name,
        option.name,
      );
      lines.push(line(source.messages.patient.story.instead(words.countIn(moved, denominator), because), 'body', other));
    }
  }
  return slide(kind, source, {
    layout: 'pair',
    ...(heading === undefined ? {} : { heading }),
    panels: [comparisonPanel(arms, source), optionPanel(arms, source)],
    callouts,
    lines,
  });
}

function helpedSlide(source: SlideSource): Slide {
  const { result, optionId } = source.item;
  const arms = armsOf(benefitOutcome(result), optionId);
  if (arms === null) return slide('helped', source, { lines: [line(source.messages.clinician.missing.noBenefit)] });
  return changedPeopleSlide('helped', source, arms);
}

/** The harm of one harm slide: the `part`-th harm the item shows. */
function harmOf(source: SlideSource): OutcomeResult | null {
  const { result, harmIds } = source.item;
  const harmId = harmIds[source.part];
  return result.outcomes.find((outcome) => outcome.outcomeId === harmId) ?? null;
}

function harmedSlide(source: SlideSource): Slide {
  const { optionId, harmIds } = source.item;
  const { patient: messages, clinician } = source.messages;
  const arms = armsOf(harmOf(source), optionId);
  if (arms === null)
    return slide('harmed', source, {
      lines: [line(clinician.missing.noHarm), line(clinician.missing.noHarmPrompt, 'note')],
    });
  const heading = messages.story.partOf(messages.stepNames.harmed, source.part + 1, harmIds.length);
  return changedPeopleSlide('harmed', source, arms, heading);
}

function uncertaintySlide(source: SlideSource): Slide {
  const { result, optionId } = source.item;
  const messages = source.messages.patient;
  const arms = armsOf(benefitOutcome(result) ?? headlineOutcome(result), optionId);
  if (arms === null) return slide('uncertainty', source, {});
  const { option, outcome } = arms;
  const wording = topicWording(result, wordingOptions(source));
  const interval = option.perPeople.interventionRange;
  const span = interval === null ? null : uncertainRanks(interval, option.groups.event + option.groups.caused);
  const panel = peoplePanel(
    {
      id: 'option',
      title: messages.capitalise(option.name),
      groups: option.groups,
      outcome: outcome.name,
      option: option.name,
      wanted: outcome.wanted,
      uncertain: span,
    },
    messages,
  );
  const range =
    sentenceOf(wording, outcome.outcomeId, option.optionId, 'range') ??
    sentenceOf(wording, outcome.outcomeId, option.optionId, 'range-unknown');
  const certainty = sentenceOf(wording, outcome.outcomeId, option.optionId, 'certainty');
  const lines: SlideLine[] = [];
  if (range !== null) lines.push(line(range));
  if (interval !== null && option.level !== null) lines.push(line(messages.story.intervalLevel(option.level * 100), 'note'));
  if (span !== null) lines.push(line(messages.callouts.outlined, 'body', 'uncertain'));
  if (option.certainty !== null) {
    lines.push(line(`${messages.story.certaintyLabel}: ${messages.story.certaintyNames[option.certainty]}`, 'subheading'));
    if (certainty !== null) lines.push(line(certainty));
  }
  return slide('uncertainty', source, { layout: 'single', panels: [panel], lines });
}

/** How many harms one slide of the patient's words holds beside no other outcome, so that it fits a 16:9 screen. */
const HARMS_PER_WORDS_SLIDE = 3;

/** What one slide of the patient's words tells: the headline outcome or not, and which harms. */
export interface PatientWordsPart {
  readonly headline: boolean;
  readonly harmIds: readonly string[];
}

/**
 * The slides of the patient's words: one with the headline outcome and its harm when there is
 * at most one; otherwise the headline on its own, then the harms, a few to a slide.
 */
export function patientWordsParts(item: PresentationItem): readonly PatientWordsPart[] {
  const headlineId = headlineOutcome(item.result)?.outcomeId ?? null;
  const harms = item.harmIds.filter((harmId) => harmId !== headlineId);
  if (harms.length <= 1) return [{ headline: true, harmIds: harms }];
  const parts: PatientWordsPart[] = [{ headline: true, harmIds: [] }];
  for (let start = 0; start < harms.length; start += HARMS_PER_WORDS_SLIDE) {
    parts.push({ headline: false, harmIds: harms.slice(start, start + HARMS_PER_WORDS_SLIDE) });
  }
  return parts;
}

function patientWordsSlide(source: SlideSource): Slide {
  const { item } = source;
  const messages = source.messages.patient;
  const { result, optionId } = item;
  const wording = topicWording(result, wordingOptions(source));
  const lines: SlideLine[] = [];
  const about = (arms: OutcomeArms | null, kinds: readonly (readonly [string, SentenceKind, SentenceKind | null])[]) => {
    if (arms === null) return;
    lines.push(line(messages.story.patientTopics(arms.outcome.name), 'subheading'));
    for (const [armId, kind, joined] of kinds) {
      const first = sentenceOf(wording, arms.outcome.outcomeId, armId, kind);
      const second = joined === null ? null : sentenceOf(wording, arms.outcome.outcomeId, armId, joined);
      const text = [first, second].filter((part): part is string => part !== null).join(' ');
      if (text !== '') lines.push(line(text));
    }
  };
  const parts = patientWordsParts(item);
  const part = parts[source.part] ?? { headline: true, harmIds: [] };
  const headline = armsOf(headlineOutcome(result), optionId);
  if (part.headline && headline !== null) {
    about(headline, [
      [headline.comparison.optionId, 'event-frame', 'free-frame'],
      [optionId, 'event-frame', 'free-frame'],
      [optionId, 'change', null],
      [optionId, 'certainty', null],
    ]);
  }
  for (const harmId of part.harmIds) {
    about(armsOf(result.outcomes.find((outcome) => outcome.outcomeId === harmId) ?? null, optionId), [
      [optionId, 'change', null],
      [optionId, 'certainty', null],
    ]);
  }
  const heading = messages.story.partOf(messages.stepNames['patient-words'], source.part + 1, parts.length);
  return slide('patient-words', source, { heading, lines });
}

/** The story slides, by step. */
export const STORY_SLIDES = {
  title: titleSlide,
  baseline: baselineSlide,
  'with-option': withOptionSlide,
  helped: helpedSlide,
  harmed: harmedSlide,
  uncertainty: uncertaintySlide,
  'patient-words': patientWordsSlide,
} as const satisfies Partial<Record<StepKind, (source: SlideSource) => Slide>>;
