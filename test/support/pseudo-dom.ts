/**
 * What a pseudo-locale test of rendered screens needs: the English locales with every catalogue
 * word wrapped ⟦…⟧ (`pseudo-locale.ts`), the teaching view's catalogues wrapped the same way, and
 * a search of the page for any word left once the wrapped words, the texts the clinician typed,
 * numbers and symbols are taken out.
 */
import { englishLocales } from '../../src/locale/english.ts';
import type { Locales } from '../../src/locale/locale-bundle.ts';
import { teachingClinicianMessagesEn } from '../../src/teaching/messages/en.ts';
import type { PatientSlideWords } from '../../src/teaching/messages/patient-slide-words.ts';
import { patientSlideWordsFor } from '../../src/teaching/messages/patient-slide-words.ts';
import type { TeachingClinicianMessages } from '../../src/teaching/messages/teaching-messages.ts';
import { HANDED_CODES, noting, pseudoLocale, stripPseudo } from './pseudo-locale.ts';

/** The English interface and patient words, every one wrapped (the desktop shell's are not on these screens). */
export const pseudoLocales: Locales = {
  interface: {
    ui: pseudoLocale(englishLocales.interface.ui),
    core: pseudoLocale(englishLocales.interface.core),
    shell: englishLocales.interface.shell,
  },
  patient: {
    language: englishLocales.patient.language,
    wording: pseudoLocale(englishLocales.patient.wording),
    chart: pseudoLocale(englishLocales.patient.chart),
  },
};

/**
 * The pseudo locales, noting what the code hands to the words. A wrapped sentence hides any
 * English handed into it ("⟦Saved ⟦…⟧ in 5 years⟧" would hide "5 years"), so `handedLeaks`
 * lists each string handed over that is neither typed text, nor a number, nor a code.
 */
export function notingPseudoLocales(): {
  readonly locales: Locales;
  readonly handedLeaks: (typed: readonly string[]) => string[];
} {
  const handed = new Set<string>();
  const note = (text: string): void => void handed.add(text);
  const locales: Locales = {
    interface: {
      ui: pseudoLocale(noting(englishLocales.interface.ui, note)),
      core: pseudoLocale(noting(englishLocales.interface.core, note)),
      shell: englishLocales.interface.shell,
    },
    patient: {
      language: englishLocales.patient.language,
      wording: pseudoLocale(noting(englishLocales.patient.wording, note)),
      chart: pseudoLocale(noting(englishLocales.patient.chart, note)),
    },
  };
  const handedLeaks = (typed: readonly string[]): string[] =>
    [...handed].filter((text) => !HANDED_CODES.has(text) && leftover(text, typed) !== '');
  return { locales, handedLeaks };
}

/** The teaching view's clinician words, wrapped. */
export const pseudoTeachingClinician: TeachingClinicianMessages = pseudoLocale(teachingClinicianMessagesEn);

/** The teaching view's patient slide words of each language, wrapped. */
export const pseudoPatientSlideWords: PatientSlideWords = (language) => pseudoLocale(patientSlideWordsFor(language));

/** Every string a value holds (a topic's title, population, option and outcome names, questions, sources…), longest first. */
export function typedStrings(...values: readonly unknown[]): string[] {
  const found = (value: unknown): string[] => {
    if (typeof value === 'string') return value.trim() === '' ? [] : [value.trim()];
    if (Array.isArray(value)) return value.flatMap(found);
    if (value !== null && typeof value === 'object') return Object.values(value).flatMap(found);
    return [];
  };
  // Longest first, so a name inside a longer typed text does not break it up.
  return [...new Set(values.flatMap(found))].sort((first, second) => second.length - first.length);
}

const escape = (text: string): string => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** What is left of a text once the catalogue's words and what may stand unwrapped are taken out. */
export function leftover(text: string, typed: readonly string[]): string {
  let rest = stripPseudo(text);
  for (const found of typed) rest = rest.replace(new RegExp(escape(found), 'gi'), ' ');
  return rest
    .replace(/\bNNT[BH]?\b/g, ' ')
    .replace(/[\w-]+\.(json|cwtopic|svg|png|pdf)\b/g, ' ')
    .replace(/\d/g, ' ')
    .replace(/[\s.,:;!?%()[\]'"“”‘’«»–—−\-+=×÷∞·•…/↑↓▲▼◀▶<>]/g, '')
    .trim();
}

function describeElement(element: Element): string {
  const parts: string[] = [];
  for (let node: Element | null = element; node !== null && parts.length < 4; node = node.parentElement) {
    const id = node.id === '' ? '' : `#${node.id}`;
    const className = typeof node.className === 'string' && node.className !== '' ? `.${node.className.split(/\s+/)[0]}` : '';
    parts.push(`${node.tagName.toLowerCase()}${id}${className}`);
  }
  return parts.reverse().join(' > ');
}

/**
 * Every text node and named attribute (aria-label, title, placeholder, alt) with something left
 * over, each as where it was found and the text: an empty list when every word came from a catalogue.
 */
export function leaks(root: Element, typed: readonly string[]): string[] {
  const found: string[] = [];
  const report = (where: string, text: string): void => void found.push(`${where}: ${JSON.stringify(text.trim())}`);
  const walker = root.ownerDocument.createTreeWalker(root, 4 /* NodeFilter.SHOW_TEXT */);
  for (let node = walker.nextNode(); node !== null; node = walker.nextNode()) {
    const parent = node.parentElement;
    if (parent === null || parent.closest('style, script, text') !== null) continue;
    const text = node.textContent ?? '';
    if (leftover(text, typed) !== '') report(describeElement(parent), text);
  }
  // A chart breaks a sentence into lines (tspan): each svg text is read whole, its lines joined.
  for (const element of root.querySelectorAll('text')) {
    const text = [...element.childNodes].map((line) => line.textContent ?? '').join(' ');
    if (leftover(text, typed) !== '') report(describeElement(element), text);
  }
  for (const element of root.querySelectorAll('*')) {
    for (const name of ['aria-label', 'title', 'placeholder', 'alt']) {
      const value = element.getAttribute(name);
      if (value !== null && leftover(value, typed) !== '') report(`${describeElement(element)} [${name}]`, value);
    }
  }
  return found;
}

/**
 * jsdom has no layout: every element is given a width of 800 px, and a resize observer reports
 * once on observing, so that a results panel draws every outcome's chart, table and words.
 */
export function fakeLayout(): void {
  Object.defineProperty(HTMLElement.prototype, 'clientWidth', { configurable: true, get: () => 800 });
  globalThis.ResizeObserver = class {
    constructor(private readonly report: ResizeObserverCallback) {}
    observe(target: Element): void {
      this.report([{ target } as unknown as ResizeObserverEntry], this as unknown as ResizeObserver);
    }
    unobserve(): void {}
    disconnect(): void {}
  };
}

/**
 * jsdom has no modal dialogs and no full screen: showing a dialog (modal or not) opens it,
 * closing it closes it, and nothing is ever full screen.
 */
export function fakeDialogs(): void {
  if (!('fullscreenElement' in document))
    Object.defineProperty(document, 'fullscreenElement', { configurable: true, value: null });
  const dialog = HTMLDialogElement.prototype;
  if (typeof dialog.showModal === 'function') return;
  dialog.showModal = function showModal(this: HTMLDialogElement): void {
    this.setAttribute('open', '');
  };
  dialog.show = dialog.showModal;
  dialog.close = function close(this: HTMLDialogElement): void {
    this.removeAttribute('open');
  };
}
