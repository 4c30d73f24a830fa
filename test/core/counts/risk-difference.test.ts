import { describe, expect, it } from 'vitest';
import { newcombeDifference } from '../../../src/core/counts/newcombe-difference.ts';
import { riskDifference } from '../../../src/core/counts/risk-difference.ts';
import { waldDifference } from '../../../src/core/counts/wald-difference.ts';
import type { ArmCounts } from '../../../src/core/types.ts';
import { problemOf, round4 } from './support.ts';

/**
 * Newcombe's tables give p₁ − p₂ with arm 1 first. Our difference is comparison − option,
 * so arm 1 of the table is the comparison arm and arm 2 the option arm.
 */
const arms = (first: ArmCounts, second: ArmCounts) => ({ intervention: second, comparison: first });

const limits = (found: { lower: number; upper: number }) => [round4(found.lower), round4(found.upper)];

// Newcombe RG. Interval estimation for the difference between independent proportions:
// comparison of eleven methods. Stat Med 1998;17:873–890, Table II (95%): method 10 is the
// hybrid score (square-and-add of Wilson intervals), method 1 the Wald interval. Every limit below
// is recomputed with SciPy, with a, m, c, n the row's x₁, n₁, x₂, n₂ (for (a): 56, 70, 48, 80):
// method 10: python3 -c "from scipy.stats import binomtest as b; a, m, c, n = 56, 70, 48, 80; p, q = a / m, c / n; l1, u1 = b(a, m).proportion_ci(method='wilson'); l2, u2 = b(c, n).proportion_ci(method='wilson'); print(p - q - ((p - l1)**2 + (u2 - q)**2)**.5, p - q + ((u1 - p)**2 + (q - l2)**2)**.5)"
// method 1:  python3 -c "from scipy.stats import norm; a, m, c, n = 56, 70, 48, 80; p, q = a / m, c / n; h = norm.ppf(0.975) * (p * (1 - p) / m + q * (1 - q) / n)**.5; print(p - q - h, p - q + h)"
// All of them agree with the rows to four places.
const tableTwo: ReadonlyArray<{
  readonly label: string;
  readonly first: ArmCounts;
  readonly second: ArmCounts;
  readonly newcombe?: readonly [number, number];
  readonly wald?: readonly [number, number];
}> = [
  // Rows (a) and (b): as published, read in secondary text quoting Table II.
  {
    label: '(a) 56/70 − 48/80',
    first: { events: 56, total: 70 },
    second: { events: 48, total: 80 },
    newcombe: [0.0524, 0.3339],
    wald: [0.0575, 0.3425],
  },
  {
    label: '(b) 9/10 − 3/10',
    first: { events: 9, total: 10 },
    second: { events: 3, total: 10 },
    newcombe: [0.1705, 0.809],
    wald: [0.2605, 0.9395],
  },
  // Rows (c) to (h): from memory, and recomputed with SciPy as above.
  {
    label: '(c) 6/7 − 2/7',
    first: { events: 6, total: 7 },
    second: { events: 2, total: 7 },
    newcombe: [0.0582, 0.8062],
    wald: [0.1481, 0.9947],
  },
  {
    label: '(d) 5/56 − 0/29',
    first: { events: 5, total: 56 },
    second: { events: 0, total: 29 },
    newcombe: [-0.0381, 0.1926],
    wald: [0.0146, 0.164],
  },
  { label: '(e) 0/10 − 0/20', first: { events: 0, total: 10 }, second: { events: 0, total: 20 }, newcombe: [-0.1611, 0.2775] },
  { label: '(f) 0/10 − 0/10', first: { events: 0, total: 10 }, second: { events: 0, total: 10 }, newcombe: [-0.2775, 0.2775] },
  { label: '(g) 10/10 − 0/20', first: { events: 10, total: 10 }, second: { events: 0, total: 20 }, newcombe: [0.6791, 1] },
  { label: '(h) 10/10 − 0/10', first: { events: 10, total: 10 }, second: { events: 0, total: 10 }, newcombe: [0.6075, 1] },
];

