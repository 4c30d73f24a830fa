// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/svelte';
import { flushSync } from 'svelte';
import { afterEach, describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { WordsDenominator } from '../../../src/core/types.ts';
import { topicWording } from '../../../src/core/wording/topic-wording.ts';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import EditorPanel from '../../../src/ui/components/EditorPanel.svelte';
import OutcomeResults from '../../../src/ui/components/OutcomeResults.svelte';
import ProblemSummary from '../../../src/ui/components/ProblemSummary.svelte';
import ResultsPanel from '../../../src/ui/components/ResultsPanel.svelte';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { optionKey } from '../../../src/ui/draft/field-keys.ts';
import { openTopicText } from '../../../src/ui/files/topic-files.ts';
import { keyNumberTables } from '../../../src/ui/results/key-numbers.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';
import { NINETY, RARE, effectTopic } from '../results/effect-topic.ts';
import { englishLocales } from '../../../src/locale/english.ts';
import { localeContext } from '../../../src/ui/state/locale-context.ts';

const englishContext = () => localeContext({ current: englishLocales });

// Invented, illustrative topics. People per 10,000 at a 0.1% baseline and HR 0.8 (0.7 to 0.9):
// 1 − (1 − p)^HR (Altman & Andersen 1999, BMJ 319:1492) gives 8.0008 (7.0011 to 9.0005) with the tablet.

afterEach(() => cleanup());

// jsdom has no layout: the results panel measures its width with a ResizeObserver, which here never reports.
globalThis.ResizeObserver ??= class {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
};

const noop = () => undefined;

function results(topic: Topic, per: WordsDenominator | null = null) {
  const result = computeTopic(topic, { per });
  const model = outcomeChart(result, 'bleed');
  const table = keyNumberTables(result).find((found) => found.outcomeId === 'bleed') ?? null;
  const wording = topicWording(result).outcomes.find((found) => found.outcomeId === 'bleed') ?? null;
  render(OutcomeResults, {
    context: englishContext(),
    props: { model, table, wording, width: 640, showRange: false, onexport: noop },
  });
}

const limits = (level: string) =>
  [`Lower limit of the ${level} interval`, `Upper limit of the ${level} interval`].map(
    (name) => screen.getByLabelText(name) as HTMLInputElement,
  );

const describedBy = (element: Element) =>
  (element.getAttribute('aria-describedby') ?? '')
    .split(' ')
    .map((id) => document.getElementById(id)?.textContent ?? '')
    .join(' ');

describe('the results of a rare outcome', () => {
  test('count per 10,000 in the table and the words: 10 without, 2 fewer with the tablet', () => {
    results(RARE);
    expect(screen.getByRole('columnheader', { name: /People with it\s*out of 10,000/ })).toBeTruthy();
    const row = screen.getByRole('row', { name: /the tablet/ });
    expect(row.textContent).toContain('8');
    expect(row.textContent).toContain('7 to 9');
    expect(row.textContent).toContain('2 fewer');
    expect(row.textContent).toContain('0.08%');
    expect(screen.getByText('With the tablet, about 2 of those 10,000 people avoid a serious bleed.')).toBeTruthy();
  });

  test('never say no difference or no change when 100 is forced and the exact difference is not 0', () => {
    results(RARE, 100);
    const text = document.body.textContent ?? '';
    expect(text).not.toMatch(/no difference|no change/);
    expect(screen.getByRole('row', { name: /the tablet/ }).textContent).toContain('under 1 fewer');
  });

  test('say no change when the exact difference is 0', () => {
    results(effectTopic({ baseline: 0.001, effect: { measure: 'hr', estimate: 1, lower: 0.7, upper: 1.3 } }));
    expect(screen.getByRole('row', { name: /the tablet/ }).textContent).toContain('no change');
  });

  test('say that the words count per more people than the pictures show', () => {
    render(ResultsPanel, {
      context: englishContext(),
      props: {
        editor: new TopicEditor(draftFromTopic(RARE)),
        onexport: noop,
        onhandout: noop,
        onprint: noop,
        handoutBusy: false,
      },
    });
    const basis = document.querySelector('.basis')?.textContent?.replace(/\s+/g, ' ').trim();
    expect(basis).toBe(
      'The pictures show 1000 people like this, over 1 year; the tables and words count per 10,000, because out of 1000 a difference would show as no one. Headline first.',
    );
  });
});

describe('a topic with 90% intervals', () => {
  test('labels the editor’s interval 90%, never 95%', () => {
    render(EditorPanel, { context: englishContext(), props: { editor: new TopicEditor(draftFromTopic(NINETY)) } });
    expect(screen.getByText('90% interval')).toBeTruthy();
    expect(limits('90%').map((box) => box.value)).toEqual(['0.85', '0.99']);
    expect(screen.queryByText(/95% interval/)).toBeNull();
  });

  test('names the level in the key-number table and the note beneath the results', () => {
    results(NINETY);
    expect(screen.getByRole('row', { name: /the tablet/ }).textContent).toContain('ranges: 90% interval');
    cleanup();
    render(ResultsPanel, {
      context: englishContext(),
      props: {
        editor: new TopicEditor(draftFromTopic(NINETY)),
        onexport: noop,
        onhandout: noop,
        onprint: noop,
        handoutBusy: false,
      },
    });
    expect(document.querySelector('.footnote')?.textContent).toContain('Ranges are 90% intervals for the effect');
  });
});

describe('an interval whose limits are the wrong way round', () => {
  test('typed: marks both boxes and describes each with the message, until fixed', () => {
    const editor = new TopicEditor(draftFromTopic(RARE));
    render(EditorPanel, { context: englishContext(), props: { editor } });
    const [lower, upper] = limits('95%');
    fireEvent.input(lower!, { target: { value: '0.9' } });
    fireEvent.input(upper!, { target: { value: '0.7' } });
    flushSync();
    for (const box of [lower!, upper!]) {
      expect(box.getAttribute('aria-invalid')).toBe('true');
      expect(describedBy(box)).toContain(
        'The limits are the wrong way round: the lower limit, 0.9, is above the upper limit, 0.7.',
      );
    }
    expect(editor.check.result).toBeNull();
    fireEvent.input(lower!, { target: { value: '0.7' } });
    fireEvent.input(upper!, { target: { value: '0.9' } });
    flushSync();
    expect([lower!, upper!].map((box) => box.getAttribute('aria-invalid'))).toEqual(['false', 'false']);
    expect(editor.check.result).not.toBeNull();
  });

  test('in a saved file: opens, marks both boxes and withholds the results', () => {
    const reversed = effectTopic({ baseline: 0.001, effect: { measure: 'hr', estimate: 0.8, lower: 0.9, upper: 0.7 } });
    const opened = openTopicText('reversed.cwtopic', writeTopicFile(reversed, { includePatient: false }));
    if (!opened.ok) throw new Error(opened.message);
    const editor = new TopicEditor(draftFromTopic(RARE));
    editor.load(opened.draft, { fileName: opened.fileName, saved: true });
    render(EditorPanel, { context: englishContext(), props: { editor } });
    render(ResultsPanel, {
      context: englishContext(),
      props: { editor, onexport: noop, onhandout: noop, onprint: noop, handoutBusy: false },
    });
    expect(limits('95%').map((box) => [box.value, box.getAttribute('aria-invalid')])).toEqual([
      ['0.9', 'true'],
      ['0.7', 'true'],
    ]);
    expect(editor.shown).toBeNull();
    expect(screen.getByRole('status').textContent).toContain('No results yet');
  });

  test('an interval that leaves out the estimate marks both boxes too', () => {
    const editor = new TopicEditor(draftFromTopic(RARE));
    render(EditorPanel, { context: englishContext(), props: { editor } });
    fireEvent.input(screen.getByLabelText('Estimate'), { target: { value: '0.95' } });
    flushSync();
    for (const box of limits('95%')) {
      expect(box.getAttribute('aria-invalid')).toBe('true');
      expect(describedBy(box)).toContain('does not contain the estimate 0.95');
    }
  });
});

describe('the list of problems', () => {
  test('puts a space between where a problem is and what it is', () => {
    const draft = draftFromTopic(RARE);
    const found = {
      key: optionKey('tablet'),
      problem: { code: 'topic-text-missing' as const, field: 'options.1.name', values: {} },
      message: 'The option name is empty.',
      needed: false,
    };
    render(ProblemSummary, { context: englishContext(), props: { problems: [found], draft } });
    expect(screen.getByRole('link').textContent).toBe('Option 2: The option name is empty.');
  });
});
