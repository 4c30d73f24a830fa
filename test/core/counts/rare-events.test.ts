import { describe, expect, it } from 'vitest';
import { analyseCounts } from '../../../src/core/counts/index.ts';
import { computeEffect } from '../../../src/core/compute-effect.ts';

// A rare event with a zero cell: 0 events in 1515 against 100 in 108,000. The example of
// biostatUZH's `confIntIndependentProportion` (Held L, R package documentation), taken from
// Significance 2010;7(4):146, "Untimely ripped?". Its Newcombe interval (Newcombe 1998, Stat Med
// 17:873, method 10) recomputed with SciPy 1.17:
//   from scipy.stats import binomtest; from math import sqrt
//   a = binomtest(0, 1515).proportion_ci(method='wilson'); b = binomtest(100, 108000).proportion_ci(method='wilson')
//   p1, p2 = 0/1515, 100/108000; D = p1 - p2
//   D - sqrt((p1 - a.low)**2 + (b.high - p2)**2), D + sqrt((a.high - p1)**2 + (p2 - b.low)**2)
//   → -0.0011259342633110191, 0.0016086216983677653 (option − comparison; Chancewise reports comparison − option)

describe('a rare event with a zero cell: 0/1515 against 100/108,000', () => {
  const analysis = analyseCounts({ events: 0, total: 1515 }, { events: 100, total: 108000 });

  it('gives each arm its Wilson interval, the zero arm from 0', () => {
    expect(analysis.interventionRisk.lower).toBe(0);
    expect(analysis.interventionRisk.upper).toBeCloseTo(0.0025292032939875303, 14);
    expect(analysis.comparisonRisk.lower).toBeCloseTo(0.0007614195202894841, 14);
    expect(analysis.comparisonRisk.upper).toBeCloseTo(0.0011259342633110191, 14);
  });

  it('gives the Newcombe interval of the difference, comparison − option', () => {
    expect(analysis.riskDifference.estimate).toBeCloseTo(100 / 108000, 15);
    expect(analysis.riskDifference.lower).toBeCloseTo(-0.0016086216983677653, 14);
    expect(analysis.riskDifference.upper).toBeCloseTo(0.0011259342633110191, 14);
  });

  it('writes an NNT whose interval crosses no effect, benefit end first, and never "no difference"', () => {
    const result = computeEffect({
      baseline: null,
      effect: { measure: 'counts', intervention: { events: 0, total: 1515 }, comparison: { events: 100, total: 108000 } },
    });
    // 1/0.000925926 = 1080 exactly; 1/0.0011259 = 888.2 → NNTB 889 (up); 1/0.0016086 = 621.7 → NNTH 621 (down).
    expect(result.nnt.text).toBe('NNTB 1080 (NNTB 889 to ∞ to NNTH 621)');
    expect(result.wordsPeople).toMatchObject({ denominator: 1000, comparison: 1, intervention: 0, difference: 1 });
  });
});
