import { describe, expect, it } from 'vitest';
import { frequencyBand } from '../../../src/core/wording/frequency-band.ts';

describe('frequencyBand', () => {
  // Boundary values: EU guideline on the summary of product characteristics, section 4.8
  // (European Commission, Rev. 2, 2009; edition from memory) and the CIOMS
  // Working Group III frequency convention, as tabulated in Büchter et al. 2014, BMC Med Inform
  // Decis Mak 14:76, Table 1: very common >= 1/10, common >= 1/100 to < 1/10, uncommon >= 1/1000
  // to < 1/100, rare >= 1/10000 to < 1/1000, very rare < 1/10000; lower bounds inclusive.
  it.each([
    [0.1, 'very-common'],
    [0.0999, 'common'],
    [0.01, 'common'],
    [0.00999, 'uncommon'],
    [0.001, 'uncommon'],
    [0.0001, 'rare'],
    [0.0000999, 'very-rare'],
  ] as const)('puts a risk of %s in the band %s', (risk, band) => {
    expect(frequencyBand(risk)).toBe(band);
  });

  it('puts a risk it cannot estimate in "not known" (same guideline)', () => {
    expect(frequencyBand(null)).toBe('not-known');
  });

  it('puts a certain risk in "very common" and a zero risk in "very rare" (same thresholds)', () => {
    expect(frequencyBand(1)).toBe('very-common');
    expect(frequencyBand(0)).toBe('very-rare');
  });

  it('reads a computed risk as the decimal it prints, so 0.7 − 0.6 is common, not very common', () => {
    // 0.7 - 0.6 = 0.09999999999999998 in IEEE 754 doubles (common practice).
    expect(frequencyBand(0.7 - 0.6)).toBe('common');
    expect(frequencyBand(0.05 * 2)).toBe('very-common');
  });
});
