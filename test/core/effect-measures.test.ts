import { describe, expect, it } from 'vitest';
import { EFFECT_MEASURES, MEASURES, isEffectMeasure } from '../../src/core/effect-measures.ts';
import { measureNamesEn } from '../../src/core/messages/en/measure-names.ts';
import { riskWithEffect } from '../../src/core/risk-with-effect.ts';

// The registry of effect measures: every measure described once, with its formula's source.

describe('the registry of effect measures', () => {
  it('lists the five measures in the editor order', () => {
    expect(MEASURES).toEqual(['rr', 'or', 'hr', 'rrr', 'arr']);
  });

  it('gives each measure a flag, an example that its own rule allows, a name and a source', () => {
    for (const measure of MEASURES) {
      const spec = EFFECT_MEASURES[measure];
      expect(spec.flag).toBe(`--${measure}`);
      const scale = spec.input === 'difference' ? 0.01 : 1;
      for (const value of [spec.example.estimate, spec.example.lower, spec.example.upper]) {
        expect(spec.allows(Number(value) * scale)).toBe(true);
      }
      expect(Number(spec.example.lower)).toBeLessThan(Number(spec.example.upper));
      expect(measureNamesEn[measure]).toMatch(/^[a-z ]+$/);
      expect(spec.source).toMatch(/Cochrane Handbook|Altman/);
    }
  });

  it('applies each formula as its source gives it, at a baseline of 30%', () => {
    // Cochrane Handbook 5.1 §12.5.4: RR 0.92 → 27.6%; OR 0.73 → 23.83% (§12.5.4.3's worked example);
    // RRR 25% → 22.5%; ARR 2 points → 28%. Altman & Andersen 1999: HR 0.8 → 1 − 0.7^0.8 = 24.81%.
    expect(riskWithEffect('rr', 0.92, 0.3)).toBeCloseTo(0.276, 12);
    expect(riskWithEffect('or', 0.73, 0.3)).toBeCloseTo(0.2383, 4);
    expect(riskWithEffect('rrr', 25, 0.3)).toBeCloseTo(0.225, 12);
    expect(riskWithEffect('arr', 0.02, 0.3)).toBeCloseTo(0.28, 12);
    expect(riskWithEffect('hr', 0.8, 0.3)).toBeCloseTo(1 - Math.pow(0.7, 0.8), 12);
  });

  it('knows its own names and nothing else', () => {
    expect(MEASURES.every(isEffectMeasure)).toBe(true);
    expect(isEffectMeasure('counts')).toBe(false);
    expect(isEffectMeasure('toString')).toBe(false);
  });
});
