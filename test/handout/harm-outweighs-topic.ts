/**
 * An invented, illustrative topic where a side effect outweighs the benefit: a tablet
 * that leaves about 3 fewer strokes in 1000 over 5 years, and about 40 more serious
 * bleeds in 1000. Not real data.
 */
import type { Topic } from '../../src/core/topic/topic.ts';

export function harmOutweighsTopic(): Topic {
  return {
    title: 'Taking a blood-thinning tablet to lower the chance of a stroke (illustrative)',
    population: 'adults aged 70 to 79 with an irregular heartbeat (invented numbers)',
    periodYears: 5,
    illustrative: true,
    options: [
      { id: 'none', name: 'no tablet', isComparison: true },
      { id: 'tablet', name: 'the tablet', isComparison: false },
    ],
    outcomes: [
      {
        id: 'stroke',
        name: 'a stroke',
        kind: 'benefit',
        isHeadline: true,
        baseline: { risk: 0.03, periodYears: 5, source: 'Invented for tests' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'rr', estimate: 0.9, lower: 0.8, upper: 0.99 },
            source: 'Invented trial, for tests only',
            followUpYears: 5,
            certainty: 'moderate',
            importance: 'important',
          },
        ],
      },
      {
        id: 'bleed',
        name: 'serious bleeding',
        kind: 'harm',
        isHeadline: false,
        baseline: { risk: 0.02, periodYears: 5, source: 'Invented for tests' },
        effects: [
          {
            optionId: 'tablet',
            effect: { measure: 'rr', estimate: 3, lower: 2, upper: 4.5 },
            source: 'Invented trial, for tests only',
            followUpYears: 5,
            certainty: 'high',
            importance: 'important',
          },
        ],
      },
    ],
    evidence: { summary: 'Invented numbers for tests. Not from a real trial.', reviewed: '2026-11-01' },
    questions: [],
    clinician: '',
  };
}
