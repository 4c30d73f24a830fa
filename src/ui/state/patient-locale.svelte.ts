/**
 * The patient words of the open topic's language. English is loaded with the app; another
 * language's words are loaded the first time a topic in it is opened, so they add nothing to
 * the start-up script. Until they arrive, `wordsFor` gives null and the patient-facing parts wait,
 * rather than showing a Spanish topic's sentences in English for a moment.
 */
import type { PatientLanguage, PatientWords } from '../../locale/locale-bundle.ts';

/** Loads one language's patient words (see `locale/patient-words.ts`). */
export type PatientWordsLoader = (language: PatientLanguage) => Promise<PatientWords>;

export class PatientLocale {
  #loaded = $state<Partial<Record<PatientLanguage, PatientWords>>>({});
  /** A language whose words could not be loaded, with what went wrong; null when none failed. */
  failure = $state<{ readonly language: PatientLanguage; readonly detail: string } | null>(null);
  readonly #pending = new Set<PatientLanguage>();
  readonly #load: PatientWordsLoader;

  constructor(english: PatientWords, load: PatientWordsLoader) {
    this.#loaded = { [english.language]: english };
    this.#load = load;
  }

  /** The words of `language`, or null while they load (the load starts on the first call). */
  wordsFor(language: PatientLanguage): PatientWords | null {
    const found = this.#loaded[language];
    if (found !== undefined) return found;
    // After a failure only `ready` tries again, so a drawing that asks does not retry in a loop.
    if (!this.#pending.has(language) && this.failure?.language !== language) void this.#fetch(language);
    return null;
  }

  /** Resolves once `language`'s words are loaded (or have failed to); tries again after a failure. */
  async ready(language: PatientLanguage): Promise<void> {
    if (this.#loaded[language] !== undefined) return;
    await this.#fetch(language);
  }

  async #fetch(language: PatientLanguage): Promise<void> {
    if (this.#pending.has(language)) return;
    this.#pending.add(language);
    try {
      const words = await this.#load(language);
      this.#loaded = { ...this.#loaded, [language]: words };
      if (this.failure?.language === language) this.failure = null;
    } catch (error) {
      this.failure = { language, detail: error instanceof Error ? error.message : String(error) };
    } finally {
      this.#pending.delete(language);
    }
  }
}
