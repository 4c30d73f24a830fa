import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { changeRangeWords, changeWords, keyNumberTables } from '../../../src/ui/results/key-numbers.ts';

/** One benefit: a tablet with RR 0.92 (0.85 to 1.0) against no tablet at a 30% risk over 5 years. */
const topic: Topic = {
  title: 'A tablet',
  population: 'adults',
  periodYears: 5,
  illustrative: true,
  options: [
    { id: 'none', name: 'no tablet', isComparison: true },
    { id: 'tablet', name: 'the tablet', isComparison: false },
  ],
  outcomes: [
    {
      id: 'event',
      name: 'a stroke',
      kind: 'benefit',
      isHeadline: true,
      baseline: { risk: '30%', periodYears: 5, source: '' },
      effects: [
        {
          optionId: 'tablet',
          effect: { measure: 'rr', estimate: 0.92, lower: 0.85, upper: 0.99 },
          source: '',
          followUpYears: 5,
          certainty: 'moderate',
          importance: 'important',
        },
      ],
    },
  ],
  evidence: { summary: '', reviewed: '' },
  questions: [],
  clinician: '',
  patient: null,
};

describe('key numbers', () => {
  test('words a change in people by its direction', () => {
    expect([changeWords(4), changeWords(-2), changeWords(0)]).toEqual(['4 fewer', '2 more', 'no change']);
  });

  test('words the range of a change, also when it crosses no difference', () => {
    expect(changeRangeWords(15, { lower: 10, upper: 12 })).toBe('3 to 5 fewer');
    expect(changeRangeWords(5, { lower: 5, upper: 7 })).toBe('0 to 2 more');
    expect(changeRangeWords(10, { lower: 8, upper: 11 })).toBe('2 fewer to 1 more');
  });

  test('tabulates the Cochrane worked example: 24 fewer in 1000 and NNTB 42', () => {
    // Cochrane Handbook 5.1 (Higgins & Green 2011), §12.5.4.2: RR 0.92 at an assumed control risk of 30%.
    const [table] = keyNumberTables(computeTopic(topic, { per: 1000 }));
    expect(table?.rows.map((row) => row.name)).toEqual(['no tablet', 'the tablet']);
    expect(table?.rows[0]?.people).toEqual({ value: '300', range: null });
    expect(table?.rows[1]?.people.value).toBe('276');
    expect(table?.rows[1]?.change?.value).toBe('24 fewer');
    expect(table?.rows[1]?.nnt?.value).toBe('NNTB 42');
    expect(table?.rows[1]?.risk.value).toBe('27.6%');
  });

  test('gives a wanted event made more likely as more people, with NNTB at both ends of its range', () => {
    // 40% × 1.25 = 50% (1.1 to 1.4: 44% to 56%): 10 more in 100 (4 to 16 more); NNT = 1/ARR (Altman 1998),
    // 1/0.10 = 10 and 1/0.16 to 1/0.04 = 6.25 to 25, an NNTB rounded up: 7 to 25. A gain of a wanted event helps.
    const outcome = topic.outcomes[0]!;
    const wanted: Topic = {
      ...topic,
      outcomes: [
        {
          ...outcome,
          name: 'a pain-free throat',
          wanted: true,
          baseline: { ...outcome.baseline, risk: '40%' },
          effects: [{ ...outcome.effects[0]!, effect: { measure: 'rr', estimate: 1.25, lower: 1.1, upper: 1.4 } }],
        },
      ],
    };
    const [table] = keyNumberTables(computeTopic(wanted, { per: 100 }));
    expect(table?.wanted).toBe(true);
    expect(table?.rows[1]?.people).toEqual({ value: '50', range: '44 to 56' });
    expect(table?.rows[1]?.change).toEqual({ value: '10 more', range: '4 to 16 more' });
    expect(table?.rows[1]?.nnt).toEqual({ value: 'NNTB 10', range: 'NNTB 7 to 25' });
  });

  test('marks an event to avoid as not wanted', () => {
    expect(keyNumberTables(computeTopic(topic, { per: 1000 }))[0]?.wanted).toBe(false);
  });
});
