/**
 * An invented, illustrative topic whose headline outcome is an event people want: pain
 * gone by day 3 after a back-pain flare, 25% with usual advice, risk ratio 1.8 (1.4 to 2.3)
 * with a tablet. A second wanted outcome and one side effect. Not real data.
 */
import type { Topic } from '../../src/core/topic/topic.ts';
import { yearsFrom } from '../../src/core/time-unit.ts';

const days = (count: number) => ({ years: yearsFrom(count, 'days'), unit: 'days' as const });
const threeDays = days(3);

const effect = (estimate: number, lower: number, upper: number) => ({
  optionId: 'tablet',
  effect: { measure: 'rr' as const, estimate, lower, upper },
  source: 'Invented for tests',
  followUpYears: threeDays.years,
  followUpUnit: threeDays.unit,
  certainty: 'moderate' as const,
  importance: 'important' as const,
});

const baseline = (risk: string) => ({
  risk,
  periodYears: threeDays.years,
  periodUnit: threeDays.unit,
  source: 'Invented comparison-arm rate',
});

/** The topic, with the period given in days. */
export function wantedTopic(): Topic {
  return {
    title: 'A tablet for a back-pain flare (illustrative example)',
    population: 'adults with a new flare of low back pain',
    periodYears: threeDays.years,
    periodUnit: threeDays.unit,
    illustrative: true,
    options: [
      { id: 'none', name: 'usual advice', isComparison: true },
      { id: 'tablet', name: 'tablet B', isComparison: false },
    ],
    outcomes: [
      {
        id: 'pain-gone',
        name: 'pain gone by day 3',
        kind: 'benefit',
        wanted: true,
        isHeadline: true,
        baseline: baseline('25%'),
        effects: [effect(1.8, 1.4, 2.3)],
      },
      {
        id: 'activities',
        name: 'a return to usual activities',
        kind: 'benefit',
        wanted: true,
        isHeadline: false,
        baseline: baseline('40%'),
        effects: [effect(1.3, 1.1, 1.5)],
      },
      {
        id: 'stomach',
        name: 'an upset stomach',
        kind: 'harm',
        isHeadline: false,
        baseline: baseline('5%'),
        effects: [effect(2, 1.3, 3)],
      },
    ],
    evidence: { summary: 'Invented numbers for tests.', reviewed: '2026-11-01' },
    questions: ['How much does getting back to normal quickly matter to me?'],
    clinician: '',
  };
}
