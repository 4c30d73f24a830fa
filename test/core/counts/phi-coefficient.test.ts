import { describe, expect, it } from 'vitest';
import { cramersV } from '../../../src/core/counts/cramers-v.ts';
import { phiCoefficient } from '../../../src/core/counts/phi-coefficient.ts';
import { problemOf } from './support.ts';

// Cramér H. Mathematical Methods of Statistics (1946), p. 282 (from memory): V = √(X² / (N · min(r − 1, c − 1))),
// which for a 2×2 table is |phi|, and phi² = X² / N (common practice).
describe('phiCoefficient', () => {
  it('is 0.5 for the tea-tasting table: (3·3 − 1·1) / √(4·4·4·4)', () => {
    // Fisher (1935) tea-tasting table; X² = 2, N = 8, √(2/8) = 0.5 (derived).
    expect(phiCoefficient({ events: 3, total: 4 }, { events: 1, total: 4 })).toBeCloseTo(0.5, 12);
  });

  it('is positive when events go with the option arm and negative when they go with the comparison', () => {
    // Agresti's myocardial infarction table: X² = 25.01, N = 22071, |phi| = √(25.01/22071) = 0.0337.
    const placeboFirst = phiCoefficient({ events: 189, total: 11034 }, { events: 104, total: 11037 });
    expect(placeboFirst).toBeCloseTo(Math.sqrt(25.014 / 22071), 5);
    expect(phiCoefficient({ events: 104, total: 11037 }, { events: 189, total: 11034 })).toBeCloseTo(
      -(placeboFirst ?? 0),
      14,
    );
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
    expect(problemOf(() => phiCoefficient({ events: -2, total: 5 }, { events: 0, total: 7 })).code).toBe(
      'counts-negative',
    );
  });
});

describe('cramersV', () => {
  it('is |phi| for a 2×2 table', () => {
    expect(cramersV({ events: 1, total: 4 }, { events: 3, total: 4 })).toBeCloseTo(0.5, 12);
    expect(cramersV({ events: 104, total: 11037 }, { events: 189, total: 11034 })).toBeCloseTo(
      Math.sqrt(25.014 / 22071),
      5,
    );
  });

  it('is null with a zero margin', () => {
    expect(cramersV({ events: 0, total: 5 }, { events: 0, total: 7 })).toBeNull();
  });
});
