/**
 * The language a topic's patient wording is written in. A topic names it with a BCP 47 tag
 * (Phillips & Davis 2009, RFC 5646 "Tags for Identifying Languages"); only the primary language
 * subtag chooses the wording, so "es", "es-ES", "es-419" and "es-MX" all read as Spanish, and a
 * topic without a tag is English.
 */

/** The patient languages Chancewise writes. */
export const PATIENT_LANGUAGES = ['en', 'es'] as const;
export type PatientLanguage = (typeof PATIENT_LANGUAGES)[number];

/**
 * A well-formed language tag in the subset that matters here: a primary subtag of 2 or 3
 * letters, then optional subtags of 1 to 8 letters or digits (RFC 5646 §2.1, simplified:
 * extended language and private-use forms are accepted but not told apart).
 */
const LANGUAGE_TAG = /^[a-z]{2,3}(-[a-z0-9]{1,8})*$/i;

/** What a topic's language tag reads as. */
export type LanguageReading =
  | { readonly ok: true; readonly language: PatientLanguage }
  | { readonly ok: false; readonly tag: string; readonly reason: 'malformed' | 'unsupported' };

/**
 * The patient language a tag selects.
 *
 * @example readLanguageTag('es-419') // => { ok: true, language: 'es' }
 * @example readLanguageTag(undefined) // => { ok: true, language: 'en' }
 * @example readLanguageTag('fr') // => { ok: false, tag: 'fr', reason: 'unsupported' }
 */
export function readLanguageTag(tag: string | undefined): LanguageReading {
  if (tag === undefined) return { ok: true, language: 'en' };
  const trimmed = tag.trim();
  if (!LANGUAGE_TAG.test(trimmed)) return { ok: false, tag, reason: 'malformed' };
  const primary = trimmed.split('-')[0]?.toLowerCase() ?? '';
  const found = PATIENT_LANGUAGES.find((language) => language === primary);
  return found === undefined ? { ok: false, tag, reason: 'unsupported' } : { ok: true, language: found };
}

/** The patient language of a topic whose tag was checked on reading: English when absent or not supported. */
export function topicLanguage(topic: { readonly language?: string }): PatientLanguage {
  const reading = readLanguageTag(topic.language);
  return reading.ok ? reading.language : 'en';
}
