/**
 * The words a patient reads on a topic's slides, in the topic's own language. A teaching set
 * may hold topics in different languages, so each topic's slides choose their own.
 */
import type { PatientLanguage } from '../../core/topic/topic-language.ts';
import { teachingPatientSlideMessagesEn } from './en.ts';
import { teachingPatientSlideMessagesEs } from './es.ts';
import type { TeachingPatientSlideMessages } from './teaching-messages.ts';

/** Picks a topic's patient slide words by its language. */
export type PatientSlideWords = (language: PatientLanguage) => TeachingPatientSlideMessages;

/**
 * The patient slide words Chancewise ships, by language.
 *
 * @example patientSlideWordsFor('es').stepNames.baseline // => 'Sin la opción'
 */
export const patientSlideWordsFor: PatientSlideWords = (language) =>
  language === 'es' ? teachingPatientSlideMessagesEs : teachingPatientSlideMessagesEn;
