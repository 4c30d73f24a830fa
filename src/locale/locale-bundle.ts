/**
 * The words of one locale, gathered from every layer's own `messages` module: the interface
 * locale (what the clinician reads: screens, menus, dialogs) and the patient locale (what a
 * patient reads: sentences, charts, the handout, the teaching view's slides). The app receives
 * both at its root and passes them down; nothing below it picks a language of its own.
 */
import type { ChartMessages } from '../render/messages/en.ts';
import type { HandoutMessages } from '../handout/messages/en.ts';
import type { TeachingMessages } from '../teaching/messages/en.ts';
import type { WordingMessages } from '../core/wording/wording-catalogue.ts';
import type { ShellMessages } from '../../electron/main/messages/shell-messages.ts';
import type { UiMessages } from '../ui/messages/ui-messages.ts';

export type PatientLanguage = 'en' | 'es';

/** The teaching view's own controls and messages (not its slides, which a patient reads). */
export type TeachingPresenterMessages = TeachingMessages['view'];

/** Everything a patient reads. */
export interface PatientWords {
  /** Also the PDF's document language. */
  readonly language: PatientLanguage;
  readonly wording: WordingMessages;
  readonly chart: ChartMessages;
  readonly handout: HandoutMessages;
  readonly slides: TeachingMessages;
}

/** Everything the clinician reads. */
export interface InterfaceWords {
  readonly ui: UiMessages;
  readonly shell: ShellMessages;
  readonly presenter: TeachingPresenterMessages;
}

export interface Locales {
  readonly interface: InterfaceWords;
  readonly patient: PatientWords;
}
