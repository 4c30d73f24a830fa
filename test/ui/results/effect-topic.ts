import type { Topic } from '../../../src/core/topic/topic.ts';
import type { EnteredEffect } from '../../../src/core/types.ts';

/** The inputs of an invented, illustrative topic: one outcome, one option against no treatment. */
export interface EffectTopicSpec {
  readonly baseline: number | string;
  readonly effect: EnteredEffect;
  /** A second outcome's baseline and effect, for a topic where only one outcome is rare. */
  readonly second?: { readonly baseline: number | string; readonly effect: EnteredEffect };
}

const entry = (effect: EnteredEffect) => ({
  optionId: 'tablet',
  effect,
  source: 'invented for the test',
  followUpYears: null,
  certainty: 'moderate' as const,
  importance: 'important' as const,
});

/** An illustrative topic over one year: "a made-up tablet" against "no tablet". */
export function effectTopic(spec: EffectTopicSpec): Topic {
  const second = spec.second;
  return {
    title: 'Illustrative: a made-up tablet',
    population: 'adults with a made-up condition',
    periodYears: 1,
    illustrative: true,
    options: [
      { id: 'none', name: 'no tablet', isComparison: true },
      { id: 'tablet', name: 'the tablet', isComparison: false },
    ],
    outcomes: [
      {
        id: 'bleed',
        name: 'a serious bleed',
        kind: 'benefit',
        isHeadline: true,
        baseline: { risk: spec.baseline, periodYears: 1, source: 'invented' },
        effects: [entry(spec.effect)],
      },
      ...(second === undefined
        ? []
        : [
            {
              id: 'cough',
              name: 'a cough',
              kind: 'harm' as const,
              isHeadline: false,
              baseline: { risk: second.baseline, periodYears: 1, source: 'invented' },
              effects: [entry(second.effect)],
            },
          ]),
    ],
    evidence: { summary: 'invented', reviewed: '2026' },
    questions: [],
    clinician: '',
    patient: null,
  };
}

/** Baseline 0.1% over a year, hazard ratio 0.8 (0.7 to 0.9): a rare outcome. */
export const RARE = effectTopic({ baseline: 0.001, effect: { measure: 'hr', estimate: 0.8, lower: 0.7, upper: 0.9 } });

/** Baseline 30%, risk ratio 0.92 with a 90% interval 0.85 to 0.99. */
export const NINETY = effectTopic({
  baseline: '30%',
  effect: { measure: 'rr', estimate: 0.92, lower: 0.85, upper: 0.99, level: 0.9 },
});
