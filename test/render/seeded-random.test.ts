import { describe, expect, it } from 'vitest';
import { mulberry32, seededPermutation } from '../../src/render/seeded-random.ts';

describe('mulberry32', () => {
  // Reference values: the public-domain mulberry32 reference function (Tommy Ettinger, 2017),
  // run in Node for seeds 1 and 42 (from memory of the reference code, run here).
  it('matches the reference generator for seed 1', () => {
    const next = mulberry32(1);
    expect([next(), next(), next()]).toEqual([0.6270739405881613, 0.002735721180215478, 0.5274470399599522]);
  });

  it('matches the reference generator for seed 42', () => {
    const next = mulberry32(42);
    expect([next(), next()]).toEqual([0.6011037519201636, 0.44829055899754167]);
  });

  it('gives numbers in [0, 1)', () => {
    const next = mulberry32(7);
    for (let draw = 0; draw < 1000; draw += 1) {
      const value = next();
      expect(value).toBeGreaterThanOrEqual(0);
      expect(value).toBeLessThan(1);
    }
  });
});

describe('seededPermutation', () => {
  it('holds every number from 0 to length − 1 exactly once', () => {
    const order = seededPermutation(1000, 3);
    expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: 1000 }, (_, index) => index));
  });

  it('is the same for the same seed and differs for another seed', () => {
    expect(seededPermutation(100, 11)).toEqual(seededPermutation(100, 11));
    expect(seededPermutation(100, 11)).not.toEqual(seededPermutation(100, 12));
  });
});
