/**
 * The Spanish words of everything a patient reads on screen: the core's sentences and the
 * pictures' text. Loaded the first time a Spanish topic is opened (see `patient-words.ts`).
 */
import { wordingMessagesEs } from '../core/messages/es/wording.ts';
import { chartMessagesEs } from '../render/messages/es.ts';
import type { PatientWords } from './locale-bundle.ts';

export const spanishPatientWords: PatientWords = {
  language: 'es',
  wording: wordingMessagesEs,
  chart: chartMessagesEs,
};
