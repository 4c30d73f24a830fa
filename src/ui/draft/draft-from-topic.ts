import { amountIn } from '../../core/time-unit.ts';
import type { TimeUnit } from '../../core/time-unit.ts';
import { DEFAULT_HANDOUT_CHOICES, EMPTY_DISCLOSURES } from '../../core/topic/topic.ts';
import type { OptionEffect, RiskInput, Topic, TopicOutcome } from '../../core/topic/topic.ts';
import { numberText } from './number-text.ts';
import { EMPTY_SCREENING, blankEffect } from './topic-draft.ts';
import type { EffectDraft, OutcomeDraft, TopicDraft } from './topic-draft.ts';

const optionalNumber = (value: number | null | undefined): string =>
  value === null || value === undefined ? '' : numberText(value);

/** An absolute reduction is edited in percentage points (3 means 3%), stored as a proportion. */
const percentagePoints = (value: number | null | undefined): string =>
  value === null || value === undefined ? '' : numberText(value * 100);

/** A period stored in years, as the amount of the unit it was given in. */
const periodText = (years: number, unit: TimeUnit): string => numberText(amountIn(years, unit));

function effectDraft(entry: OptionEffect): EffectDraft {
  const followUpUnit = entry.followUpUnit ?? 'years';
  const base = {
    ...blankEffect(entry.optionId),
    source: entry.source,
    followUpYears: entry.followUpYears === null ? '' : periodText(entry.followUpYears, followUpUnit),
    followUpUnit,
    opposite: entry.effect.opposite === true,
    certainty: entry.certainty,
    importance: entry.importance,
  };
  const { effect } = entry;
  if (effect.measure === 'counts') {
    return {
      ...base,
      measure: 'counts',
      level: effect.level ?? null,
      interventionEvents: numberText(effect.intervention.events),
      interventionTotal: numberText(effect.intervention.total),
      comparisonEvents: numberText(effect.comparison.events),
      comparisonTotal: numberText(effect.comparison.total),
    };
  }
  const shown = effect.measure === 'arr' ? percentagePoints : optionalNumber;
  return {
    ...base,
    measure: effect.measure,
    level: effect.level ?? null,
    estimate: shown(effect.estimate),
    lower: shown(effect.lower),
    upper: shown(effect.upper),
  };
}

function outcomeDraft(outcome: TopicOutcome): OutcomeDraft {
  const risk = outcome.baseline.risk;
  return {
    id: outcome.id,
    name: outcome.name,
    kind: outcome.kind,
    wanted: outcome.wanted === true,
    isHeadline: outcome.isHeadline,
    baselineRisk: riskText(risk),
    baselinePeriodYears: periodText(outcome.baseline.periodYears, outcome.baseline.periodUnit ?? 'years'),
    baselinePeriodUnit: outcome.baseline.periodUnit ?? 'years',
    baselineSource: outcome.baseline.source,
    effects: outcome.effects.map(effectDraft),
  };
}

/** A risk as the editor shows it: as typed, or a stored proportion as its number. */
const riskText = (risk: RiskInput | null): string => (risk === null ? '' : typeof risk === 'number' ? numberText(risk) : risk);

/** The editor's copy of a topic, every number as text. */
export function draftFromTopic(topic: Topic): TopicDraft {
  return {
    title: topic.title,
    population: topic.population,
    periodYears: periodText(topic.periodYears, topic.periodUnit ?? 'years'),
    periodUnit: topic.periodUnit ?? 'years',
    illustrative: topic.illustrative,
    options: topic.options.map((option) => ({ id: option.id, name: option.name, isComparison: option.isComparison })),
    outcomes: topic.outcomes.map(outcomeDraft),
    evidenceSummary: topic.evidence.summary,
    evidenceReviewed: topic.evidence.reviewed,
    questions: [...topic.questions],
    clinician: topic.clinician,
    patientName: topic.patient?.name ?? '',
    patientReference: topic.patient?.reference ?? '',
    handout: topic.handout ?? DEFAULT_HANDOUT_CHOICES,
    about: topic.about ?? EMPTY_DISCLOSURES,
    screening:
      topic.screening === undefined
        ? EMPTY_SCREENING
        : {
            positiveLeadsTo: topic.screening.positiveLeadsTo,
            missedCase: riskText(topic.screening.missedCase),
            overdiagnosis: riskText(topic.screening.overdiagnosis),
          },
    language: topic.language ?? 'en',
    translation: topic.translation ?? null,
  };
}
