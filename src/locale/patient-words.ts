/**
 * The patient words of a language. English comes with the app; Spanish is a separate chunk
 * (`./spanish.ts`), imported the first time it is asked for, so it adds nothing to start-up.
 */
import { englishPatientWords } from './english.ts';
import type { PatientLanguage, PatientWords } from './locale-bundle.ts';

/** The patient words of `language`, loading them when needed. */
export async function loadPatientWords(language: PatientLanguage): Promise<PatientWords> {
  if (language === 'en') return englishPatientWords;
  return (await import('./spanish.ts')).spanishPatientWords;
}
