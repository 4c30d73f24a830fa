// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { englishLocales } from '../../../src/locale/english.ts';
import DocumentBanners from '../../../src/ui/components/DocumentBanners.svelte';
import { setLanguage } from '../../../src/ui/draft/draft-edits.ts';
import { AppMessages } from '../../../src/ui/state/app-messages.svelte.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';
import { TopicDocument } from '../../../src/ui/state/topic-document.svelte.ts';
import { fakePlatform } from '../state/fake-platform.ts';

// Wording a program writes in another language is checked by a qualified translator or a
// clinician who speaks it before patients read it (common practice of translated patient
// information; local guidance varies, so the banner points to it).

afterEach(() => cleanup());

function setUp() {
  const topic = new TopicDocument({
    platform: fakePlatform('browser', new MemoryStorage()),
    demos: DEMO_TOPICS,
    messages: new AppMessages(() => undefined),
    editor: { schedule: () => () => undefined },
  });
  render(DocumentBanners, { props: { topic }, context: localeContext({ current: englishLocales }) });
  return topic;
}

const caution = () => screen.queryByRole('note', { name: 'Patient wording in Spanish' });

describe('the caution over patient wording in Spanish', () => {
  test('is absent while the topic is in English', () => {
    setUp();
    expect(caution()).toBeNull();
    // The example's own banner is there, so the banners are drawn.
    expect(screen.getByRole('note', { name: 'Illustrative example' })).toBeTruthy();
  });

  test('appears on a copy in Spanish, asking for a qualified check and local guidance', () => {
    const topic = setUp();
    topic.copyInLanguage('es', 'A copy in Spanish.');
    flushSync();
    const note = caution();
    expect(note?.querySelector('.language-label')?.textContent).toBe('Check the Spanish');
    expect(note?.textContent).toContain('is written by Chancewise');
    expect(note?.textContent).toContain('a qualified medical translator or a Spanish-speaking clinician');
    expect(note?.textContent).toContain('follow your local guidance');
  });

  test('follows the language chosen: a regional Spanish tag shows it, English or a tag Chancewise cannot write does not', () => {
    const topic = setUp();
    topic.editor.change((draft) => setLanguage(draft, 'es-419'));
    flushSync();
    expect(caution()).not.toBeNull();
    topic.editor.change((draft) => setLanguage(draft, 'fr'));
    flushSync();
    expect(caution()).toBeNull();
    topic.editor.undo();
    flushSync();
    expect(caution()).not.toBeNull();
    topic.editor.change((draft) => setLanguage(draft, 'en'));
    flushSync();
    expect(caution()).toBeNull();
  });
});
