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

const HEART = '01-heart-tablet.json';
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
    [HEART, 100],
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

  it.each([HEART, SCREENING, FRACTURE])('lists the options of %s in the topic’s order, the comparison as a plain baseline', (name) => {
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
  });

  it('computes the heart demo’s numbers for each dose', () => {
    const result = computeTopic(demo(HEART));
    expect(result.periodYears).toBe(10);
    expect(result.illustrative).toBe(true);
    // Standard dose, RR 0.75 (0.68 to 0.83) at 15%: 11.25% (10.2% to 12.45%), 15 → 11 in 100, NNTB 27.
    const standard = entry(result, 0, 1);
    expect(standard.interventionRisk.estimate).toBeCloseTo(0.1125, 12);
    expect(standard.interventionRisk.lower).toBeCloseTo(0.102, 12);
    expect(standard.interventionRisk.upper).toBeCloseTo(0.1245, 12);
    expect(standard.perPeople).toMatchObject({ comparison: 15, intervention: 11, difference: 4 });
    expect(standard.nnt).toMatchObject({ rounded: 27, label: 'NNTB' });
    expect(standard.groups).toEqual({ denominator: 100, event: 11, prevented: 4, caused: 0, free: 85 });
    expect(standard.certainty).toBe('high');
    // Diabetes is a harm: RR 1.2 at 8% with the higher dose → 9.6%, 8 → 10 in 100, 1/0.016 = 62.5: NNTH 62 (rounded down for a harm).
    const diabetes = entry(result, 2, 2);
    expect(diabetes.interventionRisk.estimate).toBeCloseTo(0.096, 12);
    expect(diabetes.groups).toEqual({ denominator: 100, event: 8, prevented: 0, caused: 2, free: 90 });
    expect(diabetes.nnt).toMatchObject({ rounded: 62, label: 'NNTH' });
    expect(entry(result, 2, 1).importance).toBe('trivial');
  });

  it('warns once that the intervals leave out the baseline’s uncertainty', () => {
    const result = computeTopic(demo(HEART));
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
      { code: 'period-beyond-followup', values: {
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
    const heart = computeTopic(demo(HEART), { per: 1000 });
    // 0.1125 × 1000 = 112.5 → 113 (rounded half up).
    expect(entry(heart, 0, 1).perPeople).toMatchObject({ denominator: 1000, comparison: 150, intervention: 113, difference: 37 });
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
    expect(codes(result)).toEqual(expect.arrayContaining(['baseline-period-converted', 'counts-baseline-from-trial', 'period-beyond-followup']));
  });
});

describe('evaluateTopic on a topic with problems', () => {
  it('returns every problem instead of a result', () => {
    const topic: Topic = { ...demo(HEART), title: '', periodYears: -1 };
    const evaluation = evaluateTopic(topic);
    expect(evaluation.ok).toBe(false);
    expect(evaluation.result).toBeNull();
    expect(evaluation.problems.map((found) => found.field)).toEqual(['title', 'periodYears']);
  });

  it('throws a TopicError carrying the problems from computeTopic', () => {
    const topic: Topic = { ...demo(HEART), title: '' };
    expect(() => computeTopic(topic)).toThrow(TopicError);
    try {
      computeTopic(topic);
    } catch (error) {
      expect(error instanceof TopicError && error.problems.map((found) => found.code)).toEqual(['topic-text-missing']);
    }
  });

  it('returns no problems and a result for a valid topic', () => {
    const evaluation = evaluateTopic(demo(HEART));
    expect(evaluation.ok).toBe(true);
    expect(evaluation.problems).toEqual([]);
    expect(evaluation.result?.title).toBe(demo(HEART).title);
  });
});
