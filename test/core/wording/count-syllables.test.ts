import { describe, expect, it } from 'vitest';
import { countSyllables } from '../../../src/core/wording/count-syllables.ts';

describe('countSyllables', () => {
  // The two commonly quoted Flesch worked examples give each word's syllables: "The cat sat on the
  // mat." (6 one-syllable words) and "The Australian platypus is seemingly a hybrid of a mammal and
  // reptilian creature." (26 syllables in 13 words).
  it('counts the words of "The cat sat on the mat." as one syllable each', () => {
    expect(['The', 'cat', 'sat', 'on', 'the', 'mat.'].map(countSyllables)).toEqual([1, 1, 1, 1, 1, 1]);
  });

  it('counts the platypus sentence word by word to 26 syllables', () => {
    const words = 'The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.'.split(' ');
    const counts = words.map(countSyllables);
    // Dictionary syllabification (from memory, Merriam-Webster): Aus-tra-li-an, plat-y-pus,
    // seem-ing-ly, hy-brid, mam-mal, rep-til-i-an, crea-ture.
    expect(counts).toEqual([1, 4, 3, 1, 3, 1, 2, 1, 1, 2, 1, 4, 2]);
    expect(counts.reduce((sum, count) => sum + count, 0)).toBe(26);
  });

  // Dictionary syllable counts, from memory (Merriam-Webster syllabification).
  it.each([
    ['syllable', 3], // syl-la-ble
    ['readability', 5], // read-a-bil-i-ty
    ['communication', 5], // com-mu-ni-ca-tion
    ['beautiful', 3], // beau-ti-ful
    ['people', 2], // peo-ple
    ['little', 2], // lit-tle
    ['because', 2], // be-cause
    ['evidence', 3], // ev-i-dence
    ['probably', 3], // prob-a-bly
    ['uncertain', 3], // un-cer-tain
    ['medication', 4], // med-i-ca-tion
    ['serious', 3], // se-ri-ous
    ['period', 3], // pe-ri-od
    ['usual', 3], // u-su-al
    ['experience', 4], // ex-pe-ri-ence
    ['everything', 3], // ev-ery-thing
    ['someone', 2], // some-one
  ])('counts "%s" as %i syllables', (word, syllables) => {
    expect(countSyllables(word)).toBe(syllables);
  });

  // The usual suffix rules (common practice in syllable counters): silent final e, -es after a
  // consonant, -ed except after t or d, syllabic -le.
  it('drops a silent final e but keeps a syllabic -le', () => {
    expect(countSyllables('stroke')).toBe(1);
    expect(countSyllables('make')).toBe(1);
    expect(countSyllables('table')).toBe(2);
    expect(countSyllables('muscle')).toBe(2);
    expect(countSyllables('the')).toBe(1);
  });

  it('drops -es and -ed after most consonants but not after sibilants, t or d', () => {
    expect(countSyllables('makes')).toBe(1);
    expect(countSyllables('reduces')).toBe(3);
    expect(countSyllables('changes')).toBe(2);
    expect(countSyllables('walked')).toBe(1);
    expect(countSyllables('wanted')).toBe(2);
    expect(countSyllables('needed')).toBe(2);
  });

  it('treats y as a consonant at the start of a word and after a vowel, and as a vowel elsewhere', () => {
    expect(countSyllables('you')).toBe(1);
    expect(countSyllables('years')).toBe(1);
    expect(countSyllables('saying')).toBe(2);
    expect(countSyllables('very')).toBe(2);
  });

  it('ignores case, apostrophes and surrounding punctuation', () => {
    expect(countSyllables('"People,')).toBe(2);
    expect(countSyllables("don't")).toBe(1);
    expect(countSyllables('(Stroke)')).toBe(1);
  });

  it('adds up the parts of a hyphenated word', () => {
    expect(countSyllables('long-term')).toBe(2);
    expect(countSyllables('follow-up')).toBe(3);
  });

  it('reads numerals aloud, so "100" is one hun-dred', () => {
    expect(countSyllables('100')).toBe(3);
    expect(countSyllables('15%')).toBe(4);
    expect(countSyllables('2.5')).toBe(3);
  });

  it('spells out short capitals without a vowel, such as GP and NNTB', () => {
    expect(countSyllables('GP')).toBe(2);
    expect(countSyllables('NNTB')).toBe(4);
  });

  it('gives a word of letters without vowels one syllable, and a bare symbol none', () => {
    expect(countSyllables('hmm')).toBe(1);
    expect(countSyllables('&')).toBe(0);
  });
});
