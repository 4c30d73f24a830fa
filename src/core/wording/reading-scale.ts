/**
 * Readability on the scale of the text's language: for English the Flesch–Kincaid grade
 * (Kincaid et al. 1975) with the handout's grade limit; for Spanish the Szigriszt-Pazos
 * perspicuity on the INFLESZ scale (Barrio-Cantalejo et al. 2008) with its target. Structured
 * values only: the words that say them are the interface catalogue's.
 */
import type { Notice } from '../types.ts';
import { READING_GRADE_LIMIT, readability, readingWarnings } from './readability.ts';
import type { UserText } from './readability.ts';
import { INFLESZ_TARGET, type InfleszBand, infleszBand, spanishReadability } from './readability-es.ts';

/** The languages whose readability Chancewise scores. */
export type ReadingLanguage = 'en' | 'es';

/** Where each scale and its target come from. */
export const READING_SOURCES = {
  'flesch-kincaid-grade': 'Kincaid et al. 1975',
  inflesz: 'Barrio-Cantalejo et al. 2008',
} as const;

/** A text's reading level on the English grade scale: lower is easier, the aim at or below `limit`. */
export interface GradeReading {
  readonly scale: 'flesch-kincaid-grade';
  /** The grade to one decimal, or null when there is no text. */
  readonly score: number | null;
  readonly limit: number;
  readonly withinTarget: boolean;
  readonly source: string;
}

/** A text's reading ease on the INFLESZ scale: higher is easier, the aim at or above `target`. */
export interface InfleszReading {
  readonly scale: 'inflesz';
  /** The Szigriszt-Pazos perspicuity, whole, or null when there is no text. */
  readonly score: number | null;
  readonly band: InfleszBand | null;
  readonly target: number;
  readonly withinTarget: boolean;
  readonly source: string;
}

export type ReadingLevel = GradeReading | InfleszReading;

/** The reading level of counts already made, on the scale of `language`. */
export function readingLevelOf(score: number | null, language: ReadingLanguage): ReadingLevel {
  if (language === 'es') {
    // Judged on the score as shown (whole), so no text reads "55, below 55".
    const shown = score === null ? null : Math.round(score);
    return {
      scale: 'inflesz',
      score: shown,
      band: shown === null ? null : infleszBand(shown),
      target: INFLESZ_TARGET,
      withinTarget: shown !== null && shown >= INFLESZ_TARGET,
      source: READING_SOURCES.inflesz,
    };
  }
  const shown = score === null ? null : Math.round(score * 10) / 10;
  return {
    scale: 'flesch-kincaid-grade',
    score: shown,
    limit: READING_GRADE_LIMIT,
    withinTarget: shown !== null && shown <= READING_GRADE_LIMIT,
    source: READING_SOURCES['flesch-kincaid-grade'],
  };
}

/**
 * The reading level of `text` on the scale of its language.
 *
 * @example readabilityFor('El gato come.', 'es').scale // => 'inflesz'
 */
export function readabilityFor(text: string, language: ReadingLanguage): ReadingLevel {
  return readingLevelOf(language === 'es' ? spanishReadability(text).perspicuity : readability(text).grade, language);
}

/**
 * Reading warnings for typed texts on the scale of their language: English texts get
 * `reading-grade-high` as before; Spanish texts get `reading-ease-low` (values: field, score,
 * band, target) when their INFLESZ score, whole, is below the target.
 */
export function readingWarningsFor(texts: readonly UserText[], language: ReadingLanguage): readonly Notice[] {
  if (language === 'en') return readingWarnings(texts);
  return texts.flatMap(({ field, text }) => {
    const level = readabilityFor(text, 'es');
    if (level.scale !== 'inflesz' || level.score === null || level.withinTarget) return [];
    return [{ code: 'reading-ease-low', values: { field, score: level.score, band: level.band ?? '', target: level.target } }];
  });
}
