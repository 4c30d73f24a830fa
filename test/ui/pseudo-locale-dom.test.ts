// @vitest-environment jsdom
import { cleanup, render } from '@testing-library/svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { englishLocales } from '../../src/locale/english.ts';
import type { Locales } from '../../src/locale/locale-bundle.ts';
import EditorPanel from '../../src/ui/components/EditorPanel.svelte';
import ResultsPanel from '../../src/ui/components/ResultsPanel.svelte';
import { draftFromTopic } from '../../src/ui/draft/draft-from-topic.ts';
import { DEMO_TOPICS } from './state/demo-topics-read.ts';
import { localeContext } from '../../src/ui/state/locale-context.ts';
import { TopicEditor } from '../../src/ui/state/topic-editor.svelte.ts';
import { pseudoLocale, stripPseudo } from '../support/pseudo-locale.ts';

// Every word of the clinician's screens comes from the locale bundle: with every catalogue
// word bracketed as ⟦…⟧ (a pseudo locale, common practice in software localisation), nothing
// is left once the brackets, the texts the clinician typed, numbers and symbols are taken out.
// App.svelte is not rendered whole (its session needs a platform and the start-up turns), so
// the two columns it shows are rendered with a computed demonstration topic.

afterEach(() => cleanup());

// jsdom has no layout: the results panel is given a width of 800 px, reported once on observing,
// so that it draws every outcome's chart, table and words.
Object.defineProperty(HTMLElement.prototype, 'clientWidth', { configurable: true, get: () => 800 });
globalThis.ResizeObserver = class {
  constructor(private readonly report: ResizeObserverCallback) {}
  observe(target: Element): void {
    this.report([{ target } as unknown as ResizeObserverEntry], this as unknown as ResizeObserver);
  }
  unobserve(): void {}
  disconnect(): void {}
};

const pseudoLocales: Locales = {
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

/** Every string a topic holds (title, population, option and outcome names, questions, sources…). */
function typedStrings(value: unknown): string[] {
  if (typeof value === 'string') return value.trim() === '' ? [] : [value.trim()];
  if (Array.isArray(value)) return value.flatMap(typedStrings);
  if (value !== null && typeof value === 'object') return Object.values(value).flatMap(typedStrings);
  return [];
}

const escape = (text: string): string => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** What is left of a text once the catalogue's words and what may stand unwrapped are taken out. */
function leftover(text: string, typed: readonly string[]): string {
  let rest = stripPseudo(text);
  // Longest first, so a name inside a longer typed text does not break it up.
  for (const found of typed) rest = rest.replace(new RegExp(escape(found), 'gi'), ' ');
  return rest
    .replace(/\bNNT[BH]?\b/g, ' ')
    .replace(/[\w-]+\.(json|cwtopic|svg|png|pdf)\b/g, ' ')
    .replace(/\d/g, ' ')
    .replace(/[\s.,:;!?%()[\]'"“”‘’«»–—−\-+=×÷∞·•…/↑↓▲▼<>]/g, '')
    .trim();
}

interface Found {
  readonly text: string;
  readonly where: string;
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

/** Every text node and named attribute with something left over, and where it was found. */
function leaks(root: Element, typed: readonly string[]): Found[] {
  const found: Found[] = [];
  const walker = root.ownerDocument.createTreeWalker(root, 4 /* NodeFilter.SHOW_TEXT */);
  for (let node = walker.nextNode(); node !== null; node = walker.nextNode()) {
    const parent = node.parentElement;
    if (parent === null || parent.closest('style, script, text') !== null) continue;
    const text = node.textContent ?? '';
    if (leftover(text, typed) !== '') found.push({ text: text.trim(), where: describeElement(parent) });
  }
  // A chart breaks a sentence into lines (tspan): each svg text is read whole, its lines joined.
  for (const element of root.querySelectorAll('text')) {
    const text = [...element.childNodes].map((line) => line.textContent ?? '').join(' ');
    if (leftover(text, typed) !== '') found.push({ text: text.trim(), where: describeElement(element) });
  }
  for (const element of root.querySelectorAll('*')) {
    for (const name of ['aria-label', 'title', 'placeholder', 'alt']) {
      const value = element.getAttribute(name);
      if (value !== null && leftover(value, typed) !== '')
        found.push({ text: value, where: `${describeElement(element)} [${name}]` });
    }
  }
  return found;
}

const noop = () => undefined;

describe('the pseudo locale on the clinician’s screens', () => {
  for (const demo of DEMO_TOPICS.filter((candidate) => (candidate.topic.language ?? 'en') === 'en')) {
    test(`leaves no word outside the catalogues in the editor and the results of ${demo.fileName}`, () => {
      const context = localeContext({ current: pseudoLocales });
      const editor = new TopicEditor(draftFromTopic(demo.topic));
      render(EditorPanel, { context, props: { editor } });
      render(ResultsPanel, {
        context,
        props: { editor, onexport: noop, onhandout: noop, onprint: noop, handoutBusy: false, handoutWarnings: [] },
      });
      const typed = [...new Set(typedStrings(demo.topic))].sort((first, second) => second.length - first.length);
      const offending = leaks(document.body, typed);
      expect(offending.map((found) => `${found.where}: ${JSON.stringify(found.text)}`)).toEqual([]);
    });
  }
});
