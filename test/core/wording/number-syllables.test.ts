import { describe, expect, it } from 'vitest';
import { numberSyllables } from '../../../src/core/wording/number-syllables.ts';

// Numerals are scored as read aloud (Flesch's counting rules count figures as pronounced; from
// memory: Flesch 1949, The Art of Readable Writing). Syllables of English number names are common
// practice: fif-teen, one hun-dred, sev-en-ty, e-lev-en.
describe('numberSyllables', () => {
  it.each([
    ['0', 2], // ze-ro
    ['1', 1], // one
    ['7', 2], // sev-en
    ['11', 3], // e-lev-en
    ['15', 2], // fif-teen
    ['17', 3], // sev-en-teen
    ['20', 2], // twen-ty
    ['77', 5], // sev-en-ty sev-en
    ['85', 3], // eight-y five
    ['100', 3], // one hun-dred
    ['105', 4], // one hun-dred five
    ['970', 6], // nine hun-dred sev-en-ty
    ['1000', 3], // one thou-sand
    ['1,000', 3], // the same, with a thousands comma
    ['2024', 6], // two thou-sand twen-ty four
    ['1000000', 3], // one mil-lion
  ])('reads %s as %i syllables', (numeral, syllables) => {
    expect(numberSyllables(numeral)).toBe(syllables);
  });

  it('reads decimals digit by digit after "point": 2.5 is two point five', () => {
    expect(numberSyllables('2.5')).toBe(3);
    expect(numberSyllables('0.25')).toBe(2 + 1 + 1 + 1);
  });

  it('reads a trailing percent sign as per-cent', () => {
    expect(numberSyllables('15%')).toBe(4);
  });

  it('gives null for text that is not a numeral', () => {
    expect(numberSyllables('abc')).toBeNull();
    expect(numberSyllables('')).toBeNull();
    expect(numberSyllables('1,00')).toBeNull();
  });
});