describe('newcombeDifference', () => {
  for (const row of tableTwo) {
    if (row.newcombe === undefined) continue;
    const expected = row.newcombe;
    it(`reproduces Newcombe (1998) Table II method 10 for ${row.label}`, () => {
      const { intervention, comparison } = arms(row.first, row.second);
      const found = newcombeDifference(intervention, comparison);
      expect(found.estimate).toBeCloseTo(row.first.events / row.first.total - row.second.events / row.second.total, 12);
      expect(limits(found)).toEqual([...expected]);
    });
  }

  it('reproduces SciPy’s Wilson intervals squared and added on the large Berkeley admissions table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details: 1198 of 2691 men and 557 of 1835
    // women admitted (Bickel, Hammel and O'Connell, Science 1975;187:398–403); the women are the
    // option arm. Newcombe's method 10 as in the command above the table, with SciPy:
    // python3 -c "from scipy.stats import binomtest as b; a, m, c, n = 1198, 2691, 557, 1835; p, q = a / m, c / n; l1, u1 = b(a, m).proportion_ci(method='wilson'); l2, u2 = b(c, n).proportion_ci(method='wilson'); print(p - q, p - q - ((p - l1)**2 + (u2 - q)**2)**.5, p - q + ((u1 - p)**2 + (q - l2)**2)**.5)"
    // → 0.14164542824654186, 0.1132131214425282 to 0.1695695110299901.
    const found = newcombeDifference({ events: 557, total: 1835 }, { events: 1198, total: 2691 });
    expect(found.estimate).toBeCloseTo(0.14164542824654186, 14);
    expect(found.lower).toBeCloseTo(0.1132131214425282, 12);
    expect(found.upper).toBeCloseTo(0.1695695110299901, 12);
  });

  it('reports comparison − option: a better option gives a positive difference, and swapping negates it', () => {
    // Newcombe (1998) Table II (a): option 48/80, comparison 56/70 → +0.2000, 0.0524 to 0.3339;
    // option 56/70, comparison 48/80 → −0.2000, −0.3339 to −0.0524.
    const better = newcombeDifference({ events: 48, total: 80 }, { events: 56, total: 70 });
    expect(round4(better.estimate)).toBe(0.2);
    expect(limits(better)).toEqual([0.0524, 0.3339]);
    const worse = newcombeDifference({ events: 56, total: 70 }, { events: 48, total: 80 });
    expect(round4(worse.estimate)).toBe(-0.2);
    expect(limits(worse)).toEqual([-0.3339, -0.0524]);
  });
});

describe('waldDifference', () => {
  for (const row of tableTwo) {
    if (row.wald === undefined) continue;
    const expected = row.wald;
    it(`reproduces Newcombe (1998) Table II method 1 for ${row.label}`, () => {
      const { intervention, comparison } = arms(row.first, row.second);
      expect(limits(waldDifference(intervention, comparison))).toEqual([...expected]);
    });
  }

  it('negates the interval when the arms are swapped (Newcombe 1998 Table II (b))', () => {
    const found = waldDifference({ events: 9, total: 10 }, { events: 3, total: 10 });
    expect(round4(found.estimate)).toBe(-0.6);
    expect(limits(found)).toEqual([-0.9395, -0.2605]);
  });

  it('reproduces SciPy’s Wald difference on the large Berkeley admissions table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details: "2691 male applicants, of whom 1198
    // (44.5%) were admitted, compared with 1835 female applicants of whom 557 (30.4%)" (Bickel,
    // Hammel and O'Connell, Science 1975;187:398–403). With the women as the option arm and the men
    // as the comparison, percentages rounded to 0.1 put the difference between 0.4445 − 0.3045 and
    // 0.4455 − 0.3035 (derived from the text); with SciPy:
    // python3 -c "from scipy.stats import norm; a, m, c, n = 1198, 2691, 557, 1835; p, q = a / m, c / n; h = norm.ppf(0.975) * (p * (1 - p) / m + q * (1 - q) / n)**.5; print(p - q, p - q - h, p - q + h)"
    // → 0.14164542824654186, 0.11344696549125992 to 0.16984389100182382.
    const found = waldDifference({ events: 557, total: 1835 }, { events: 1198, total: 2691 });
    expect(found.estimate).toBeGreaterThan(0.4445 - 0.3045);
    expect(found.estimate).toBeLessThan(0.4455 - 0.3035);
    expect(found.estimate).toBeCloseTo(0.14164542824654186, 14);
    expect(found.lower).toBeCloseTo(0.11344696549125992, 12);
    expect(found.upper).toBeCloseTo(0.16984389100182382, 12);
  });

  it('truncates an overshooting interval to [−1, 1] (common practice)', () => {
    const found = waldDifference({ events: 0, total: 2 }, { events: 1, total: 2 }, 0.99);
    expect(found.upper).toBe(1);
    expect(found.lower).toBeGreaterThanOrEqual(-1);
  });
});

describe('riskDifference', () => {
  it('uses the Newcombe hybrid score interval by default and Wald on request', () => {
    const option = { events: 48, total: 80 };
    const comparison = { events: 56, total: 70 };
    expect(riskDifference(option, comparison)).toEqual(newcombeDifference(option, comparison));
    expect(riskDifference(option, comparison, 0.95, 'wald')).toEqual(waldDifference(option, comparison));
  });

  it('narrows at 90% and widens at 99% around the same estimate', () => {
    const option = { events: 48, total: 80 };
    const comparison = { events: 56, total: 70 };
    const at90 = riskDifference(option, comparison, 0.9);
    const at95 = riskDifference(option, comparison, 0.95);
    const at99 = riskDifference(option, comparison, 0.99);
    expect(at90.estimate).toBe(at99.estimate);
    expect(at90.lower).toBeGreaterThan(at95.lower);
    expect(at99.lower).toBeLessThan(at95.lower);
    expect(at90.upper).toBeLessThan(at95.upper);
    expect(at99.upper).toBeGreaterThan(at95.upper);
  });

  it('rejects invalid arms and levels', () => {
    expect(problemOf(() => riskDifference({ events: 3, total: 2 }, { events: 1, total: 2 })).code).toBe(
      'counts-events-above-total',
    );
    expect(problemOf(() => riskDifference({ events: 1, total: 2 }, { events: 1, total: 2 }, 0.9999, 'wald')).code).toBe(
      'level-out-of-range',
    );
  });
});
