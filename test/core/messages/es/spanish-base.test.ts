import { describe, expect, it } from 'vitest';
import {
  formatCountEs,
  formatDecimalEs,
  formatPercentEs,
  formatPercentSignificantEs,
  formatSignificantEs,
} from '../../../../src/core/messages/es/format-number-es.ts';
import { capitaliseEs, joinListEs, pluralEs, startsWithVerbEs } from '../../../../src/core/messages/es/spanish-grammar.ts';
import { amountWithUnitEs } from '../../../../src/core/messages/es/time-words-es.ts';

const nbsp = '\u00a0';

// RAE & ASALE 2010, Ortografía de la lengua española, chapter on numerals (from memory): digits
// grouped in threes by a space from five digits, a four-digit number solid; the SI Brochure (BIPM
// 2019, §5.4.4) agrees. The decimal comma is the convention the Spanish wording was asked to use.
describe('Spanish numbers', () => {
  it('writes four digits solid and groups five or more with a non-breaking space', () => {
    expect(formatCountEs(1000)).toBe('1000');
    expect(formatCountEs(9999)).toBe('9999');
    expect(formatCountEs(10000)).toBe(`10${nbsp}000`);
    expect(formatCountEs(1000000)).toBe(`1${nbsp}000${nbsp}000`);
  });

  it('writes decimals with a comma and drops trailing zeros', () => {
    expect(formatDecimalEs(2.5, 2)).toBe('2,5');
    expect(formatDecimalEs(3, 2)).toBe('3');
    expect(formatDecimalEs(-0.125, 2)).toBe('-0,13');
    expect(formatDecimalEs(12345.6, 1)).toBe(`12${nbsp}345,6`);
    expect(formatSignificantEs(0.0123)).toBe('0,012');
  });

  it('puts a non-breaking space before the per cent sign', () => {
    expect(formatPercentEs(0.155, 1)).toBe(`15,5${nbsp}%`);
    expect(formatPercentSignificantEs(0.001)).toBe(`0,1${nbsp}%`);
  });
});

describe('Spanish periods', () => {
  it('uses the singular only for exactly one', () => {
    expect(amountWithUnitEs(1, 'years')).toBe('1 año');
    expect(amountWithUnitEs(10, 'years')).toBe('10 años');
    expect(amountWithUnitEs(1.5, 'months')).toBe('1,5 meses');
    expect(amountWithUnitEs(3, 'days')).toBe('3 días');
  });
});

describe('Spanish grammar helpers', () => {
  it('capitalises after opening question marks', () => {
    expect(capitaliseEs('¿qué pasa si espero?')).toBe('¿Qué pasa si espero?');
    expect(capitaliseEs('la opción A')).toBe('La opción A');
  });

  it('takes the plural for 0 and for decimals (common practice)', () => {
    expect(pluralEs(1, 'persona', 'personas')).toBe('persona');
    expect(pluralEs(0, 'persona', 'personas')).toBe('personas');
  });

  it('tells infinitive-led outcome names from nouns that end like one', () => {
    expect(startsWithVerbEs('morir de un infarto')).toBe(true);
    expect(startsWithVerbEs('romperse la cadera')).toBe(true);
    expect(startsWithVerbEs('necesitar diálisis')).toBe(true);
    expect(startsWithVerbEs('un infarto')).toBe(false);
    expect(startsWithVerbEs('malestar de estómago')).toBe(false);
    expect(startsWithVerbEs('dolor de cabeza')).toBe(false);
    expect(startsWithVerbEs('cáncer de colon')).toBe(false);
  });

  it('joins lists with "y", and "e" before an /i/ sound (RAE & ASALE 2010, Ortografía, on the conjunction y; from memory)', () => {
    expect(joinListEs(['náuseas', 'mareo', 'sangrado'])).toBe('náuseas, mareo y sangrado');
    expect(joinListEs(['náuseas', 'hipo'])).toBe('náuseas e hipo');
    expect(joinListEs(['náuseas', 'hielo'])).toBe('náuseas y hielo');
    expect(joinListEs(['mareo', 'olvido'], 'o')).toBe('mareo u olvido');
  });
});
