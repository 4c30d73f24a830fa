/**
 * The words of one locale, gathered from every layer's own `messages` module: the interface
 * locale (what the clinician reads: screens, menus, dialogs) and the patient locale (what a
 * patient reads: sentences, charts, the handout, the teaching view's slides). The app receives
 * both at its root and passes them down; nothing below it picks a language of its own. The
 * handout's and the teaching view's words load with those parts, not at start-up.
 */
import type { ChartMessages } from '../render/messages/chart-messages.ts';
import type { WordingMessages } from '../core/wording/wording-catalogue.ts';
import type { ShellMessages } from '../../electron/main/messages/shell-messages.ts';
import type { UiMessages } from '../ui/messages/ui-messages.ts';
import type { Catalogue } from '../core/messages/describe.ts';

export type { PatientLanguage } from '../core/topic/topic-language.ts';
import type { PatientLanguage } from '../core/topic/topic-language.ts';

/** Everything a patient reads. */
export interface PatientWords {
  /** Also the PDF's document language. */
  readonly language: PatientLanguage;
  readonly wording: WordingMessages;
  readonly chart: ChartMessages;
}

/** Everything the clinician reads. */
export interface InterfaceWords {
  readonly ui: UiMessages;
  /** The core's problems and warnings, as the clinician reads them beside fields and results. */
  readonly core: Catalogue;
  readonly shell: ShellMessages;
}

export interface Locales {
  readonly interface: InterfaceWords;
  readonly patient: PatientWords;
}
