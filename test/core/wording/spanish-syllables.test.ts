import { describe, expect, it } from 'vitest';
import { spanishSyllables } from '../../../src/core/wording/spanish-syllables.ts';
import { spanishNumberWords } from '../../../src/core/wording/spanish-number-words.ts';

// Syllable counts by the orthographic rules of diphthongs, triphthongs and hiatus in RAE & ASALE
// (2010), Ortografía de la lengua española, chapter on the written accent (examples from memory).
describe('spanishSyllables', () => {
  it.each([
    ['paciente', 3], // pa-cien-te: ie diphthong
    ['ciudad', 2], // ciu-dad: two different weak vowels, a diphthong
    ['construir', 2], // cons-truir
    ['destruí', 2], // des-truí: ui stays a diphthong even with the accent
    ['averiguáis', 4], // a-ve-ri-guáis: triphthong uái
    ['buey', 1], // buey: triphthong with y at the end
    ['Uruguay', 3], // U-ru-guay
    ['país', 2], // pa-ís: hiatus by the accented weak vowel
    ['día', 2], // dí-a
    ['búho', 2], // bú-ho: h does not stop the hiatus
    ['prohibir', 2], // prohi-bir: h between vowels does not break the diphthong
    ['poeta', 3], // po-e-ta: two strong vowels, hiatus
    ['aéreo', 4], // a-é-re-o
    ['leer', 2], // le-er: equal vowels, hiatus
    ['chiita', 3], // chi-i-ta: equal weak vowels, hiatus
    ['que', 1], // silent u in que
    ['quiero', 2], // quie-ro
    ['guerra', 2], // gue-rra
    ['agua', 2], // a-gua: u sounds before a
    ['pingüino', 3], // pin-güi-no: ü sounds
    ['muy', 1], // y as vowel at the end
    ['y', 1],
    ['¿Qué', 1], // opening marks ignored
    ['tratamiento', 4], // tra-ta-mien-to
  ])('counts "%s" as %i syllables', (word, syllables) => {
    expect(spanishSyllables(word)).toBe(syllables);
  });

  it('spells out capitals without a vowel by the Spanish letter names: NNT is e-ne e-ne te', () => {
    expect(spanishSyllables('NNT')).toBe(5);
  });

  it('reads numerals as Spanish words: 15 quin-ce, 100 cien, 101 cien-to u-no, 2,5 dos co-ma cin-co', () => {
    expect(spanishSyllables('15')).toBe(2);
    expect(spanishSyllables('100')).toBe(1);
    expect(spanishSyllables('101')).toBe(4);
    expect(spanishSyllables('2,5')).toBe(5);
  });
});

describe('spanishNumberWords', () => {
  // Spanish cardinal names (RAE & ASALE 2010, Ortografía, on numerals; from memory).
  it.each([
    ['0', ['cero']],
    ['21', ['veintiuno']],
    ['45', ['cuarenta', 'y', 'cinco']],
    ['100', ['cien']],
    ['1000', ['mil']],
    ['1.000', ['mil']],
    ['21\u00a0000', ['veintiún', 'mil']],
    ['1000000', ['un', 'millón']],
    ['15 %', ['quince', 'por', 'ciento']],
  ])('reads %s as %j', (numeral, words) => {
    expect(spanishNumberWords(numeral)).toEqual(words);
  });

  it('gives null for text that is not a numeral', () => {
    expect(spanishNumberWords('hola')).toBeNull();
  });
});
