import { describe, expect, it } from 'vitest';
import { READING_GRADE_LIMIT } from '../../../src/core/wording/readability.ts';
import { typedTextWarnings, typedTexts } from '../../../src/core/wording/typed-texts.ts';

// Flesch–Kincaid grade = 0.39 × words/sentences + 11.8 × syllables/words − 15.59 (Kincaid et al. 1975).
// Plain-language targets for patient materials sit at about grade 6 to 8 (common practice); the
// handout warns above READING_GRADE_LIMIT.

const texts = { title: 'Stones topic (illustrative)', population: 'people with a past stone', questions: ['', 'Can I stop?'] };

describe('the typed texts the handout prints', () => {
  it('are the title, the population and each question by its number, empty ones left out', () => {
    expect(typedTexts(texts)).toEqual([
      { field: 'the title', text: 'Stones topic (illustrative)' },
      { field: 'the population (who the numbers are for)', text: 'people with a past stone' },
      { field: 'question 2', text: 'Can I stop?' },
    ]);
  });

  it('warn for the title above the target, naming it, and for no plain text', () => {
    expect(READING_GRADE_LIMIT).toBe(8);
    // "Stones topic (illustrative)": 3 words, 1 + 2 + 4 = 7 syllables: 0.39 × 3 + 11.8 × 7 / 3 − 15.59 = 13.113.
    // "people with a past stone": 5 words, 2 + 1 + 1 + 1 + 1 = 6 syllables: 0.39 × 5 + 11.8 × 6 / 5 − 15.59 = 0.52.
    // "Can I stop?": 3 words of 1 syllable: 0.39 × 3 + 11.8 − 15.59 = −2.62.
    const warnings = typedTextWarnings(texts);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]?.code).toBe('reading-grade-high');
    expect(warnings[0]?.values.field).toBe('the title');
    expect(warnings[0]?.values.grade).toBeCloseTo(13.113, 3);
  });
});
