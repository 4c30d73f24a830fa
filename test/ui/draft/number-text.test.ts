import { describe, expect, it } from 'vitest';
import { numberText } from '../../../src/ui/draft/number-text.ts';

// How an editor writes back a number it read (common practice: no float noise, no exponents).
describe('numberText', () => {
  it('drops binary floating-point noise past 12 significant digits', () => {
    expect(numberText(0.1 + 0.2)).toBe('0.3');
    expect(numberText(0.03 * 100)).toBe('3');
    expect(numberText(1.1 * 3)).toBe('3.3');
  });

  it('writes ordinary numbers as JavaScript does', () => {
    expect(numberText(20)).toBe('20');
    expect(numberText(0.75)).toBe('0.75');
    expect(numberText(-2.5)).toBe('-2.5');
    expect(numberText(123456789012)).toBe('123456789012');
  });

  it('never uses exponent form, for tiny or huge numbers', () => {
    expect(numberText(1e-7)).toBe('0.0000001');
    expect(numberText(2.5e-9)).toBe('0.0000000025');
    expect(numberText(1e21)).toBe('1000000000000000000000');
    expect(numberText(-3e-8)).toBe('-0.00000003');
  });

  it('writes zero, negative zero and non-finite values plainly', () => {
    expect(numberText(0)).toBe('0');
    expect(numberText(-0)).toBe('0');
    expect(numberText(Number.NaN)).toBe('');
    expect(numberText(Number.POSITIVE_INFINITY)).toBe('');
  });

  it('agrees with the locale formatter across magnitudes', () => {
    const formatter = new Intl.NumberFormat('en-US', { useGrouping: false, maximumSignificantDigits: 12 });
    for (let exponent = -12; exponent <= 24; exponent += 1) {
      for (const mantissa of [1, 1.5, 2.345678901234, 9.99999999999]) {
        const value = mantissa * 10 ** exponent;
        expect(numberText(value)).toBe(formatter.format(Number(value.toPrecision(12))));
      }
    }
  });
});
