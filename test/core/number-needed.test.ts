import { describe, expect, it } from 'vitest';
import { computeEffect } from '../../src/core/compute-effect.ts';
import { ceilWhole } from '../../src/core/float-safe.ts';
import { numberNeeded } from '../../src/core/number-needed.ts';

const difference = (estimate: number, lower: number | null = null, upper: number | null = null) => ({ estimate, lower, upper });

describe('numberNeeded labels and words NNTs after Altman (1998, BMJ 317:1309)', () => {
  // Cochrane Handbook 5.1 §12.5.4.2: RR 0.92 at 30% → NNT 42 (1/0.024 = 41.7, rounded up).
  it('reads "NNTB 42" without an interval', () => {
    expect(numberNeeded(difference(0.3 - 0.3 * 0.92))).toEqual({
      estimate: 1 / (0.3 - 0.3 * 0.92),
      rounded: 42,
      label: 'NNTB',
      text: 'NNTB 42',
      interval: null,
    });
  });

  // Cochrane Handbook 5.1 §12.5.4.1: risk differences of 0.12 and 0.22 give NNTs of 9 and 5.
  it.each([
    [0.12, 9],
    [0.22, 5],
  ])('rounds 1/%d up to %d', (value, expected) => {
    expect(numberNeeded(difference(value)).rounded).toBe(expected);
  });

  // Altman 1998, figures 1–2 (also quoted by Newcombe, BMJ 1999;318:1764): ARR 0.10 (−0.05 to 0.25).
  it('writes an interval that crosses no effect benefit end first: NNTB 10 (NNTB 4 to ∞ to NNTH 20)', () => {
    expect(numberNeeded(difference(0.1, -0.05, 0.25)).text).toBe('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
  });

  it('keeps the benefit end first for a harmful estimate: NNTH 20 (NNTB 50 to ∞ to NNTH 8)', () => {
    expect(numberNeeded(difference(-0.05, -0.125, 0.02)).text).toBe('NNTH 20 (NNTB 50 to ∞ to NNTH 8)');
  });

  it('writes a one-sided interval smaller number first: NNTB 17 (NNTB 11 to 47)', () => {
    // Cochrane Handbook 5.1 §12.5.4.3 (OR 0.73 at 30%, NNT 17), with the limits of OR 0.6 to 0.9 (derived).
    const result = computeEffect({ baseline: 0.3, effect: { measure: 'or', estimate: 0.73, lower: 0.6, upper: 0.9 } });
    expect(result.nnt.text).toBe('NNTB 17 (NNTB 11 to 47)');
  });

  // An NNTH is rounded down, so that rounding never understates a harm (BMJ Clinical Evidence
  // glossary, as cited by McQueen D, Advances in Psychiatric Treatment 2011): 11.5 → 11.
  it('writes a harmful one-sided interval, rounding each NNTH down: NNTH 25 (NNTH 11 to 90)', () => {
    expect(numberNeeded(difference(-0.04, -1 / 11.5, -1 / 90)).text).toBe('NNTH 25 (NNTH 11 to 90)');
  });

  it('writes a limit exactly at no effect as infinity: NNTB 10 (NNTB 4 to ∞)', () => {
    expect(numberNeeded(difference(0.1, 0, 0.25)).text).toBe('NNTB 10 (NNTB 4 to ∞)');
  });

  it('gives no number for a difference of exactly 0, and a plain phrase', () => {
    const result = numberNeeded(difference(0));
    expect(result.estimate).toBeNull();
    expect(result.rounded).toBeNull();
    expect(result.label).toBeNull();
    expect(result.text).toMatch(/^No difference/);
    expect(result.text).not.toMatch(/∞|Infinity|NaN/);
  });
});

// Float traps (common practice): naive Math.ceil(1 / (p − p·RR)) gives 101, 81, 1001 and 101.
describe('the NNT is rounded up but float-safe', () => {
  it.each([
    [0.05, 0.8, 100, 'NNTB'],
    [0.05, 0.75, 80, 'NNTB'],
    [0.01, 0.9, 1000, 'NNTB'],
    [0.02, 1.5, 100, 'NNTH'],
  ])('baseline %d with RR %d gives %d', (baseline, ratio, expected, label) => {
    const result = computeEffect({ baseline, effect: { measure: 'rr', estimate: ratio } });
    expect(result.nnt.rounded).toBe(expected);
    expect(result.nnt.label).toBe(label);
  });

  it('keeps a true whole number and rounds anything else up', () => {
    expect(ceilWhole(100.00000000001)).toBe(100);
    expect(ceilWhole(99.99999999999)).toBe(100);
    expect(ceilWhole(41.67)).toBe(42);
    expect(ceilWhole(16.21)).toBe(17);
  });
});

describe('numberNeeded never lets Infinity out', () => {
  it('treats a difference too small to invert as no difference', () => {
    const result = numberNeeded({ estimate: 1e-320, lower: null, upper: null });
    expect(result.label).toBeNull();
    expect(result.text).not.toMatch(/Infinity/);
  });
  it('treats an interval limit too small to invert as no effect (∞)', () => {
    expect(numberNeeded({ estimate: 0.1, lower: 1e-320, upper: 0.25 }).text).toBe('NNTB 10 (NNTB 4 to ∞)');
  });
});

describe('numberNeeded for an event people want', () => {
  // A wanted event made more likely is a benefit: RR 1.5 at 30% gives 45%, 15 more in 100,
  // NNTB 7; the interval 1.2 to 1.9 gives 36% to 57%, 6 to 27 more, NNTB 4 to 17 (Cochrane
  // Handbook 5.1 §12.5.4.1 formula NNT = 1/|ARD|, rounded up; labels after Altman 1998).
  it('labels a wanted event made more likely NNTB, with its interval', () => {
    const result = numberNeeded({ estimate: 0.3 - 0.45, lower: 0.3 - 0.57, upper: 0.3 - 0.36 }, { wanted: true });
    expect(result).toMatchObject({ rounded: 7, label: 'NNTB', text: 'NNTB 7 (NNTB 4 to 17)' });
  });

  it('labels a wanted event made less likely NNTH', () => {
    // 1/0.08 = 12.5, rounded down for a harm.
    expect(numberNeeded({ estimate: 0.05, lower: 0.02, upper: 0.08 }, { wanted: true }).text).toBe('NNTH 20 (NNTH 12 to 50)');
  });

  it('still writes an interval that crosses no effect benefit end first', () => {
    // The mirror of Altman 1998's ARR 0.10 (−0.05 to 0.25): for a wanted event the gain is 0.10 (−0.05 to 0.25).
    expect(numberNeeded({ estimate: -0.1, lower: -0.25, upper: 0.05 }, { wanted: true }).text).toBe(
      'NNTB 10 (NNTB 4 to ∞ to NNTH 20)',
    );
  });
});

describe('the cautious rounding: NNTB up, NNTH down', () => {
  // BMJ Clinical Evidence glossary, as cited by McQueen D, "Numbers-needed-to-treat analysis",
  // Advances in Psychiatric Treatment 2011 (correspondence): rounding never overstates a benefit
  // nor understates a harm.
  it('gives NNTH 25 (NNTH 12 to 100) for a risk ratio of 1.4 (1.1 to 1.8) at 10%', () => {
    const result = computeEffect({ baseline: 0.1, effect: { measure: 'rr', estimate: 1.4, lower: 1.1, upper: 1.8 } });
    expect(result.nnt.text).toBe('NNTH 25 (NNTH 12 to 100)');
  });

  it('keeps a true whole number as itself either way (1/0.05 − 0.04 is 99.999… in binary)', () => {
    expect(numberNeeded(difference(0.05 - 0.04)).rounded).toBe(100);
    expect(numberNeeded(difference(0.04 - 0.05)).rounded).toBe(100);
  });

  it('rounds an interval that crosses no effect by the label of each end', () => {
    // Benefit end 1/0.15 = 6.7 → 7 (up); harm end 1/0.06 = 16.7 → 16 (down).
    expect(numberNeeded(difference(0.05, -0.06, 0.15)).text).toBe('NNTB 20 (NNTB 7 to ∞ to NNTH 16)');
  });
});

describe('numberNeeded gives its interval as parts too', () => {
  // Altman (1998, BMJ 317:1309): ARR 10%, 95% CI −5% to 25% reads "NNTB 10 (NNTB 4 to ∞ to NNTH 20)".
  it('passes through infinity from the benefit end, as Altman writes it', () => {
    const found = numberNeeded({ estimate: 0.1, lower: -0.05, upper: 0.25 });
    expect(found.text).toBe('NNTB 10 (NNTB 4 to ∞ to NNTH 20)');
    expect(found.interval).toEqual({ kind: 'through-infinity', benefit: 4, harm: 20 });
  });
});
