// @vitest-environment jsdom
import { describe, expect, test } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { blankDraft, setOutcomeText, setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { outcomeKey } from '../../../src/ui/draft/field-keys.ts';
import { Autosave } from '../../../src/ui/state/autosave.ts';
import { DEMO_TOPICS } from './demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { TopicEditor } from '../../../src/ui/state/topic-editor.svelte.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
const demo = draftFromTopic(first.topic);
const baselineKey = outcomeKey('stone', 'baseline.risk');

/** An editor with a clock and a scheduler the test controls. */
function setUp() {
  let time = 0;
  const tasks: (() => void)[] = [];
  const storage = new MemoryStorage();
  const autosave = new Autosave(storage);
  const editor = new TopicEditor(demo, {
    autosave,
    now: () => time,
    today: () => new Date(Date.UTC(2026, 10, 3, 9, 30)),
    schedule: (task) => {
      tasks.push(task);
      return () => tasks.splice(tasks.indexOf(task), 1);
    },
  });
  const type = (key: string, texts: readonly string[], gap = 100) => {
    for (const text of texts) {
      time += gap;
      editor.change((draft) => setOutcomeText(draft, 'stone', 'baselineRisk', text), key);
    }
  };
  return { editor, autosave, storage, tasks, type, advance: (by: number) => (time += by) };
}

describe('TopicEditor', () => {
  test('starts with the results of its draft, up to date and without unsaved changes', () => {
    const { editor } = setUp();
    expect(editor.shown?.title).toBe(first.topic.title);
    expect(editor.stale).toBe(false);
    expect(editor.hasUnsavedChanges).toBe(false);
    expect(editor.canUndo).toBe(false);
  });

  test('updates the numbers as the baseline changes', () => {
    const { editor, type } = setUp();
    type(baselineKey, ['2', '20', '20%']);
    const comparison = editor.shown?.outcomes[0]?.options.find((option) => option.isComparison);
    expect(comparison?.perPeople.comparison).toBe(20);
    expect(editor.stale).toBe(false);
  });

  test('keeps the typed text while it is invalid, and shows the last valid results as out of date', () => {
    const { editor, type } = setUp();
    type(baselineKey, ['2', '20', '20%']);
    type(baselineKey, ['20%%'], 5000);
    expect(editor.draft.outcomes[0]?.baselineRisk).toBe('20%%');
    expect(editor.problemsFor(baselineKey).map((found) => found.problem.code)).toEqual(['risk-unparsable']);
    expect(editor.stale).toBe(true);
    expect(editor.shown?.outcomes[0]?.options[0]?.perPeople.comparison).toBe(20);
  });

  test('undo takes back a whole word typed into one field, and redo brings it back', () => {
    const { editor, type } = setUp();
    type(baselineKey, ['2', '20', '20%']);
    expect(editor.undo()).toBe(true);
    expect(editor.draft.outcomes[0]?.baselineRisk).toBe('4 in 10');
    expect(editor.canRedo).toBe(true);
    expect(editor.redo()).toBe(true);
    expect(editor.draft.outcomes[0]?.baselineRisk).toBe('20%');
  });

  test('loading another topic starts a new history: undo and redo stay within it', () => {
    const { editor, type } = setUp();
    type(baselineKey, ['20%']);
    editor.load(blankDraft(), { fileName: 'new.cwtopic', saved: true });
    expect([editor.canUndo, editor.canRedo]).toEqual([false, false]);
    expect(editor.undo()).toBe(false);
    expect(editor.draft.title).toBe('');
    expect(editor.fileName).toBe('new.cwtopic');
  });

  test('loaded work that was not saved counts as unsaved, even when it matches the last saved draft', () => {
    const { editor } = setUp();
    editor.load(editor.draft, { fileName: 'mine.cwtopic', saved: false });
    expect(editor.hasUnsavedChanges).toBe(true);
  });

  test('knows about unsaved changes until the draft is saved or changed back', () => {
    const { editor } = setUp();
    editor.change((draft) => setTopicText(draft, 'title', 'Another title'), 'title');
    expect(editor.hasUnsavedChanges).toBe(true);
    editor.undo();
    expect(editor.hasUnsavedChanges).toBe(false);
    editor.redo();
    editor.markSaved('mine.chancewise.json');
    expect(editor.hasUnsavedChanges).toBe(false);
    expect(editor.fileName).toBe('mine.chancewise.json');
  });

  test('autosaves once after a burst of changes, without the patient’s details', () => {
    const { editor, autosave, tasks, type } = setUp();
    editor.change((draft) => setTopicText(draft, 'patientName', 'Ann Example'), 'patientName');
    type(baselineKey, ['1', '12', '12%']);
    expect(tasks).toHaveLength(1);
    tasks[0]?.();
    const saved = autosave.load();
    expect(saved?.draft.outcomes[0]?.baselineRisk).toBe('12%');
    expect(saved?.draft.patientName).toBe('');
    expect(saved?.unsaved).toBe(true);
    expect(saved?.savedAt).toBe('2026-11-03T09:30:00.000Z');
  });

  test('the chosen number of people is kept with the topic, as an unsaved change that undo takes back', () => {
    const { editor } = setUp();
    editor.setPer(1000);
    expect(editor.draft.handout.per).toBe(1000);
    expect(editor.per).toBe(1000);
    expect(editor.hasUnsavedChanges).toBe(true);
    editor.undo();
    expect(editor.per).toBeNull();
    expect(editor.shown?.denominator).toBe(100);
  });

  test('switches between 100 and 1000 people, also for out-of-date results', () => {
    const { editor, type } = setUp();
    editor.setPer(1000);
    expect(editor.shown?.denominator).toBe(1000);
    type(baselineKey, ['x']);
    editor.setPer(100);
    expect(editor.stale).toBe(true);
    expect(editor.shown?.denominator).toBe(100);
  });
});

describe('TopicEditor after loading another topic', () => {
  test('never shows the results of the topic left behind', () => {
    const { editor } = setUp();
    editor.load(blankDraft(), { fileName: null, saved: true });
    expect(editor.shown).toBeNull();
    editor.change((draft) => setTopicText(draft, 'title', 'A new decision'), 'title');
    expect(editor.draft.title).toBe('A new decision');
    expect(editor.shown).toBeNull();
  });
});

describe('TopicEditor problems still to fill in', () => {
  test('marks what a new topic has not been given yet as needed, not as a mistake', () => {
    const { editor } = setUp();
    editor.load(blankDraft(), { fileName: null, saved: true });
    const title = editor.problemsFor('title');
    expect(title.map((found) => [found.problem.code, found.needed])).toEqual([['topic-text-missing', true]]);
    expect(editor.problems.every((found) => found.needed)).toBe(true);
  });

  test('a field emptied by the person is a mistake to fix', () => {
    const { editor } = setUp();
    editor.change((draft) => setTopicText(draft, 'title', ''), 'title');
    expect(editor.problemsFor('title').map((found) => found.needed)).toEqual([false]);
  });

  test('a wrong value is a mistake even in a field never touched', () => {
    const { editor } = setUp();
    editor.load({ ...demo, periodYears: 'ten' }, { fileName: 'x.chancewise.json', saved: true });
    expect(editor.problemsFor('periodYears').map((found) => [found.problem.code, found.needed])).toEqual([
      ['number-unparsable', false],
    ]);
  });
});
