// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import AppBar from '../../src/ui/components/AppBar.svelte';
import DocumentBanners from '../../src/ui/components/DocumentBanners.svelte';
import EditorPanel from '../../src/ui/components/EditorPanel.svelte';
import MessageToast from '../../src/ui/components/MessageToast.svelte';
import ResultsStatusBar from '../../src/ui/components/ResultsStatusBar.svelte';
import SaveDialog from '../../src/ui/components/SaveDialog.svelte';
import StartPanel from '../../src/ui/components/StartPanel.svelte';
import { setEffectField, setTopicText } from '../../src/ui/draft/draft-edits.ts';
import { AppSession } from '../../src/ui/state/app-session.svelte.ts';
import { DEMO_TOPICS } from './state/demo-topics-read.ts';
import { MemoryStorage } from '../../src/ui/state/key-value-storage.ts';
import { localeContext } from '../../src/ui/state/locale-context.ts';
import TeachingView from '../../src/ui/teaching/TeachingView.svelte';
import { EXAMPLE_SETS } from '../../src/ui/teaching/teaching-examples.ts';
import {
  fakeDialogs,
  fakeLayout,
  leaks,
  notingPseudoLocales,
  pseudoPatientSlideWords,
  pseudoTeachingClinician,
  typedStrings,
} from '../support/pseudo-dom.ts';
import { fakePlatform, settle } from './state/fake-platform.ts';

// The rest of the clinician's screens, as pseudo-locale-dom.test.ts does for the editor and the
// results: with every catalogue word bracketed ⟦…⟧, nothing is left on the page once the
// brackets, the texts the clinician typed, numbers and symbols are taken out. The messages that
// arrive as state (the message at the foot of the window) are made by the app with the
// bracketed notice words, so they are checked too.

afterEach(() => cleanup());
fakeLayout();
fakeDialogs();

// One set of noting words for the whole file: the last test checks what every screen handed them.
const { locales: pseudoLocales, handedLeaks } = notingPseudoLocales();
const context = () => localeContext({ current: pseudoLocales });
const noop = () => undefined;
const notices = pseudoLocales.interface.ui.notices;

function session(kind: 'browser' | 'desktop' = 'desktop') {
  const platform = fakePlatform(kind, new MemoryStorage());
  const app = new AppSession({
    platform,
    demos: DEMO_TOPICS,
    document,
    later: noop,
    editor: { schedule: () => noop },
    words: notices,
    core: pseudoLocales.interface.core,
    labels: pseudoLocales.interface.ui.appBar,
  });
  return { app, platform };
}

/** What may stand unwrapped: every text of the open topic, and of the examples offered. */
const typedOf = (app: AppSession, ...more: readonly unknown[]) =>
  typedStrings(app.topic.editor.draft, app.topic.editor.fileName, ...more);

describe('the pseudo locale on the bar above the editor', () => {
  test('leaves no word outside the catalogues for the example shown at start, a changed topic and a Spanish copy', () => {
    const { app } = session();
    render(AppBar, { context: context(), props: { app } });
    expect(screen.getByRole('button', { name: /copy/i })).toBeTruthy();
    expect(leaks(document.body, typedOf(app))).toEqual([]);

    app.topic.newTopic();
    app.topic.editor.change((draft) => setTopicText(draft, 'title', 'Knee pain'));
    flushSync();
    expect(document.body.querySelector('.unsaved')).not.toBeNull();
    expect(leaks(document.body, typedOf(app))).toEqual([]);

    app.topic.openDemo(DEMO_TOPICS[0]!);
    app.topic.copyInLanguage('es', notices.started);
    flushSync();
    expect(document.getElementById('copy-in-spanish-button')).toBeNull();
    expect(leaks(document.body, typedOf(app))).toEqual([]);
  });
});

describe('the pseudo locale in the save dialog', () => {
  for (const patientGiven of [true, false]) {
    for (const askName of [true, false]) {
      test(`leaves no word outside the catalogues with the patient ${patientGiven ? 'given' : 'not given'}, the name ${askName ? 'asked' : 'not asked'}`, () => {
        render(SaveDialog, {
          context: context(),
          props: { fileName: 'knee-pain.cwtopic', patientGiven, askName, onsave: noop, oncancel: noop },
        });
        expect(document.getElementById('save-file-name') !== null).toBe(askName);
        expect(leaks(document.body, [])).toEqual([]);
      });
    }
  }
});

describe('the pseudo locale in the message at the foot of the window', () => {
  test('leaves no word outside the catalogues in an information and an error', async () => {
    const { app, platform } = session('browser');
    render(MessageToast, { context: context(), props: { app, headerBottom: 60 } });
    app.topic.newTopic();
    flushSync();
    expect(screen.getByRole('status').textContent).toContain(notices.started);
    expect(leaks(document.body, typedOf(app))).toEqual([]);

    platform.picked = { name: 'broken.cwtopic', text: '{ not a topic' };
    await app.topic.openFile();
    await settle();
    flushSync();
    // The core's problem, in the interface's words, inside the file's sentence, inside the message.
    expect(screen.getByRole('alert').textContent?.match(/⟦/g)?.length).toBeGreaterThanOrEqual(3);
    expect(leaks(document.body, typedOf(app))).toEqual([]);
  });

  test('leaves no word outside the catalogues when a topic cannot be saved while a number cannot be read', () => {
    const { app } = session('browser');
    render(MessageToast, { context: context(), props: { app, headerBottom: 60 } });
    app.topic.editor.change((draft) => setEffectField(draft, 'night', 'water', 'estimate', '1..2'));
    app.saving.request();
    flushSync();
    expect(app.saving.dialogOpen).toBe(false);
    expect(screen.getByRole('alert').textContent).toContain(notices.numbersUnreadable(1));
    expect(leaks(document.body, typedOf(app))).toEqual([]);
  });
});

