import { describe, expect, it } from 'vitest';
import { describeNotice } from '../../../src/core/messages/describe.ts';
import {
  INFLESZ_TARGET,
  fernandezHuertaReadability,
  infleszBand,
  spanishReadability,
  szigrisztPerspicuity,
} from '../../../src/core/wording/readability-es.ts';
import { readabilityFor, readingWarningsFor } from '../../../src/core/wording/reading-scale.ts';
import { typedTextWarnings } from '../../../src/core/wording/typed-texts.ts';

const TOLERANCE = 9;

describe('the Spanish formulas on counts', () => {
  // Computed from the formulas' own published constants (no published worked example with counts
  // was found): Szigriszt Pazos (1993) IFSZ = 206.835 − 62.3 S/W − W/F; Fernández Huerta (1959)
  // L = 206.84 − 0.60 P − 1.02 F, P syllables per 100 words, F words per sentence, as corrected
  // by Law (2011, LINGUIST List 22.2332).
  it('scores 1 sentence of 10 words and 20 syllables as IFSZ 74.235 and L 76.44', () => {
    const counts = { sentences: 1, words: 10, syllables: 20 };
    expect(szigrisztPerspicuity(counts)).toBeCloseTo(206.835 - 124.6 - 10, TOLERANCE);
    expect(fernandezHuertaReadability(counts)).toBeCloseTo(206.84 - 120 - 10.2, TOLERANCE);
  });

  it('scores shorter sentences as easier on both (the corrected Fernández Huerta form)', () => {
    const long = { sentences: 1, words: 20, syllables: 40 };
    const short = { sentences: 4, words: 20, syllables: 40 };
    expect(fernandezHuertaReadability(short) ?? 0).toBeGreaterThan(fernandezHuertaReadability(long) ?? 0);
    expect(szigrisztPerspicuity(short) ?? 0).toBeGreaterThan(szigrisztPerspicuity(long) ?? 0);
  });

  it('gives null with no words', () => {
    expect(szigrisztPerspicuity({ sentences: 0, words: 0, syllables: 0 })).toBeNull();
  });
});

describe('spanishReadability', () => {
  it('counts a hand-checked passage: "El médico le explica el tratamiento. Usted decide." as 2 / 8 / 18', () => {
    // el(1) mé-di-co(3) le(1) ex-pli-ca(3) el(1) tra-ta-mien-to(4) / us-ted(2) de-ci-de(3) = 18.
    const found = spanishReadability('El médico le explica el tratamiento. Usted decide.');
    expect(found).toMatchObject({ sentences: 2, words: 8, syllables: 18 });
    expect(found.perspicuity).toBeCloseTo(206.835 - 62.3 * (18 / 8) - 4, TOLERANCE);
  });

  it('keeps "10 000" and "15 %" as one word each', () => {
    expect(spanishReadability('Unas 15 % de 10\u00a0000 personas.').words).toBe(5);
  });
});

describe('the INFLESZ scale (Barrio-Cantalejo et al. 2008)', () => {
  it.each([
    [39, 'very-difficult'],
    [40, 'somewhat-difficult'],
    [54, 'somewhat-difficult'],
    [55, 'normal'],
    [64, 'normal'],
    [65, 'fairly-easy'],
    [80, 'fairly-easy'],
    [81, 'very-easy'],
  ])('puts %d in %s', (score, band) => {
    expect(infleszBand(score)).toBe(band);
  });

  it('aims patient text at 55 or more', () => {
    expect(INFLESZ_TARGET).toBe(55);
  });
});

describe('readabilityFor', () => {
  it('gives English the Flesch–Kincaid grade as before', () => {
    expect(readabilityFor('The cat sat on the mat.', 'en')).toEqual({
      scale: 'flesch-kincaid-grade',
      score: -1.4, // −1.45 to one decimal, rounded half up as the results panel does
      limit: 8,
      withinTarget: true,
      source: 'Kincaid et al. 1975',
    });
  });

  it('gives Spanish the INFLESZ score, band, target and source', () => {
    // 2 sentences, 8 words, 18 syllables: 206.835 − 140.175 − 4 = 62.66, shown 63, normal.
    expect(readabilityFor('El médico le explica el tratamiento. Usted decide.', 'es')).toEqual({
      scale: 'inflesz',
      score: 63,
      band: 'normal',
      target: 55,
      withinTarget: true,
      source: 'Barrio-Cantalejo et al. 2008',
    });
  });

  it('scores a sample Spanish patient paragraph as very easy', () => {
    const text =
      'Sin la pastilla, unas 15 de cada 100 personas tienen un ictus en 10 años. Con la pastilla, unas 10 de cada 100 lo tienen. Es decir, 5 personas menos de cada 100. Puede tener molestias de estómago. Hable con su médico si tiene dudas.';
    // 5 sentences, 45 words, 78 syllables: 206.835 − 62.3 × 78/45 − 9 = 89.85.
    expect(spanishReadability(text)).toMatchObject({ sentences: 5, words: 45, syllables: 78 });
    expect(readabilityFor(text, 'es')).toMatchObject({ score: 90, band: 'very-easy', withinTarget: true });
  });
});

describe('Spanish reading warnings', () => {
  const hard =
    'La administración profiláctica de anticoagulantes orales disminuye significativamente la incidencia de complicaciones tromboembólicas.';

  it('warn below the INFLESZ target with reading-ease-low and an English sentence for the clinician', () => {
    const [warning] = readingWarningsFor([{ field: 'the title', text: hard }], 'es');
    expect(warning?.code).toBe('reading-ease-low');
    expect(typeof warning?.values.score).toBe('number');
    if (warning !== undefined) {
      expect(describeNotice(warning)).toMatch(
        /^The text in the title has a reading ease of -?\d+ on the INFLESZ scale \(very difficult\), below the aim of 55 \(Barrio-Cantalejo et al\. 2008\)\./,
      );
    }
  });

  it("judge a Spanish topic's typed texts on the Spanish scale, an English one on grades", () => {
    const topic = { title: hard, population: 'Personas con fibrilación auricular', questions: ['¿Puedo dejarlo?'] };
    expect(typedTextWarnings(topic, 'es').map((notice) => notice.code)).toContain('reading-ease-low');
    expect(typedTextWarnings(topic).every((notice) => notice.code === 'reading-grade-high')).toBe(true);
  });
});
