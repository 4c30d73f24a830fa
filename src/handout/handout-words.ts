/**
 * The words one handout is printed in, gathered in one object so that every part of the
 * sheet (the wording sentences, the pictures' headings and captions, the table, the
 * screening section, the disclosures, the assumption lines) speaks the same language.
 */
import { wordingMessages } from '../core/messages/en/wording.ts';
import { wordingMessagesEs } from '../core/messages/es/wording.ts';
import { type ReadingLanguage } from '../core/wording/reading-scale.ts';
import type { WordingMessages } from '../core/wording/wording-catalogue.ts';
import { type PatientLanguage, readLanguageTag } from '../core/topic/topic-language.ts';
import type { ChartMessages } from '../render/messages/chart-messages.ts';
import { chartMessagesEn } from '../render/messages/en.ts';
import { chartMessagesEs } from '../render/messages/es.ts';
import { handoutMessagesEn } from './messages/en.ts';
import { handoutMessagesEs } from './messages/es.ts';
import type { HandoutMessages } from './messages/handout-messages.ts';

/** Every catalogue a handout reads from. */
export interface HandoutWords {
  /** The sentences about the numbers (`topicWording`). */
  readonly wording: WordingMessages;
  /** The pictures' headings, titles and labels (`outcomeChart`). */
  readonly chart: ChartMessages;
  /** Everything else on the sheet; its `language` is also the PDF's document language. */
  readonly handout: HandoutMessages;
}

/** The English handout: the default when no words are given. */
export const englishHandoutWords: HandoutWords = {
  wording: wordingMessages,
  chart: chartMessagesEn,
  handout: handoutMessagesEn,
};

/** The Spanish handout: sentences, pictures and sheet in Spanish. */
export const spanishHandoutWords: HandoutWords = {
  wording: wordingMessagesEs,
  chart: chartMessagesEs,
  handout: handoutMessagesEs,
};

/**
 * The handout words of a patient language (a topic's, from `topicLanguage`). The handout is
 * its own chunk in the app, so carrying both languages here adds nothing to start-up.
 *
 * @example handoutWordsFor('es').handout.language // => 'es'
 */
export function handoutWordsFor(language: PatientLanguage): HandoutWords {
  return language === 'es' ? spanishHandoutWords : englishHandoutWords;
}

/**
 * The readability scale of the sheet's language, from the handout catalogue's BCP 47 tag:
 * any Spanish tag reads on the Spanish scale, anything else on the English one.
 *
 * @example readingLanguageOf(handoutMessagesEn) // => 'en'
 */
export function readingLanguageOf(messages: Pick<HandoutMessages, 'language'>): ReadingLanguage {
  const reading = readLanguageTag(messages.language);
  return reading.ok && reading.language === 'es' ? 'es' : 'en';
}
