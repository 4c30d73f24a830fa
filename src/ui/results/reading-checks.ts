/**
 * The results' reading checks in one module, which the results panel loads beside its first
 * draw: the syllable counts and reading scales of both languages stay out of the start-up
 * script, and the reading level and warnings they feed wait for their turn below the charts
 * anyway. Nothing here is imported by the start-up script, so the module and its imports
 * form a chunk of their own.
 */
export { patientTextsKey, readingNoticesFor } from './reading-notices.ts';
export { patientReadingLevel } from './reading-grade.ts';
