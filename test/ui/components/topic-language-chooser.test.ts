// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { englishLocales } from '../../../src/locale/english.ts';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setLanguage } from '../../../src/ui/draft/draft-edits.ts';
import type { TopicDraft } from '../../../src/ui/draft/topic-draft.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';

// The language the patient reads is a choice of the topic (Chancewise's own screens); a tag
// reads by its primary subtag, so "es-MX" is Spanish (Phillips & Davis 2009, RFC 5646 §2.1).

afterEach(() => cleanup());

const stoneDemo = DEMO_TOPICS[0];
if (stoneDemo === undefined) throw new Error('no demonstration topic');
const stone = stoneDemo;

function setUp(draft: TopicDraft = draftFromTopic(stone.topic)) {
  const editor = new TopicEditor(draft);
  render(EditorPanel, { props: { editor }, context: localeContext({ current: englishLocales }) });
  const chooser = screen.getByLabelText('Language the patient reads') as HTMLSelectElement;
  return { editor, chooser };
}

const choiceNames = (chooser: HTMLSelectElement) => [...chooser.options].map((option) => option.textContent);

describe('the language the patient reads', () => {
  test('offers English and Español, each by its own name, with English chosen for an English topic', () => {
    const { chooser } = setUp();
    expect(choiceNames(chooser)).toEqual(['English', 'Español']);
    expect(chooser.value).toBe('en');
    expect(screen.getByText(/This screen stays in English/)).toBeTruthy();
  });

  test('sets the draft’s language through the editor, so undo brings the earlier one back', () => {
    const { editor, chooser } = setUp();
    fireEvent.change(chooser, { target: { value: 'es' } });
    flushSync();
    expect(editor.draft.language).toBe('es');
    expect(editor.hasUnsavedChanges).toBe(true);
    expect(editor.check.topic.language).toBe('es');
    editor.undo();
    flushSync();
    expect(editor.draft.language).toBe('en');
    expect(chooser.value).toBe('en');
    // An English topic names no language, as older files do.
    expect(editor.check.topic.language).toBeUndefined();
  });

  test('shows a regional Spanish tag as Español and keeps the tag as it was', () => {
    const { editor, chooser } = setUp(setLanguage(draftFromTopic(stone.topic), 'es-MX'));
    expect(chooser.value).toBe('es');
    expect(editor.check.topic.language).toBe('es-MX');
    expect(editor.problemsFor('language')).toEqual([]);
  });

  test('marks a language Chancewise cannot write beside the field, holds back saving, and offers the two it writes', () => {
    const { editor, chooser } = setUp(setLanguage(draftFromTopic(stone.topic), 'fr'));
    expect(choiceNames(chooser)).toEqual(['English', 'Español', '“fr” (not one Chancewise writes)']);
    expect(chooser.value).toBe('fr');
    expect(chooser.getAttribute('aria-invalid')).toBe('true');
    const described = (chooser.getAttribute('aria-describedby') ?? '')
      .split(' ')
      .map((id) => document.getElementById(id)?.textContent ?? '')
      .join(' ');
    expect(described).toContain('Chancewise cannot write patient wording in “fr”');
    expect(editor.check.savable).toBe(false);
    expect(screen.getByText(/1 thing to fix before the results can update/)).toBeTruthy();

    fireEvent.change(chooser, { target: { value: 'es' } });
    flushSync();
    expect(editor.problemsFor('language')).toEqual([]);
    expect(editor.check.savable).toBe(true);
    expect(choiceNames(chooser)).toEqual(['English', 'Español']);
  });
});
