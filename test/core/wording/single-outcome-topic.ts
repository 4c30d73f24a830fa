import type { Topic } from '../../../src/core/topic/topic.ts';
import { yearsFrom } from '../../../src/core/time-unit.ts';
import type { TimeUnit } from '../../../src/core/time-unit.ts';
import type { EffectMeasure } from '../../../src/core/types.ts';

/** The inputs of a one-outcome, one-option topic. */
export interface Spec {
  readonly wanted: boolean;
  readonly kind: 'benefit' | 'harm';
  readonly measure: EffectMeasure;
  readonly estimate: number;
  readonly lower: number;
  readonly upper: number;
  readonly baseline: number;
  readonly period?: { readonly amount: number; readonly unit: TimeUnit };
}

/** One outcome, one option against no treatment: an invented, illustrative topic. */
export function topicOf(spec: Spec): Topic {
  const period = spec.period ?? { amount: 1, unit: 'years' as const };
  const years = yearsFrom(period.amount, period.unit);
  return {
    title: 'Illustrative: a made-up treatment',
    population: 'adults with a made-up condition',
    periodYears: years,
    periodUnit: period.unit,
    illustrative: true,
    options: [
      { id: 'none', name: 'no treatment', isComparison: true },
      { id: 'drops', name: 'the drops', isComparison: false },
    ],
    outcomes: [
      {
        id: 'relief',
        name: 'pain relief',
        kind: spec.kind,
        wanted: spec.wanted,
        isHeadline: true,
        baseline: { risk: spec.baseline, periodYears: years, periodUnit: period.unit, source: 'invented' },
        effects: [
          {
            optionId: 'drops',
            effect: { measure: spec.measure, estimate: spec.estimate, lower: spec.lower, upper: spec.upper },
            source: 'invented',
            followUpYears: null,
            certainty: 'moderate',
            importance: 'important',
          },
        ],
      },
    ],
    evidence: { summary: 'invented', reviewed: '2026' },
    questions: [],
    clinician: '',
    patient: null,
  };
}
