// @vitest-environment jsdom
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { AppSession } from '../../../src/ui/state/app-session.svelte.ts';
import { DEMO_TOPICS } from './demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { fakePlatform, settle } from './fake-platform.ts';

// The shortcuts are those of every editor (Ctrl+Z, Ctrl+S, Ctrl+O; common practice, as in
// shortcuts.ts); the menu commands are the desktop shell's (src/ui/platform/platform.ts).

const screening = DEMO_TOPICS[1];
if (screening === undefined) throw new Error('the demonstration topics are missing');
const screeningText = readFileSync(join(import.meta.dirname, '../../../assets/demo', screening.fileName), 'utf8');

function setUp(kind: 'browser' | 'desktop' = 'desktop') {
  const platform = fakePlatform(kind, new MemoryStorage());
  const made: string[] = [];
  const app = new AppSession({
    platform,
    demos: DEMO_TOPICS,
    document,
    later: () => undefined,
    editor: { schedule: () => () => undefined },
    loadMaker: () =>
      Promise.resolve({
        makeHandout: (request) => (made.push(request.paper), Promise.resolve({ ok: true, pdf: new Uint8Array([37]) })),
      }),
    today: () => new Date(2026, 10, 3),
  });
  return { app, platform, made };
}

describe('AppSession', () => {
  it('carries out the desktop menu’s commands', async () => {
    const { app, platform, made } = setUp();
    platform.send({ name: 'new' });
    expect(app.topic.editor.draft.title).toBe('');
    platform.picked = { name: 'screening.cwtopic', text: screeningText };
    platform.send({ name: 'open-recent', recentPath: '/home/gp/screening.cwtopic' });
    await settle();
    expect(platform.recentPathsOpened).toEqual(['/home/gp/screening.cwtopic']);
    expect(app.topic.editor.fileName).toBe('screening.cwtopic');
    platform.send({ name: 'save-as' });
    await settle();
    expect(platform.savedTopics.map((saved) => [saved.name, saved.mode])).toEqual([['screening.cwtopic', 'save-as']]);
    platform.send({ name: 'export-handout' });
    await settle();
    expect(made).toEqual(['a4']);
    // The menu's Print Handout prints the handout itself, with the topic's choices.
    platform.send({ name: 'print-handout' });
    await settle();
    expect(made).toEqual(['a4', 'a4']);
    expect(platform.printedHandouts.map((printed) => printed.name)).toEqual(['screening-handout.pdf']);
  });

  it('opens a file the shell hands over', () => {
    const { app, platform } = setUp();
    platform.send({ kind: 'file', file: { name: 'screening.cwtopic', text: screeningText } });
    expect(app.topic.editor.draft.title).toBe(screening.topic.title);
  });

  it('takes the shortcuts, except while the save dialog or the teaching view is open', async () => {
    const { app, platform } = setUp('browser');
    app.topic.editor.change((draft) => setTopicText(draft, 'title', 'Changed'), 'title');
    expect(app.shortcut('undo')).toBe(true);
    expect(app.topic.editor.draft.title).not.toBe('Changed');
    expect(app.shortcut('redo')).toBe(true);
    expect(app.topic.editor.draft.title).toBe('Changed');
    expect(app.shortcut(null)).toBe(false);
    expect(app.shortcut('save')).toBe(true);
    expect(app.saving.dialogOpen).toBe(true);
    expect(app.shortcut('undo')).toBe(false);
    expect(app.topic.editor.draft.title).toBe('Changed');
    app.saving.cancel();
    app.teaching = true;
    expect(app.shortcut('open')).toBe(false);
    app.teaching = false;
    platform.picked = { name: 'screening.cwtopic', text: screeningText };
    expect(app.shortcut('open')).toBe(true);
    await settle();
    expect(app.topic.editor.fileName).toBe('screening.cwtopic');
  });

  it('a new topic is its own document: Undo does not bring the replaced one back, the offer does', () => {
    const { app } = setUp();
    app.topic.editor.change((draft) => setTopicText(draft, 'title', 'My work'), 'title');
    app.topic.newTopic();
    expect(app.shortcut('undo')).toBe(true);
    expect(app.topic.editor.draft.title).toBe('');
    expect(app.topic.offer?.draft.title).toBe('My work');
  });

  it('says on closing whether there is unsaved work to warn about', () => {
    const { app } = setUp();
    expect(app.closing()).toBe(false);
    app.topic.editor.change((draft) => setTopicText(draft, 'title', 'Unsaved'), 'title');
    expect(app.closing()).toBe(true);
  });
});
