import { describe, expect, it } from 'vitest';
import { aEs, deEs, startsWithQueEs } from '../../../../src/core/messages/es/joining-es.ts';
import { durationEs } from '../../../../src/core/messages/es/time-words-es.ts';
import { yearsFrom } from '../../../../src/core/time-unit.ts';

// RAE & ASALE 2010, Ortografía de la lengua española, on the contractions "al" and "del" (from
// memory): the article "el" contracts, a capital "El" that is part of a name does not.
describe('joining our words to a typed Spanish name', () => {
  it('contracts "de el" and "a el", and leaves other articles and names alone', () => {
    expect(deEs('el tratamiento')).toBe('del tratamiento');
    expect(aEs('el tratamiento')).toBe('al tratamiento');
    expect(deEs('un infarto')).toBe('de un infarto');
    expect(aEs('la estatina')).toBe('a la estatina');
    expect(deEs('El Salvador')).toBe('de El Salvador');
    expect(deEs('elevar la tensión')).toBe('de elevar la tensión');
  });

  it('tells a "que" clause from a noun or an infinitive', () => {
    expect(startsWithQueEs('que el dolor desaparezca')).toBe(true);
    expect(startsWithQueEs(' Que el dolor desaparezca')).toBe(true);
    expect(startsWithQueEs('quemaduras')).toBe(false);
    expect(startsWithQueEs('alivio del dolor')).toBe(false);
  });
});

describe('a period in Spanish, in the unit it was given in', () => {
  it('writes days, months and years with the Spanish plural and a decimal comma', () => {
    expect(durationEs({ years: 10, unit: 'years' })).toBe('10 años');
    expect(durationEs({ years: 1, unit: 'years' })).toBe('1 año');
    expect(durationEs({ years: yearsFrom(3, 'days'), unit: 'days' })).toBe('3 días');
    expect(durationEs({ years: 0.5, unit: 'months' })).toBe('6 meses');
    expect(durationEs({ years: 1.5, unit: 'years' })).toBe('1,5 años');
  });
});
