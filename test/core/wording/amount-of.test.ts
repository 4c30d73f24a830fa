import { describe, expect, it } from 'vitest';
import { amountOf } from '../../../src/core/wording/amount-of.ts';

// Rounded counts must agree with the icon array, and a non-zero risk must never read as "none"
// (Trevena et al. 2013, BMC Med Inform Decis Mak 13(Suppl 2):S7, "consider the magnitude"; the
// "fewer than 1 in 1000" wording is common practice).
describe('amountOf', () => {
  it('gives a count between 1 and the denominator as "about" that count', () => {
    expect(amountOf(15, 100, 0.15)).toEqual({ kind: 'about', count: 15 });
    expect(amountOf(1, 1000, 0.0012)).toEqual({ kind: 'about', count: 1 });
    expect(amountOf(99, 100, 0.99)).toEqual({ kind: 'about', count: 99 });
  });

  it('gives 0 people as "fewer than one" when the risk is above zero', () => {
    expect(amountOf(0, 1000, 0.0004)).toEqual({ kind: 'fewer-than-one' });
  });

  it('gives 0 people as "none" only when the risk is exactly zero', () => {
    expect(amountOf(0, 100, 0)).toEqual({ kind: 'none' });
  });

  it('gives 0 people with an unknown risk as "fewer than one", never "none"', () => {
    expect(amountOf(0, 100, null)).toEqual({ kind: 'fewer-than-one' });
  });

  it('gives everyone as "nearly all" unless the risk is exactly one', () => {
    expect(amountOf(100, 100, 0.996)).toEqual({ kind: 'nearly-all' });
    expect(amountOf(100, 100, 1)).toEqual({ kind: 'all' });
  });
});
