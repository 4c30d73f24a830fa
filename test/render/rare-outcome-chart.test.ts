/**
 * Charts of rare outcomes: the pictures stay at 1000 people, and a difference too small to
 * show as a whole person is said in words beside the picture, never as "the same number".
 * The risk with a hazard ratio is 1 − (1 − p)^HR (Altman & Andersen 1999, BMJ 319:1492;
 * Cochrane Handbook 5.1, §12.5.4); people are rounded half up (common practice).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import type { EnteredEffect } from '../../src/core/types.ts';
import { outcomeChart, pairChart } from '../../src/render/chart-model.ts';

function rareTopic(baseline: number, effect: EnteredEffect, wanted = false): Topic {
  return {
    title: 'A tablet and a rare serious bleed (illustrative)',
    population: 'people like you',
    periodYears: 5,
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
        wanted,
        isHeadline: true,
        baseline: { risk: baseline, periodYears: 5, source: 'Invented' },
        effects: [
          { optionId: 'tablet', effect, source: 'Invented', followUpYears: 5, certainty: 'moderate', importance: 'important' },
        ],
      },
    ],
    evidence: { summary: 'Invented.', reviewed: '2026-11-01' },
    questions: [],
    clinician: '',
  };
}

describe('a rare outcome: baseline 0.1%, hazard ratio 0.8 (0.7 to 0.9)', () => {
  // Derived: 1 − 0.999^0.8 = 0.000800, per 1000 both 1 person; per 10,000 10 and 8, so 2 fewer.
  // The limits 1 − 0.999^0.7 = 0.000700 and 1 − 0.999^0.9 = 0.000900: 7 and 9 in 10,000, 1 and 1 in 1000.
  const result = computeTopic(rareTopic(0.001, { measure: 'hr', estimate: 0.8, lower: 0.7, upper: 0.9 }));
  const model = outcomeChart(result, 'bleed');
  const option = model.arrays[1]!;

  it('keeps the pictures at 1000 people, each showing 1 with a serious bleed', () => {
    expect(model.denominator).toBe(1000);
    expect(option.groups).toEqual({ denominator: 1000, event: 1, prevented: 0, caused: 0, free: 999 });
  });

  it('says beside the picture that the difference is fewer than 1 in 1000, and what it is per 10,000', () => {
    expect(option.note).toBe(
      'Fewer than 1 in 1000: about 2 in 10,000 fewer have a serious bleed with the tablet, too few to show as a whole person here.',
    );
  });

  it('says the range is less than one person of these 1000, with its ends per 10,000 and its level', () => {
    expect(option.range?.text).toBe(
      'With the tablet, the range (95% interval) is less than one person of these 1000: anywhere between 7 and 9 in 10,000 could have a serious bleed.',
    );
  });

  it('never says "the same number" nor "between 1 and 1", in the text alternative either', () => {
    expect(model.description).not.toMatch(/same number/i);
    expect(model.description).not.toContain('between 1 and 1 ');
    expect(model.description).toContain('about 2 in 10,000 fewer');
  });

  it('names another level when the effect gives one: 90%', () => {
    const ninety = computeTopic(rareTopic(0.001, { measure: 'hr', estimate: 0.8, lower: 0.72, upper: 0.89, level: 0.9 }));
    expect(outcomeChart(ninety, 'bleed').arrays[1]!.range?.text).toContain('the range (90% interval)');
  });
});

describe('"the same number" only for an exact difference of 0', () => {
  it('keeps it for a ratio of exactly 1', () => {
    const result = computeTopic(rareTopic(0.001, { measure: 'rr', estimate: 1 }));
    expect(outcomeChart(result, 'bleed').arrays[1]!.note).toBe(
      'The same number have a serious bleed with and without the tablet.',
    );
  });

  // Property: over baselines from 1 in a million to 2% and ratios from 0.5 to 2 (never 1), the
  // exact difference is not 0, so no chart text says "the same number"; when the picture shows
  // no one changed, a note says so in words. Cheap, so 10,000 runs.
  it('never says it for a difference that is not 0, over small baselines', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 0.02, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }).filter((ratio) => Math.abs(ratio - 1) > 1e-6),
        fc.constantFrom<EnteredEffect['measure']>('rr', 'hr', 'or'),
        fc.boolean(),
        (baseline, ratio, measure, wanted) => {
          const result = computeTopic(rareTopic(baseline, { measure, estimate: ratio }, wanted));
          const option = result.outcomes[0]!.options[1]!;
          fc.pre(option.absoluteReduction.estimate !== 0);
          const model = outcomeChart(result, 'bleed');
          expect(model.description).not.toMatch(/same number/i);
          const array = model.arrays[1]!;
          const shown = array.groups.prevented + array.groups.caused;
          if (shown === 0) expect(array.note).toMatch(/^Fewer than 1 in 1000\b/);
          else expect(array.note).toBeNull();
        },
      ),
      { numRuns: 10000 },
    );
  });

  it('says a bare pair’s hidden difference in words too', () => {
    // Derived: 0.12% and 0.1% are both 1 of 1000 (rounded half up) and 12 and 10 of 10,000.
    const perPeople = { denominator: 1000 as const, comparison: 1, intervention: 1, difference: 0, interventionRange: null };
    const model = pairChart({ perPeople, risks: { comparison: 0.0012, intervention: 0.001 } });
    expect(model.arrays[1]!.note).toBe(
      'Fewer than 1 in 1000: about 2 in 10,000 fewer have the outcome with the option, too few to show as a whole person here.',
    );
    const same = pairChart({ perPeople, risks: { comparison: 0.001, intervention: 0.001 } });
    expect(same.arrays[1]!.note).toBe('The same number have the outcome with and without the option.');
  });
});