describe('the pseudo locale in the banners above the editor', () => {
  test('leaves no word outside the catalogues in the example’s banner, an offer of unsaved work and the caution over Spanish', () => {
    const { app } = session();
    render(DocumentBanners, { context: context(), props: { topic: app.topic } });
    expect(screen.getByRole('note')).toBeTruthy();
    expect(leaks(document.body, typedOf(app))).toEqual([]);

    const offered = { ...app.topic.editor.draft, title: 'Knee pain, left unsaved' };
    app.topic.offer = { draft: offered, fileName: null, savedAt: '2026-12-02T19:07:00.000Z', unsaved: true };
    app.topic.copyInLanguage('es', notices.started);
    flushSync();
    // The date is written by the interface's words, not by the computer's own settings.
    expect(screen.getByRole('region').querySelector('strong')?.textContent).toBe(
      pseudoLocales.interface.ui.banners.restoreFrom(new Date('2026-12-02T19:07:00.000Z')),
    );
    expect(screen.getAllByRole('note')).toHaveLength(2);
    expect(leaks(document.body, typedOf(app, offered))).toEqual([]);
  });

  test('leaves no word outside the catalogues in the list of texts still to translate of a Spanish copy', () => {
    const { app } = session();
    app.topic.copyInLanguage('es', notices.started);
    render(EditorPanel, { context: context(), props: { editor: app.topic.editor } });
    expect(app.topic.editor.untranslated.length).toBeGreaterThan(0);
    expect(document.getElementById('handout-gaps-heading')).not.toBeNull();
    expect(leaks(document.body, typedOf(app))).toEqual([]);
  });
});

describe('the pseudo locale in the results’ status bar', () => {
  test('leaves no word outside the catalogues while waiting, out of date and up to date', () => {
    const { app } = session();
    const { editor } = app.topic;
    const shown = render(ResultsStatusBar, { context: context(), props: { editor, hasResult: false } });
    expect(leaks(document.body, [])).toEqual([]);
    shown.rerender({ editor, hasResult: true });
    expect(editor.stale).toBe(false);
    expect(leaks(document.body, [])).toEqual([]);
    editor.change((draft) => setTopicText(draft, 'title', ''));
    flushSync();
    expect(editor.stale).toBe(true);
    expect(leaks(document.body, [])).toEqual([]);
  });
});

describe('the pseudo locale on the Topics panel', () => {
  for (const [recent, reopensByName, language] of [
    [[], true, 'en'],
    [['knee-pain.cwtopic', 'statins.cwtopic'], false, 'es'],
  ] as const) {
    test(`leaves no word outside the catalogues with ${recent.length} recent files, a new topic offered in ${language}`, () => {
      render(StartPanel, {
        context: context(),
        props: { demos: DEMO_TOPICS, recent, reopensByName, language, onnew: noop, onopen: noop, ondemo: noop, onclose: noop },
      });
      expect(document.querySelectorAll('#new-topic-language option')).toHaveLength(2);
      expect(
        leaks(
          document.body,
          typedStrings(
            DEMO_TOPICS.map((demo) => demo.topic),
            recent,
          ),
        ),
      ).toEqual([]);
    });
  }
});

describe('the pseudo locale in the teaching view', () => {
  test('leaves no word outside the catalogues on every slide of a topic, with the menu open, and of the example set', async () => {
    const demo = DEMO_TOPICS[0]!;
    const { platform } = session();
    render(TeachingView, {
      context: context(),
      props: {
        topic: demo.topic,
        per: null,
        platform,
        onclose: noop,
        messages: pseudoTeachingClinician,
        patientWords: pseudoPatientSlideWords,
      },
    });
    const typed = typedStrings(
      demo.topic,
      EXAMPLE_SETS.map((set) => JSON.parse(set.text) as unknown),
    );
    const next = () => screen.getByRole('button', { name: new RegExp(pseudoTeachingClinician.view.next.replace(/[⟦⟧]/g, '.')) });
    const slides = async () => {
      let shown = 1;
      expect(leaks(document.body, typed)).toEqual([]);
      while (!(next() as HTMLButtonElement).disabled) {
        await fireEvent.click(next());
        shown += 1;
        expect(leaks(document.body, typed)).toEqual([]);
      }
      return shown;
    };
    expect(await slides()).toBeGreaterThan(3);

    await fireEvent.click(
      screen.getByRole('button', { name: new RegExp(pseudoTeachingClinician.view.menu.replace(/[⟦⟧]/g, '.')) }),
    );
    expect(leaks(document.body, typed)).toEqual([]);
    await fireEvent.click(
      screen.getByRole('button', { name: new RegExp(pseudoTeachingClinician.view.example.replace(/[⟦⟧]/g, '.')) }),
    );
    await settle();
    flushSync();
    expect(await slides()).toBeGreaterThan(3);
  });
});

describe('the words handed into wrapped sentences on these screens', () => {
  test('are typed texts, file names, numbers or codes, never English of the screens’ own', () => {
    const typed = typedStrings(
      DEMO_TOPICS.map((demo) => [demo.topic, demo.fileName]),
      EXAMPLE_SETS.map((set) => JSON.parse(set.text) as unknown),
      ['Knee pain', 'Knee pain, left unsaved'],
    );
    // The broken file's reason carries the JavaScript engine's own words about its JSON (a detail
    // for whoever fixes the file, as the engine gives it); nothing else may be handed over.
    const engine = (text: string) => /JSON/.test(text);
    expect(handedLeaks(typed).filter((text) => !engine(text))).toEqual([]);
    expect(handedLeaks(typed).filter(engine)).toHaveLength(1);
  });
});
