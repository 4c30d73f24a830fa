// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';
import { englishLocales } from '../../../src/locale/english.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';

const englishContext = () => localeContext({ current: englishLocales });

afterEach(() => cleanup());

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');

function setUp() {
  const editor = new TopicEditor(draftFromTopic(first!.topic));
  render(EditorPanel, { context: englishContext(), props: { editor } });
  return editor;
}

describe('EditorPanel', () => {
  test('labels every text field, so each can be reached by its name', () => {
    setUp();
    expect(screen.getByLabelText('Decision')).toHaveProperty('value', first.topic.title);
    expect(screen.getAllByLabelText('Baseline risk')).toHaveLength(3);
    expect(screen.getAllByLabelText('Estimate')).toHaveLength(6);
  });

  test('shows an impossible value’s problem beside its field and links it with aria-describedby', () => {
    const editor = setUp();
    const [baseline] = screen.getAllByLabelText('Baseline risk');
    if (baseline === undefined) throw new Error('no baseline field');
    fireEvent.input(baseline, { target: { value: '150%' } });
    flushSync();
    expect(baseline.getAttribute('aria-invalid')).toBe('true');
    const described = (baseline.getAttribute('aria-describedby') ?? '')
      .split(' ')
      .map((id) => document.getElementById(id)?.textContent ?? '');
    expect(described.join(' ')).toContain('A risk of "150%" is outside 0% to 100%');
    expect(screen.getByText(/1 thing to fix before the results can update/)).toBeTruthy();
    expect(editor.draft.outcomes[0]?.baselineRisk).toBe('150%');
  });

  test('adds an option with a blank effect for every outcome', () => {
    const editor = setUp();
    fireEvent.click(screen.getByRole('button', { name: /Add an option/ }));
    flushSync();
    expect(editor.draft.options).toHaveLength(4);
    // Three outcomes, each with an effect block per option other than the comparison.
    expect(document.querySelectorAll('fieldset.effect')).toHaveLength(9);
    expect((screen.getByRole('button', { name: /Add an option/ }) as HTMLButtonElement).disabled).toBe(true);
  });
});
