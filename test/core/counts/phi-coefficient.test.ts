import { describe, expect, it } from 'vitest';
import { cramersV } from '../../../src/core/counts/cramers-v.ts';
import { phiCoefficient } from '../../../src/core/counts/phi-coefficient.ts';
import { problemOf } from './support.ts';

// Cramér's V = √(X² / (N · min(r − 1, c − 1))), which for a 2×2 table is |phi|, and phi² = X² / N
// (common practice; SciPy's scipy.stats.contingency.association documents V as an extension of
// phi). Each expected value below is recomputed with association(method='cramer'), which uses the
// uncorrected X².
describe('phiCoefficient', () => {
  it('is 0.5 for the tea-tasting table: (3·3 − 1·1) / √(4·4·4·4)', () => {
    // Fisher (1935) tea-tasting table; X² = 2, N = 8, √(2/8) = 0.5 (derived).
    // python3 -c "from scipy.stats.contingency import association as a; print(a([[3, 1], [1, 3]], method='cramer'))" → 0.5.
    expect(phiCoefficient({ events: 3, total: 4 }, { events: 1, total: 4 })).toBeCloseTo(0.5, 12);
  });

  it('reproduces SciPy on the whales-and-sharks table, a small table with a cell of 1', () => {
    // SciPy documentation, scipy.stats.fisher_exact, Examples: [[8, 2], [1, 5]]; phi = (8·5 − 2·1) /
    // √(10·6·9·7) (derived).
    // python3 -c "from scipy.stats.contingency import association as a; print(a([[8, 1], [2, 5]], method='cramer'))"
    // → 0.6180700462007377.
    expect(phiCoefficient({ events: 8, total: 9 }, { events: 2, total: 7 })).toBeCloseTo(0.6180700462007377, 12);
  });

  it('is negative when events go with the comparison arm, on the large Berkeley admissions table', () => {
    // R documentation (datasets 4.2), UCBAdmissions, Details and Examples: 1198 of 2691 men and
    // 557 of 1835 women admitted (Bickel, Hammel and O'Connell, Science 1975;187:398–403); with the
    // women as the option arm, X² = 92.205, N = 4526, |phi| = √(92.205 / 4526) (derived).
    // python3 -c "from scipy.stats.contingency import association as a; print(a([[557, 1278], [1198, 1493]], method='cramer'))"
    // → 0.142731760206081.
    const optionFirst = phiCoefficient({ events: 557, total: 1835 }, { events: 1198, total: 2691 });
    expect(optionFirst).toBeCloseTo(-0.142731760206081, 12);
    expect(phiCoefficient({ events: 1198, total: 2691 }, { events: 557, total: 1835 })).toBeCloseTo(-(optionFirst ?? 0), 14);
  });

  it('reaches ±1 for a perfectly separated table', () => {
    expect(phiCoefficient({ events: 5, total: 5 }, { events: 0, total: 7 })).toBeCloseTo(1, 12);
    expect(phiCoefficient({ events: 0, total: 5 }, { events: 7, total: 7 })).toBeCloseTo(-1, 12);
  });

  it('is null with a zero margin', () => {
    expect(phiCoefficient({ events: 0, total: 5 }, { events: 0, total: 7 })).toBeNull();
    expect(phiCoefficient({ events: 5, total: 5 }, { events: 7, total: 7 })).toBeNull();
  });

  it('rejects invalid arms', () => {
    expect(problemOf(() => phiCoefficient({ events: -2, total: 5 }, { events: 0, total: 7 })).code).toBe('counts-negative');
  });
});

describe('cramersV', () => {
  it('is |phi| for a 2×2 table', () => {
    expect(cramersV({ events: 1, total: 4 }, { events: 3, total: 4 })).toBeCloseTo(0.5, 12);
    // Same SciPy commands as for phi above.
    expect(cramersV({ events: 557, total: 1835 }, { events: 1198, total: 2691 })).toBeCloseTo(0.142731760206081, 12);
    expect(cramersV({ events: 8, total: 9 }, { events: 2, total: 7 })).toBeCloseTo(0.6180700462007377, 12);
  });

  it('is null with a zero margin', () => {
    expect(cramersV({ events: 0, total: 5 }, { events: 0, total: 7 })).toBeNull();
  });
});
