// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { englishLocales } from '../../../src/locale/english.ts';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { translatedCopy } from '../../../src/ui/draft/translated-copy.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';

// "Still to fill in" lists each text of a copy still to translate (Chancewise's own screens);
// the disclosures beside them are the IPDAS instrument's (Elwyn et al. 2009, PLoS ONE 4(3):e4705).

afterEach(() => cleanup());

const stoneDemo = DEMO_TOPICS[0];
if (stoneDemo === undefined) throw new Error('no demonstration topic');
const stone = stoneDemo;

function setUp(draft = translatedCopy(draftFromTopic(stone.topic), 'es')) {
  const editor = new TopicEditor(draft);
  render(EditorPanel, { props: { editor }, context: localeContext({ current: englishLocales }) });
  return editor;
}

const region = () => screen.getByRole('region', { name: /Still to fill in for the handout/ });
const entries = () => [...region().querySelectorAll('a')].map((link) => link.textContent ?? '');

describe('texts still to translate under “Still to fill in”', () => {
  test('lists every typed text of a copy in Spanish first, each saying what it is and what to do', () => {
    setUp();
    // The example's 12 typed texts, then the 4 disclosures it does not give.
    expect(region().querySelector('h3')?.textContent).toBe('Still to fill in for the handout (16)');
    expect(entries().slice(0, 4)).toEqual([
      'Decision “Ways to cut the chance of a second kidney stone (illustrative)” is still in English: write it in Spanish.',
      'Who the numbers are for “adults who have passed one kidney stone and have no other kidney problems” is still in English: write it in Spanish.',
      'Option name “no change” is still in English: write it in Spanish.',
      'Option name “extra water each day” is still in English: write it in Spanish.',
    ]);
    expect(entries()).toContain('Outcome name “another kidney stone” is still in English: write it in Spanish.');
    expect(entries()).toContain('Question “Would I mind getting up at night?” is still in English: write it in Spanish.');
    expect(entries().at(-1)).toBe('The date to review it by');
    expect(region().textContent).toContain('a text still in English reaches the patient as it is');
  });

  test('links each entry to its field', () => {
    setUp();
    const link = [...region().querySelectorAll('a')].find((found) => found.textContent?.includes('“extra water each day”'));
    expect(link?.getAttribute('href')).toBe(`#${screen.getByLabelText('Option 2 name').id}`);
    const question = [...region().querySelectorAll('a')].find((found) => found.textContent?.startsWith('Question “Could I'));
    expect(question?.getAttribute('href')).toBe(`#${screen.getByLabelText('Question 2').id}`);
  });

  test('takes a text off the list once it is written in Spanish, and keeps the marks in the topic', () => {
    const editor = setUp();
    fireEvent.input(screen.getByLabelText('Option 2 name'), { target: { value: 'más agua cada día' } });
    flushSync();
    expect(region().querySelector('h3')?.textContent).toBe('Still to fill in for the handout (15)');
    expect(entries().some((entry) => entry.includes('extra water each day'))).toBe(false);
    expect(editor.untranslated).toHaveLength(11);
    // Saving keeps the marks, so a reopened file still knows what is untranslated.
    expect(editor.check.topic.translation?.sourceTexts['options.water.name']).toBe('extra water each day');
    editor.undo();
    flushSync();
    expect(region().querySelector('h3')?.textContent).toBe('Still to fill in for the handout (16)');
  });

  test('lists nothing to translate for a topic that is not a copy', () => {
    setUp(draftFromTopic(stone.topic));
    expect(region().querySelector('h3')?.textContent).toBe('Still to fill in for the handout (4)');
    expect(region().textContent).not.toContain('still in English');
  });
});
