import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import { TopicError, computeTopic, evaluateTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import type { OptionOutcomeResult, TopicResult } from '../../../src/core/topic/topic-result.ts';

// The demo topics are invented, illustrative scenarios. Expected numbers are derived from their
// entered effects with the Cochrane Handbook 5.1 §12.5.4 formulas, periods converted under a
// constant hazard (Fleurence & Hollenbeak 2007, PharmacoEconomics 25:3), people rounded half up
// (common practice), one denominator per topic (Trevena et al. 2013, BMC Med Inform Decis Mak 13 Suppl 2:S7).

function demo(name: string): Topic {
  const reading = readTopicFile(readFileSync(new URL(`../../../assets/demo/${name}`, import.meta.url), 'utf8'));
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

const STONE = '01-kidney-stone.json';
const SCREENING = '02-bowel-screening.json';
const FRACTURE = '03-fracture-medicine.json';

function entry(result: TopicResult, outcome: number, option: number): OptionOutcomeResult {
  const found = result.outcomes[outcome]?.options[option];
  if (found === undefined) throw new Error(`no option ${option} in outcome ${outcome}`);
  return found;
}
const codes = (result: TopicResult): string[] => result.notices.map((notice) => notice.code);

describe('computeTopic on the demo topics', () => {
  it.each([
    [STONE, 100],
    [SCREENING, 1000],
    [FRACTURE, 100],
  ] as const)('gives %s one denominator, %i, for every outcome and option', (name, denominator) => {
    const result = computeTopic(demo(name));
    expect(result.denominator).toBe(denominator);
    for (const outcome of result.outcomes) {
      for (const option of outcome.options) {
        expect(option.perPeople.denominator).toBe(denominator);
        expect(option.groups.denominator).toBe(denominator);
        const { event, prevented, caused, free } = option.groups;
        expect(event + prevented + caused + free).toBe(denominator);
        expect(prevented === 0 || caused === 0).toBe(true);
      }
    }
  });

  it.each([STONE, SCREENING, FRACTURE])(
    'lists the options of %s in the topic’s order, the comparison as a plain baseline',
    (name) => {
      const topic = demo(name);
      const result = computeTopic(topic);
      for (const outcome of result.outcomes) {
        expect(outcome.options.map((option) => option.optionId)).toEqual(topic.options.map((option) => option.id));
        const comparison = outcome.options.find((option) => option.isComparison);
        expect(comparison).toBeDefined();
        if (comparison === undefined) continue;
        expect(comparison.comparisonRisk.estimate).toBe(outcome.baselineRisk);
        expect(comparison.interventionRisk.estimate).toBe(outcome.baselineRisk);
        expect(comparison.relativeRisk).toEqual({ estimate: 1, lower: null, upper: null });
        expect(comparison.absoluteReduction).toEqual({ estimate: 0, lower: null, upper: null });
        expect(comparison.nnt).toMatchObject({ estimate: null, rounded: null, label: null });
        expect(comparison.groups.prevented + comparison.groups.caused).toBe(0);
        expect(comparison.certainty).toBeNull();
        for (const option of outcome.options) expect(option.comparisonRisk.estimate).toBeCloseTo(outcome.baselineRisk, 12);
      }
    },
  );

  it('computes the kidney stone demo’s numbers for each option', () => {
    const result = computeTopic(demo(STONE));
    expect(result.periodYears).toBe(5);
    expect(result.illustrative).toBe(true);
    // Extra water, RR 0.6 (0.45 to 0.8) at 4 in 10: 24% (18% to 32%), 40 → 24 in 100, NNTB ⌈1/0.16⌉ = 7 (derived).
    const water = entry(result, 0, 1);
    expect(water.interventionRisk.estimate).toBeCloseTo(0.24, 12);
    expect(water.interventionRisk.lower).toBeCloseTo(0.18, 12);
    expect(water.interventionRisk.upper).toBeCloseTo(0.32, 12);
    expect(water.perPeople).toMatchObject({ comparison: 40, intervention: 24, difference: 16 });
    expect(water.nnt).toMatchObject({ rounded: 7, label: 'NNTB' });
    expect(water.groups).toEqual({ denominator: 100, event: 24, prevented: 16, caused: 0, free: 60 });
    expect(water.certainty).toBe('moderate');
    // An upset stomach is a harm given as an odds ratio: OR 2.6 at 5% with the citrate drink →
    // 2.6 × 0.05 / (0.95 + 2.6 × 0.05) = 12.04% (risk from odds, common practice), 5 → 12 in 100,
    // 1/0.0704 = 14.2, rounded down for a harm: NNTH 14 (derived).
    const stomach = entry(result, 2, 2);
    expect(stomach.interventionRisk.estimate).toBeCloseTo(0.13 / 1.08, 12);
    expect(stomach.groups).toEqual({ denominator: 100, event: 5, prevented: 0, caused: 7, free: 88 });
    expect(stomach.nnt).toMatchObject({ rounded: 14, label: 'NNTH' });
    expect(stomach.certainty).toBe('moderate');
    expect(entry(result, 2, 1).importance).toBe('trivial');
    expect(entry(result, 2, 1).certainty).toBe('very-low');
  });

  it('warns once that the intervals leave out the baseline’s uncertainty', () => {
    const result = computeTopic(demo(STONE));
    expect(codes(result)).toEqual(['interval-ignores-baseline-uncertainty']);
  });

  it('converts the screening demo’s 10-year baseline to its 15-year period and says so', () => {
    const result = computeTopic(demo(SCREENING));
    // 2 in 100 over 10 years → 1 − 0.98^1.5 = 2.985% over 15 years.
    const converted = 1 - 0.98 ** 1.5;
    expect(result.outcomes[0]?.baselineRisk).toBeCloseTo(converted, 12);
    // Outcomes already over 15 years are not converted.
    expect(result.outcomes[1]?.baselineRisk).toBe(0.01);
    const notice = result.notices.find((found) => found.code === 'baseline-period-converted');
    expect(notice?.values).toMatchObject({ risk: 0.02, from: 10, to: 15 });
    expect(Number(notice?.values.converted)).toBeCloseTo(converted, 12);
    // 1 − (1 − p)^0.8 for a hazard ratio (Altman & Andersen 1999, BMJ 319:1492): 30 → 24 in 1000.
    const screening = entry(result, 0, 1);
    expect(screening.interventionRisk.estimate).toBeCloseTo(1 - (1 - converted) ** 0.8, 12);
    expect(screening.perPeople).toMatchObject({ comparison: 30, intervention: 24, difference: 6 });
  });

  it('warns when the period is longer than the follow-up, naming the option and outcome', () => {
    const result = computeTopic(demo(SCREENING));
    const beyond = result.notices.filter((found) => found.code === 'period-beyond-followup');
    expect(beyond).toEqual([
      {
        code: 'period-beyond-followup',
        values: {
          period: 15,
          periodUnit: 'years',
          followup: 12,
          followupUnit: 'years',
          option: 'screening',
          outcome: 'dying of bowel cancer',
        },
      },
    ]);
  });

  it('raises the screening demo to 1000, because per 100 its bleeding harm would show as 0 people', () => {
    const result = computeTopic(demo(SCREENING));
    expect(codes(result)).toContain('denominator-raised');
    // 5 per 10000 = 0.05% → 0.5 → 1 in 1000 (rounded half up); with the test 0.15% → 2 in 1000.
    expect(entry(result, 2, 1).perPeople).toMatchObject({ comparison: 1, intervention: 2, difference: -1 });
    expect(codes(result)).toEqual(expect.arrayContaining(['hr-proportional-hazards', 'baseline-period-converted']));
  });

  it('keeps a denominator that is asked for, without the notice', () => {
    const result = computeTopic(demo(SCREENING), { per: 100 });
    expect(result.denominator).toBe(100);
    expect(codes(result)).not.toContain('denominator-raised');
    const stone = computeTopic(demo(STONE), { per: 1000 });
    // 0.13 / 1.08 × 1000 = 120.4 → 120 (rounded half up); the comparison 5% → 50.
    expect(entry(stone, 2, 2).perPeople).toMatchObject({ denominator: 1000, comparison: 50, intervention: 120, difference: -70 });
  });

  it('uses the trial’s comparison arm as the baseline when none is given, and says so', () => {
    const result = computeTopic(demo(FRACTURE));
    // 91/1000 and 52/1000: the risk ratio 52/91 applied at 9.1% gives back 5.2%.
    expect(result.outcomes[0]?.baselineRisk).toBeCloseTo(0.091, 12);
    const weekly = entry(result, 0, 1);
    expect(weekly.interventionRisk.estimate).toBeCloseTo(0.052, 12);
    expect(weekly.relativeRisk?.estimate).toBeCloseTo(52 / 91, 12);
    // Comparison − option = 0.039 → NNTB 26 (1/0.039 = 25.6).
    expect(weekly.nnt).toMatchObject({ rounded: 26, label: 'NNTB' });
    expect(result.notices).toContainEqual({ code: 'counts-baseline-from-trial', values: { outcome: 'another broken bone' } });
    // The second outcome has its own baseline of 1 in 10: no trial-baseline notice for it.
    expect(result.outcomes[1]?.baselineRisk).toBe(0.1);
    expect(result.notices.filter((found) => found.code === 'counts-baseline-from-trial')).toHaveLength(1);
  });

  it('converts a trial baseline to the topic’s period too', () => {
    const topic = demo(FRACTURE);
    const first = topic.outcomes[0];
    if (first === undefined) throw new Error('no outcome');
    const changed: Topic = { ...topic, periodYears: 6, outcomes: [first] };
    const result = computeTopic(changed);
    // 9.1% over 3 years → 1 − 0.909² = 17.37% over 6 years (constant hazard).
    expect(result.outcomes[0]?.baselineRisk).toBeCloseTo(1 - 0.909 ** 2, 12);
    expect(codes(result)).toEqual(
      expect.arrayContaining(['baseline-period-converted', 'counts-baseline-from-trial', 'period-beyond-followup']),
    );
  });
});

describe('evaluateTopic on a topic with problems', () => {
  it('returns every problem instead of a result', () => {
    const topic: Topic = { ...demo(STONE), title: '', periodYears: -1 };
    const evaluation = evaluateTopic(topic);
    expect(evaluation.ok).toBe(false);
    expect(evaluation.result).toBeNull();
    expect(evaluation.problems.map((found) => found.field)).toEqual(['title', 'periodYears']);
  });

  it('throws a TopicError carrying the problems from computeTopic', () => {
    const topic: Topic = { ...demo(STONE), title: '' };
    expect(() => computeTopic(topic)).toThrow(TopicError);
    try {
      computeTopic(topic);
    } catch (error) {
      expect(error instanceof TopicError && error.problems.map((found) => found.code)).toEqual(['topic-text-missing']);
    }
  });

  it('returns no problems and a result for a valid topic', () => {
    const evaluation = evaluateTopic(demo(STONE));
    expect(evaluation.ok).toBe(true);
    expect(evaluation.problems).toEqual([]);
    expect(evaluation.result?.title).toBe(demo(STONE).title);
  });
});
