/** The English words of every layer, loaded with the app (English is the default and the fallback of none). */
import { english } from '../core/messages/en/index.ts';
import { wordingMessages } from '../core/messages/en/wording.ts';
import { chartMessagesEn } from '../render/messages/en.ts';
import { shellMessagesEn } from '../../electron/main/messages/en.ts';
import { uiMessagesEn } from '../ui/messages/en.ts';
import type { InterfaceWords, Locales, PatientWords } from './locale-bundle.ts';

export const englishPatientWords: PatientWords = {
  language: 'en',
  wording: wordingMessages,
  chart: chartMessagesEn,
};

export const englishInterfaceWords: InterfaceWords = {
  ui: uiMessagesEn,
  core: english,
  shell: shellMessagesEn,
};

export const englishLocales: Locales = { interface: englishInterfaceWords, patient: englishPatientWords };
