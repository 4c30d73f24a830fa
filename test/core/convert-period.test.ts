import { describe, expect, it } from 'vitest';
import { convertRiskPeriod } from '../../src/core/convert-period.ts';
import { InputError } from '../../src/core/problems.ts';

describe('convertRiskPeriod assumes a constant hazard: p₂ = 1 − (1 − p₁)^(t₂/t₁)', () => {
  // "Converting probabilities between time-intervals", Cabot Institute blog, University of Bristol, 2016.
  it('turns 4% over 5 years into 15.07% over 20 years, not 16%', () => {
    expect(convertRiskPeriod(0.04, 5, 20)).toBeCloseTo(0.1507, 4);
  });

  // Values computed from the formula (derived): 20% at 10 y → 10.557% at 5 y; 10% at 10 y → 1.048% at 1 y;
  // 5% at 1 y → 22.622% at 5 y.
  it.each([
    [0.2, 10, 5, 0.10557],
    [0.1, 10, 1, 0.01048],
    [0.05, 1, 5, 0.22622],
  ])('turns %d over %d years into about %d over %d years', (risk, from, to, expected) => {
    expect(convertRiskPeriod(risk, from, to)).toBeCloseTo(expected, 5);
  });

  it('leaves a risk unchanged over the same period', () => {
    expect(convertRiskPeriod(0.15, 10, 10)).toBeCloseTo(0.15, 15);
  });

  it('stays accurate for tiny risks', () => {
    expect(convertRiskPeriod(1e-10, 1, 2)).toBeCloseTo(2e-10, 18);
  });

  it('refuses a period of 0 years', () => {
    expect(() => convertRiskPeriod(0.1, 0, 5)).toThrow(InputError);
  });
});
