import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { changeRangeText, changeWords, keyNumberTables, riskPercent } from '../../../src/ui/results/key-numbers.ts';
import { levelText, rangesNote } from '../../../src/ui/results/interval-level.ts';
import { NINETY, RARE, effectTopic } from './effect-topic.ts';

// The risk with a hazard ratio at a baseline is 1 − (1 − p)^HR under proportional hazards
// (Altman & Andersen 1999, BMJ 319:1492; Cochrane Handbook 5.1 §12.5.4). At p = 0.1%:
// HR 0.8 → 0.0800080%, HR 0.7 → 0.0700105%, HR 0.9 → 0.0900045%: per 10,000 people 10 without,
// 8 (7 to 9) with the tablet. Numbers are arithmetic on invented inputs.

describe('the key numbers of a rare outcome: 0.1% a year, hazard ratio 0.8 (0.7 to 0.9)', () => {
  test('count per 10,000, where the difference is 2 whole people', () => {
    const [table] = keyNumberTables(computeTopic(RARE));
    expect(table?.denominator).toBe(10000);
    expect(table?.rows[0]?.people).toEqual({ value: '10', range: null });
    expect(table?.rows[1]?.people).toEqual({ value: '8', range: '7 to 9' });
    expect(table?.rows[1]?.change).toEqual({ value: '2 fewer', range: '1 to 3 fewer' });
  });

  test('write the risks so that they keep their meaning: 0.08%, never 0.1% for both', () => {
    const [table] = keyNumberTables(computeTopic(RARE));
    expect(table?.rows[0]?.risk.value).toBe('0.1%');
    expect(table?.rows[1]?.risk).toEqual({ value: '0.08%', range: '0.07 to 0.09%' });
  });

  test('say a difference rounded to no one is under 1 person, never no change, when 1000 or 100 is forced', () => {
    // Per 1000: 1 without, 0.80 with (shown 1); per 100: 0.1 and 0.08 (shown 0 and 0).
    for (const per of [1000, 100] as const) {
      const [table] = keyNumberTables(computeTopic(RARE, { per }));
      expect(table?.denominator).toBe(per);
      expect(table?.rows[1]?.change).toEqual({ value: 'under 1 fewer', range: 'under 1 fewer' });
    }
  });

  test('give the level of the ranges: 95% unless the effect gives another', () => {
    const [table] = keyNumberTables(computeTopic(RARE));
    expect(table?.rows.map((row) => row.level)).toEqual([null, '95%']);
    expect(rangesNote(computeTopic(RARE))).toBe('Ranges are 95% intervals for the effect');
  });

  test('write 10,000 and more with commas', () => {
    // A 0.01% outcome beside a 30% one: per 100,000, 10 and 8 against 30,000 and 33,000 (RR 1.1 (1.0 to 1.2)).
    const topic = effectTopic({
      baseline: 0.0001,
      effect: { measure: 'rr', estimate: 0.8, lower: 0.6, upper: 1.1 },
      second: { baseline: '30%', effect: { measure: 'rr', estimate: 1.1, lower: 1.0, upper: 1.2 } },
    });
    const [, cough] = keyNumberTables(computeTopic(topic));
    expect(cough?.denominator).toBe(100000);
    expect(cough?.rows[0]?.people.value).toBe('30,000');
    expect(cough?.rows[1]?.people).toEqual({ value: '33,000', range: '30,000 to 36,000' });
    expect(cough?.rows[1]?.change).toEqual({ value: '3000 more', range: '0 to 6000 more' });
  });
});

describe('a topic with 90% intervals', () => {
  test('names the level in the table and the note beneath the results', () => {
    const result = computeTopic(NINETY);
    expect(keyNumberTables(result)[0]?.rows[1]?.level).toBe('90%');
    expect(rangesNote(result)).toBe('Ranges are 90% intervals for the effect');
  });

  test('keeps the sign of a limit that rounds to no one: under 1 to 4 fewer', () => {
    // 30% × 0.99 = 29.7%: per 100 it shows as 30 people, 0.3 of a person fewer than without.
    expect(keyNumberTables(computeTopic(NINETY))[0]?.rows[1]?.change).toEqual({ value: '2 fewer', range: 'under 1 to 4 fewer' });
  });

  test('names each level when the effects of a topic differ', () => {
    const mixed = effectTopic({
      baseline: '30%',
      effect: { measure: 'rr', estimate: 0.92, lower: 0.85, upper: 0.99, level: 0.9 },
      second: { baseline: '10%', effect: { measure: 'rr', estimate: 1.2, lower: 1.1, upper: 1.3, level: 0.99 } },
    });
    expect(rangesNote(computeTopic(mixed))).toBe(
      'Ranges are intervals for the effect at the level each effect gives (90% and 99%: see each table)',
    );
  });
});

describe('words for changes and levels', () => {
  test('say no change only when the exact difference is 0', () => {
    expect(changeWords(0, 0)).toBe('no change');
    expect(changeWords(0, 0.2)).toBe('under 1 fewer');
    expect(changeWords(0, -0.4)).toBe('under 1 more');
    expect(changeWords(12000)).toBe('12,000 fewer');
    // An odds ratio of 1 gives the baseline back within a rounding error: no change, not "under 1".
    expect(changeWords(0, 1e-13)).toBe('no change');
  });

  test('keep each end of a range on its own side of no difference', () => {
    expect(changeRangeText({ shown: 0, exact: 0.3 }, { shown: 2, exact: 2.1 })).toBe('under 1 to 2 fewer');
    expect(changeRangeText({ shown: 0, exact: -0.3 }, { shown: 0, exact: 0.4 })).toBe('under 1 fewer to under 1 more');
    expect(changeRangeText({ shown: -3, exact: -3.2 }, { shown: 0, exact: -0.2 })).toBe('under 1 to 3 more');
    expect(changeRangeText({ shown: 0, exact: 0 }, { shown: 0, exact: 0 })).toBe('no change');
  });

  test('write a risk that is not 0 so it never reads 0%', () => {
    // Two significant figures below 1% (common practice, as the command line writes them).
    expect([riskPercent(0.0004), riskPercent(0.000012), riskPercent(0), riskPercent(0.1125)]).toEqual([
      '0.04%',
      '0.0012%',
      '0%',
      '11.3%',
    ]);
  });

  test('write a level as a percentage, the default 95%', () => {
    expect([levelText(0.9), levelText(0.999), levelText(null)]).toEqual(['90%', '99.9%', '95%']);
  });
});
