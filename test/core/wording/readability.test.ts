import { describe, expect, it } from 'vitest';
import { describeNotice } from '../../../src/core/messages/describe.ts';
import {
  fleschKincaidGrade,
  fleschReadingEase,
  readability,
  readingWarnings,
  READING_GRADE_LIMIT,
} from '../../../src/core/wording/readability.ts';

const TOLERANCE = 9; // decimal places: 1e-9

describe('fleschReadingEase and fleschKincaidGrade on counts', () => {
  // Formulas: Flesch (1948), J Appl Psychol 32:221–233 (FRE = 206.835 − 1.015 ASL − 84.6 ASW);
  // Kincaid, Fishburne, Rogers & Chissom (1975), Research Branch Report 8-75 (FKGL = 0.39 ASL +
  // 11.8 ASW − 15.59). Worked examples: the commonly quoted "cat" and "platypus" sentences
  // (FRE 116.145 and 24.44); grade values and the synthetic rows computed from the formulas.
  it.each([
    [{ sentences: 1, words: 6, syllables: 6 }, 116.145, -1.45],
    [{ sentences: 1, words: 13, syllables: 26 }, 24.44, 13.08],
    [{ sentences: 5, words: 75, syllables: 105 }, 73.17, 6.78],
    [{ sentences: 10, words: 100, syllables: 130 }, 86.705, 3.65],
  ])('scores %o as reading ease %d and grade %d', (counts, ease, grade) => {
    expect(fleschReadingEase(counts)).toBeCloseTo(ease, TOLERANCE);
    expect(fleschKincaidGrade(counts)).toBeCloseTo(grade, TOLERANCE);
  });

  it('does not clamp: two one-syllable words per sentence score above 100 and below grade 0', () => {
    // 206.835 − 1.015 × 2 − 84.6 × 1 = 120.205, above the nominal 0–100 scale.
    const counts = { sentences: 1, words: 2, syllables: 2 };
    expect(fleschReadingEase(counts)).toBeCloseTo(206.835 - 2.03 - 84.6, TOLERANCE);
    expect(fleschKincaidGrade(counts)).toBeLessThan(0);
  });

  it('does not clamp below 0 either: long words in long sentences score negative', () => {
    expect(fleschReadingEase({ sentences: 1, words: 40, syllables: 140 })).toBeCloseTo(
      206.835 - 1.015 * 40 - 84.6 * 3.5,
      TOLERANCE,
    );
    expect(fleschReadingEase({ sentences: 1, words: 40, syllables: 140 })).toBeLessThan(0);
  });

  it('gives null, not NaN or Infinity, when there are no words or no sentences', () => {
    expect(fleschReadingEase({ sentences: 0, words: 0, syllables: 0 })).toBeNull();
    expect(fleschKincaidGrade({ sentences: 1, words: 0, syllables: 0 })).toBeNull();
  });
});

describe('readability', () => {
  it('scores "The cat sat on the mat." as 1 sentence, 6 words, 6 syllables, FRE 116.145, FKGL −1.45', () => {
    // Commonly quoted Flesch worked example.
    const found = readability('The cat sat on the mat.');
    expect(found).toMatchObject({ sentences: 1, words: 6, syllables: 6 });
    expect(found.readingEase).toBeCloseTo(116.145, TOLERANCE);
    expect(found.grade).toBeCloseTo(-1.45, TOLERANCE);
  });

  it('scores the platypus sentence as 1 sentence, 13 words, 26 syllables, FRE 24.44, FKGL 13.08', () => {
    // Commonly quoted Flesch worked example.
    const found = readability('The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.');
    expect(found).toMatchObject({ sentences: 1, words: 13, syllables: 26 });
    expect(found.readingEase).toBeCloseTo(24.44, TOLERANCE);
    expect(found.grade).toBeCloseTo(13.08, TOLERANCE);
  });

  it('adds the counts of several sentences, so both examples together score from 2 / 19 / 32', () => {
    const found = readability(
      'The cat sat on the mat. The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.',
    );
    expect(found).toMatchObject({ sentences: 2, words: 19, syllables: 32 });
    expect(found.readingEase).toBeCloseTo(206.835 - 1.015 * (19 / 2) - 84.6 * (32 / 19), TOLERANCE);
  });

  it('counts "About 15 in 100 will not." as 6 words with numbers read aloud (15 = 2, 100 = 3)', () => {
    // a-bout (2) fif-teen (2) in (1) one hun-dred (3) will (1) not (1): numbers read as spoken.
    expect(readability('About 15 in 100 will not.')).toMatchObject({ sentences: 1, words: 6, syllables: 10 });
  });

  it('gives empty text zero counts and null scores', () => {
    expect(readability('')).toEqual({ sentences: 0, words: 0, syllables: 0, readingEase: null, grade: null });
  });
});

describe('readingWarnings', () => {
  // Handout text at grade 8 or below: the top of the grade 6 to 8 that plain-language advice for
  // patient material usually asks for (common practice).
  it('uses grade 8 as the limit', () => {
    expect(READING_GRADE_LIMIT).toBe(8);
  });

  it('warns about clinician text above grade 8 and names its field and grade', () => {
    const text = 'The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.';
    const warnings = readingWarnings([
      { field: 'population', text: 'People aged 60 to 69.' },
      { field: 'questions.0', text },
    ]);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]?.code).toBe('reading-grade-high');
    expect(warnings[0]?.values.field).toBe('questions.0');
    expect(warnings[0]?.values.grade).toBeCloseTo(13.08, TOLERANCE);
    expect(warnings[0]?.values.limit).toBe(8);
  });

  it('does not warn at or below the limit, nor about empty text', () => {
    expect(
      readingWarnings([
        { field: 'title', text: 'The cat sat on the mat.' },
        { field: 'clinician', text: '' },
      ]),
    ).toEqual([]);
  });

  it('warns only strictly above the limit given', () => {
    const text = 'The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.';
    // Grade 13.08, shown as 13.1: not above 13.1, above 13.
    expect(readingWarnings([{ field: 'title', text }], 13.1)).toEqual([]);
    expect(readingWarnings([{ field: 'title', text }], 13)).toHaveLength(1);
  });

  it('judges the grade as the warning shows it, to one decimal, so it never reads "grade 8, above grade 8"', () => {
    // Grade 8.009 by the formula: 11 words, 18 syllables ("sixty" 2, "seventy-four" 4), 1 sentence, so 0.39 × 11 + 11.8 × 18 / 11 − 15.59 (Kincaid et al. 1975); shown as 8.
    const text = 'people aged 60 to 74 with no signs of bowel cancer';
    expect(readability(text).grade).toBeGreaterThan(8);
    expect(readability(text).grade).toBeLessThan(8.05);
    expect(readingWarnings([{ field: 'population', text }])).toEqual([]);
  });

  it('has a sentence in the catalogue for its warning', () => {
    const [warning] = readingWarnings([
      { field: 'title', text: 'The Australian platypus is seemingly a hybrid of a mammal and reptilian creature.' },
    ]);
    expect(warning).toBeDefined();
    if (warning !== undefined) {
      expect(describeNotice(warning)).toBe(
        'The text in title reads at about grade 13.1, above grade 8. Shorter sentences and everyday words make it easier to read.',
      );
    }
  });
});
