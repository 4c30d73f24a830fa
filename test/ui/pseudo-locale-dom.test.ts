// @vitest-environment jsdom
import { cleanup, render } from '@testing-library/svelte';
import { afterEach, describe, expect, test } from 'vitest';
import EditorPanel from '../../src/ui/components/EditorPanel.svelte';
import ResultsPanel from '../../src/ui/components/ResultsPanel.svelte';
import { draftFromTopic } from '../../src/ui/draft/draft-from-topic.ts';
import { DEMO_TOPICS } from './state/demo-topics-read.ts';
import { localeContext } from '../../src/ui/state/locale-context.ts';
import { TopicEditor } from '../../src/ui/state/topic-editor.svelte.ts';
import { fakeLayout, leaks, notingPseudoLocales, typedStrings } from '../support/pseudo-dom.ts';

// Every word of the clinician's screens comes from the locale bundle: with every catalogue
// word bracketed as ⟦…⟧ (a pseudo locale, common practice in software localisation), nothing
// is left once the brackets, the texts the clinician typed, numbers and symbols are taken out.
// App.svelte is not rendered whole (its session needs a platform and the start-up turns), so
// the two columns it shows are rendered with a computed demonstration topic; the bar, the
// panels, the dialogs and the teaching view are in pseudo-locale-screens.test.ts.

afterEach(() => cleanup());
fakeLayout();

const noop = () => undefined;

describe('the pseudo locale on the clinician’s screens', () => {
  for (const demo of DEMO_TOPICS.filter((candidate) => (candidate.topic.language ?? 'en') === 'en')) {
    test(`leaves no word outside the catalogues in the editor and the results of ${demo.fileName}`, () => {
      const { locales, handedLeaks } = notingPseudoLocales();
      const context = localeContext({ current: locales });
      const editor = new TopicEditor(draftFromTopic(demo.topic));
      render(EditorPanel, { context, props: { editor } });
      render(ResultsPanel, {
        context,
        props: { editor, onexport: noop, onhandout: noop, onprint: noop, handoutBusy: false, handoutWarnings: [] },
      });
      const typed = typedStrings(demo.topic);
      expect(leaks(document.body, typed)).toEqual([]);
      // Nor handed into a wrapped sentence, where the wrap would hide it.
      expect(handedLeaks(typed)).toEqual([]);
    });
  }
});
