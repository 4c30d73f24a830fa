/**
 * Turning the editor's text back into a topic. Every number that cannot be read gives a
 * problem on its own field; the topic still comes back whole (with NaN standing in for
 * the unreadable numbers) so that the core can check everything else at the same time.
 * Periods are typed in a unit and stored in years, with the unit beside them. What is
 * the default (years, an event to avoid, an effect on the event itself) is left out, so a
 * topic that uses none of them reads and writes as it always did.
 */
import { EFFECT_MEASURES } from '../../core/effect-measures.ts';
import { checkArm } from '../../core/counts/check-arm.ts';
import { parseNumber } from '../../core/parse-number.ts';
import { InputError, problem } from '../../core/problems.ts';
import type { Problem } from '../../core/problems.ts';
import { yearsFrom } from '../../core/time-unit.ts';
import { readLanguageTag } from '../../core/topic/topic-language.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import { DEFAULT_HANDOUT_CHOICES } from '../../core/topic/topic.ts';
import type { OptionEffect, Topic, TopicDisclosures, TopicHandoutChoices, TopicOutcome } from '../../core/topic/topic.ts';
import type { Effect } from '../../core/types.ts';
import { blankEffect } from './topic-draft.ts';
import type { EffectDraft, OutcomeDraft, ScreeningDraft, TopicDraft } from './topic-draft.ts';

/** A topic built from a draft, and the problems found while reading its numbers. */
export interface DraftReading {
  readonly topic: Topic;
  /** Numbers that could not be read; empty when the topic can be written to a file. */
  readonly problems: readonly Problem[];
  /** For each question of the topic, its place in the draft (blank questions are left out). */
  readonly questionPlaces: readonly number[];
}

interface Reader {
  readonly problems: Problem[];
}

const sameChoices = (first: TopicHandoutChoices, second: TopicHandoutChoices): boolean =>
  first.showNnt === second.showNnt &&
  first.per === second.per &&
  first.outline === second.outline &&
  first.paper === second.paper;

function readNumber(reader: Reader, text: string, field: string, what: string, example: string): number {
  if (text.trim() === '') {
    reader.problems.push(problem('number-missing', field, { what, example }));
    return Number.NaN;
  }
  try {
    return parseNumber(text.replace(/%\s*$/, ''), field);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    reader.problems.push(error.problem);
    return Number.NaN;
  }
}

function readOptional(reader: Reader, text: string, field: string): number | null {
  if (text.trim() === '') return null;
  return readNumber(reader, text, field, 'number', '10');
}

/** A period typed in a unit, in years. */
function readPeriod(reader: Reader, text: string, unit: TimeUnit, field: string, what: string): number {
  return yearsFrom(readNumber(reader, text, field, what, unit === 'years' ? '10' : '3'), unit);
}

/** The unit field of a topic, baseline or follow-up: left out when it is years. */
function unitField<Name extends string>(name: Name, unit: TimeUnit): Partial<Record<Name, TimeUnit>> {
  return unit === 'years' ? {} : ({ [name]: unit } as Record<Name, TimeUnit>);
}

/** `opposite: true` when the effect was given for the opposite event; nothing otherwise. */
const oppositeField = (draft: EffectDraft): { opposite?: true } => (draft.opposite ? { opposite: true } : {});

function readEntered(reader: Reader, draft: EffectDraft, field: string): Effect {
  const measure = draft.measure === 'counts' ? 'rr' : draft.measure;
  // An absolute reduction is typed in percentage points; the core takes a proportion.
  const scale = measure === 'arr' ? 0.01 : 1;
  const scaled = (value: number | null): number | null => (value === null ? null : value * scale);
  const example = EFFECT_MEASURES[measure].example.estimate;
  const estimate = readNumber(reader, draft.estimate, `${field}.estimate`, 'effect estimate', example);
  const lower = readOptional(reader, draft.lower, `${field}.lower`);
  const upper = readOptional(reader, draft.upper, `${field}.upper`);
  return {
    measure,
    estimate: estimate * scale,
    lower: scaled(lower),
    upper: scaled(upper),
    ...(draft.level === null ? {} : { level: draft.level }),
    ...oppositeField(draft),
  };
}

function readArm(reader: Reader, events: string, total: string, field: string) {
  const arm = {
    events: readNumber(reader, events, `${field}.events`, 'number of people with the outcome', '12'),
    total: readNumber(reader, total, `${field}.total`, 'number of people in the arm', '100'),
  };
  if (Number.isNaN(arm.events) || Number.isNaN(arm.total)) return arm;
  try {
    checkArm(arm, field);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    reader.problems.push(error.problem);
  }
  return arm;
}

