/**
 * The locale bundle in Svelte context: `App.svelte` sets it once at the root, and components
 * read their words from it. A component mounted without it fails at once rather than falling
 * back to a language on its own. State classes do not read context: they receive their words
 * by constructor.
 */
import { getContext, hasContext, setContext } from 'svelte';
import type { InterfaceWords, Locales, PatientWords } from '../../locale/locale-bundle.ts';
import type { UiMessages } from '../messages/ui-messages.ts';

const LOCALES = Symbol('locales');

/** Where the words come from: read when used, so the patient words can follow the open topic. */
export interface LocaleSource {
  readonly current: Locales;
  /**
   * The patient words of the open topic's language, or null while they load; absent, the
   * patient words of `current` are used (a component test in one language).
   */
  readonly patient?: () => PatientWords | null;
}

/** The context entries that provide these locales, for `setContext` or a test's `render(…, { context })`. */
export function localeContext(source: LocaleSource): Map<symbol, LocaleSource> {
  return new Map([[LOCALES, source]]);
}

/** Give every component below the caller these locales (call during the root component's set-up). */
export function setLocales(source: LocaleSource): void {
  setContext(LOCALES, source);
}

function source(): LocaleSource {
  if (!hasContext(LOCALES)) throw new Error('no locale in context: mount the component below App, or give it localeContext()');
  return getContext<LocaleSource>(LOCALES);
}

export const getInterfaceWords = (): InterfaceWords => source().current.interface;
export const getUiWords = (): UiMessages => source().current.interface.ui;
/**
 * The patient words of the moment, or null while the open topic's language loads: call the
 * function inside `$derived` so a change of topic language is followed.
 */
export const getPatientWords = (): (() => PatientWords | null) => {
  const found = source();
  const patient = found.patient;
  return patient === undefined ? () => found.current.patient : patient;
};
