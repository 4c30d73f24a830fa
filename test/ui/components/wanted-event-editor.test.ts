// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import KeyNumbers from '../../../src/ui/components/KeyNumbers.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { keyNumberTables } from '../../../src/ui/results/key-numbers.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';
import { englishLocales } from '../../../src/locale/english.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';

const englishContext = () => localeContext({ current: englishLocales });

afterEach(() => cleanup());

const demo = DEMO_TOPICS.find((found) => found.fileName === '04-sore-throat.json');
if (demo === undefined) throw new Error('no sore-throat demonstration topic');

function setUp() {
  const editor = new TopicEditor(draftFromTopic(demo!.topic));
  render(EditorPanel, { context: englishContext(), props: { editor } });
  return editor;
}

const radio = (name: string, index: number) => {
  const found = screen.getAllByRole('radio', { name })[index];
  if (found === undefined) throw new Error(`no radio “${name}”`);
  return found as HTMLInputElement;
};

describe('the editor of a wanted event', () => {
  test('asks per outcome whether people want it or want to avoid it, and writes the answer into the topic', () => {
    const editor = setUp();
    // The headline (a pain-free throat) is wanted; the harm (an upset stomach) is to avoid.
    expect(radio('Something people want (pain gone by day 3, stopped smoking)', 0).checked).toBe(true);
    expect(radio('Something people want to avoid (a stroke, a broken bone)', 1).checked).toBe(true);
    fireEvent.click(radio('Something people want to avoid (a stroke, a broken bone)', 0));
    flushSync();
    expect(editor.draft.outcomes[0]?.wanted).toBe(false);
    expect(editor.check.topic.outcomes[0]).not.toHaveProperty('wanted');
    fireEvent.click(radio('Something people want (pain gone by day 3, stopped smoking)', 1));
    flushSync();
    expect(editor.check.topic.outcomes[1]?.wanted).toBe(true);
  });

  test('names a wanted event’s baseline a chance, and an unwanted one’s a risk', () => {
    setUp();
    expect(screen.getAllByLabelText('Baseline chance')).toHaveLength(1);
    expect(screen.getAllByLabelText('Baseline risk')).toHaveLength(1);
  });

  test('shows each period in the unit it was given in, and a new unit keeps the typed amount', () => {
    const editor = setUp();
    expect(screen.getByLabelText('Over what period')).toHaveProperty('value', '3');
    const unit = screen.getByLabelText('Over what period: unit') as HTMLSelectElement;
    expect(unit.value).toBe('days');
    expect(screen.getAllByLabelText('Follow-up: unit').map((found) => (found as HTMLSelectElement).value)).toEqual([
      'days',
      'days',
      'weeks',
      'weeks',
    ]);
    fireEvent.change(unit, { target: { value: 'weeks' } });
    flushSync();
    expect([editor.draft.periodYears, editor.draft.periodUnit]).toEqual(['3', 'weeks']);
    expect(editor.check.topic.periodYears).toBe(21 / 365.25);
  });

  test('lets an effect be given for the opposite event, in plain words', () => {
    const editor = setUp();
    const boxes = screen.getAllByRole('checkbox', {
      name: 'This number is for the opposite: not having “a pain-free throat”',
    }) as HTMLInputElement[];
    // One steroid tablet's ratio is for a pain-free throat; the lozenges' for still having pain.
    expect(boxes.map((box) => box.checked)).toEqual([false, true]);
    expect(screen.getByText(/applied to the chance of not having the outcome/)).toBeTruthy();
    fireEvent.click(boxes[0]!);
    flushSync();
    expect(editor.check.topic.outcomes[0]?.effects[0]?.effect).toMatchObject({ measure: 'rr', estimate: 1.6, opposite: true });
  });
});

describe('the key-number table of a wanted event', () => {
  test('heads the column Chance and shows NNTB for the option that makes it more likely', () => {
    const [table] = keyNumberTables(computeTopic(demo!.topic));
    if (table === undefined) throw new Error('no table');
    render(KeyNumbers, { context: englishContext(), props: { table } });
    expect(screen.getByRole('columnheader', { name: 'Chance' })).toBeTruthy();
    expect(screen.queryByRole('columnheader', { name: 'Risk' })).toBeNull();
    // 35% × 1.6 = 56%: 21 more in 100; NNTB ⌈1/0.21⌉ = 5 (Altman 1998).
    const tablet = document.querySelector('tr[data-option-id="tablet"]');
    expect(tablet?.textContent).toContain('21 more');
    expect(tablet?.textContent).toContain('NNTB 5');
  });
});