function readEffect(reader: Reader, draft: EffectDraft, field: string): OptionEffect {
  const effectField = `${field}.effect`;
  const effect: Effect =
    draft.measure === 'counts'
      ? {
          measure: 'counts',
          intervention: readArm(reader, draft.interventionEvents, draft.interventionTotal, `${effectField}.intervention`),
          comparison: readArm(reader, draft.comparisonEvents, draft.comparisonTotal, `${effectField}.comparison`),
          ...(draft.level === null ? {} : { level: draft.level }),
          ...oppositeField(draft),
        }
      : readEntered(reader, draft, effectField);
  const followUp = readOptional(reader, draft.followUpYears, `${field}.followUpYears`);
  return {
    optionId: draft.optionId,
    effect,
    source: draft.source,
    followUpYears: followUp === null ? null : yearsFrom(followUp, draft.followUpUnit),
    ...unitField('followUpUnit', draft.followUpUnit),
    certainty: draft.certainty,
    importance: draft.importance,
  };
}

function readOutcome(reader: Reader, draft: OutcomeDraft, index: number, effectOptionIds: readonly string[]): TopicOutcome {
  const field = `outcomes.${index}`;
  const effects = effectOptionIds.map((optionId, effectIndex) => {
    const entry = draft.effects.find((candidate) => candidate.optionId === optionId) ?? blankEffect(optionId);
    return readEffect(reader, entry, `${field}.effects.${effectIndex}`);
  });
  return {
    id: draft.id,
    name: draft.name,
    kind: draft.kind,
    ...(draft.wanted ? { wanted: true } : {}),
    isHeadline: draft.isHeadline,
    baseline: {
      risk: draft.baselineRisk.trim() === '' ? null : draft.baselineRisk,
      periodYears: readPeriod(
        reader,
        draft.baselinePeriodYears,
        draft.baselinePeriodUnit,
        `${field}.baseline.periodYears`,
        'period of the baseline risk',
      ),
      ...unitField('periodUnit', draft.baselinePeriodUnit),
      source: draft.baselineSource,
    },
    effects,
  };
}

/** The disclosures, left out while every one is empty, so a topic without them reads back as it was. */
function aboutField(about: TopicDisclosures): { about?: TopicDisclosures } {
  return Object.values(about).every((value) => value.trim() === '') ? {} : { about: { ...about } };
}

/** The screening section, left out while nothing of it is typed; an empty chance is not given (null). */
function screeningField(screening: ScreeningDraft): Pick<Topic, 'screening'> {
  if (Object.values(screening).every((value) => value.trim() === '')) return {};
  const chance = (text: string) => (text.trim() === '' ? null : text);
  return {
    screening: {
      positiveLeadsTo: screening.positiveLeadsTo,
      missedCase: chance(screening.missedCase),
      overdiagnosis: chance(screening.overdiagnosis),
    },
  };
}

/**
 * The language field: an English topic names none, so it reads back as older files do; a tag
 * Chancewise cannot write is a problem on the field, as a file naming it could not be opened again.
 */
function languageField(reader: Reader, tag: string): Pick<Topic, 'language'> {
  const trimmed = tag.trim();
  if (trimmed === '' || trimmed === 'en') return {};
  const reading = readLanguageTag(trimmed);
  if (!reading.ok)
    reader.problems.push(problem('topic-language-unsupported', 'language', { language: trimmed, reason: reading.reason }));
  return { language: trimmed };
}

/** The options whose effects the topic holds, in order: every option but the comparison. */
export function effectOptionIds(draft: TopicDraft): string[] {
  return draft.options.filter((option) => !option.isComparison).map((option) => option.id);
}

/**
 * Build the topic a draft describes. Outcome `i` of the topic is outcome `i` of the draft,
 * and effect `j` of each outcome belongs to the `j`th option that is not the comparison, so
 * every problem's field can be traced back to what the person typed.
 */
export function topicFromDraft(draft: TopicDraft): DraftReading {
  const reader: Reader = { problems: [] };
  const ids = effectOptionIds(draft);
  const periodYears = readPeriod(reader, draft.periodYears, draft.periodUnit, 'periodYears', 'period');
  const outcomes = draft.outcomes.map((outcome, index) => readOutcome(reader, outcome, index, ids));
  const questionPlaces = draft.questions.flatMap((question, place) => (question.trim() === '' ? [] : [place]));
  const patientGiven = draft.patientName.trim() !== '' || draft.patientReference.trim() !== '';
  const topic: Topic = {
    title: draft.title,
    population: draft.population,
    periodYears,
    ...unitField('periodUnit', draft.periodUnit),
    options: draft.options.map((option) => ({ ...option })),
    outcomes,
    illustrative: draft.illustrative,
    evidence: { summary: draft.evidenceSummary, reviewed: draft.evidenceReviewed },
    questions: questionPlaces.map((place) => draft.questions[place] ?? ''),
    clinician: draft.clinician,
    patient: patientGiven ? { name: draft.patientName, reference: draft.patientReference } : null,
    // The default choices are left out, so a topic without stored choices reads back as it was.
    ...(sameChoices(draft.handout, DEFAULT_HANDOUT_CHOICES) ? {} : { handout: draft.handout }),
    ...aboutField(draft.about),
    ...screeningField(draft.screening),
    ...languageField(reader, draft.language),
    ...(draft.translation === null ? {} : { translation: draft.translation }),
  };
  return { topic, problems: reader.problems, questionPlaces };
}
