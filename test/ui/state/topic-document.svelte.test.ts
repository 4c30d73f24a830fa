// @vitest-environment jsdom
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { AppMessages } from '../../../src/ui/state/app-messages.svelte.ts';
import { Autosave } from '../../../src/ui/state/autosave.ts';
import { DEMO_TOPICS } from './demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { RecentFiles } from '../../../src/ui/state/recent-files.ts';
import { EARLIER_AUTOSAVE_KEY, TopicDocument } from '../../../src/ui/state/topic-document.svelte.ts';
import { english } from '../../../src/core/messages/en/index.ts';
import { noticeMessagesEn } from '../../../src/ui/messages/notices-en.ts';
import { stripPseudo, pseudoLocale } from '../../support/pseudo-locale.ts';
import { fakePlatform } from './fake-platform.ts';

// The messages are the app's own words. Each opened document has its own undo history, and
// unsaved work it replaces is kept and offered back (common practice of document editors:
// undo acts within one document, and replacing work never throws it away).

const [stone, screening] = DEMO_TOPICS;
if (stone === undefined || screening === undefined) throw new Error('the demonstration topics are missing');
const fixture = (name: string) => readFileSync(join(import.meta.dirname, '../../fixtures/topics', name), 'utf8');
const screeningText = readFileSync(join(import.meta.dirname, '../../../assets/demo', screening.fileName), 'utf8');

/** A document on a browser platform whose autosave never fires on its own. */
function setUp(storage = new MemoryStorage(), kind: 'browser' | 'desktop' = 'browser') {
  const platform = fakePlatform(kind, storage);
  const messages = new AppMessages(() => undefined);
  const topic = new TopicDocument({ platform, demos: DEMO_TOPICS, messages, editor: { schedule: () => () => undefined } });
  return { platform, messages, topic };
}

describe('TopicDocument', () => {
  it('starts on the first example, named as an unsaved example', () => {
    const { topic } = setUp();
    expect(topic.editor.draft.title).toBe(stone.topic.title);
    expect(topic.fileLabel).toBe('Example (not saved)');
    expect(topic.windowTitle).toBe(`${stone.topic.title} — Chancewise`);
    expect(topic.offer).toBeNull();
  });

  it('offers back unsaved work from an earlier visit, and restores it as unsaved', () => {
    const storage = new MemoryStorage();
    const earlier = setTopicText(draftFromTopic(stone.topic), 'title', 'My own topic');
    new Autosave(storage).save({ draft: earlier, fileName: 'mine.cwtopic', savedAt: '2026-11-03T09:30:00.000Z', unsaved: true });
    const { topic, messages } = setUp(storage);
    expect(topic.offer?.draft.title).toBe('My own topic');
    if (topic.offer === null) throw new Error('no offer');
    topic.restore(topic.offer);
    expect(topic.offer).toBeNull();
    expect(topic.editor.draft.title).toBe('My own topic');
    expect(topic.editor.hasUnsavedChanges).toBe(true);
    expect(topic.windowTitle).toBe('• My own topic — Chancewise');
    expect(topic.fileLabel).toBe('mine.cwtopic');
    expect(messages.message?.text).toBe('Your unsaved work is back. Save writes it to “mine.cwtopic”.');
    expect(storage.getItem(EARLIER_AUTOSAVE_KEY)).toBeNull();
    // A restored document starts its own history: undo never brings the example back.
    expect(topic.editor.canUndo).toBe(false);
    expect(topic.editor.undo()).toBe(false);
    expect(topic.editor.draft.title).toBe('My own topic');
  });

  it('forgets the offered work when it is discarded', () => {
    const storage = new MemoryStorage();
    const earlier = setTopicText(draftFromTopic(stone.topic), 'title', 'Thrown away');
    new Autosave(storage).save({ draft: earlier, fileName: null, savedAt: '2026-11-03T09:30:00.000Z', unsaved: true });
    const first = setUp(storage);
    first.topic.discardOffer();
    expect(first.topic.offer).toBeNull();
    expect(first.topic.editor.draft.title).toBe(stone.topic.title);
  });

  it('opens a picked file as a new document, puts it on the recent list and offers the replaced unsaved work back', async () => {
    const { topic, platform, messages } = setUp();
    topic.editor.change((draft) => setTopicText(draft, 'title', 'Work in progress'), 'title');
    platform.picked = { name: 'screening.cwtopic', text: screeningText };
    topic.startOpen = true;
    await topic.openFile();
    expect(topic.editor.draft.title).toBe(screening.topic.title);
    expect(topic.startOpen).toBe(false);
    expect(topic.recent).toEqual(['screening.cwtopic']);
    expect(new RecentFiles(platform.storage).list()).toEqual(['screening.cwtopic']);
    expect(messages.message).toEqual({
      tone: 'info',
      text: 'Opened “screening.cwtopic”. Your previous topic had unsaved changes: they are kept above, to restore or discard.',
    });
    // Undo stays within the opened file: the document, its name and Save stay the file's.
    expect(topic.editor.canUndo).toBe(false);
    expect(topic.editor.undo()).toBe(false);
    expect(topic.editor.draft.title).toBe(screening.topic.title);
    expect(topic.editor.fileName).toBe('screening.cwtopic');
    expect(topic.editor.hasUnsavedChanges).toBe(false);
    expect(topic.offer?.draft.title).toBe('Work in progress');
    expect(new Autosave(platform.storage, EARLIER_AUTOSAVE_KEY).load()?.draft.title).toBe('Work in progress');
    if (topic.offer === null) throw new Error('no offer');
    topic.restore(topic.offer);
    expect(topic.editor.draft.title).toBe('Work in progress');
    expect(topic.fileLabel).toBe('Example (not saved)');
    // The file had no unsaved changes, so nothing is offered in its place.
    expect(topic.offer).toBeNull();
  });

  it('an edit then undo after opening a file comes back to the file as opened, and no further', async () => {
    const { topic, platform } = setUp();
    platform.picked = { name: 'screening.cwtopic', text: screeningText };
    await topic.openFile();
    topic.editor.change((draft) => setTopicText(draft, 'title', 'Edited'), 'title');
    expect(topic.windowTitle).toBe('• Edited — Chancewise');
    expect(topic.editor.undo()).toBe(true);
    expect(topic.editor.draft.title).toBe(screening.topic.title);
    expect(topic.windowTitle).toBe(`${screening.topic.title} — Chancewise`);
    expect(topic.editor.undo()).toBe(false);
    expect(topic.editor.draft.title).toBe(screening.topic.title);
    expect(topic.fileLabel).toBe('screening.cwtopic');
  });

  it('says when a recent file came back under another name, and when an older file was updated', async () => {
    const { topic, platform, messages } = setUp(new MemoryStorage(), 'desktop');
    platform.picked = { name: 'version-1-blood-pressure.json', text: fixture('version-1-blood-pressure.json') };
    await topic.openFile({ recentName: 'old.cwtopic', recentPath: '/home/gp/old.cwtopic' });
    expect(platform.recentPathsOpened).toEqual(['/home/gp/old.cwtopic']);
    expect(messages.message?.text).toBe(
      'Opened “version-1-blood-pressure.json” (you chose it in place of “old.cwtopic”). It was written by an older version and has been updated; saving writes the new format.',
    );
    expect(topic.offer).toBeNull();
  });

  it('says what happened to a file in the words it is given, the core’s problem among them', async () => {
    const platform = fakePlatform('browser', new MemoryStorage());
    const messages = new AppMessages(() => undefined);
    const words = pseudoLocale(noticeMessagesEn);
    const core = pseudoLocale(english);
    const topic = new TopicDocument({
      platform,
      demos: DEMO_TOPICS,
      messages,
      words,
      core,
      editor: { schedule: () => () => undefined },
    });
    // Every sentence is wrapped whole (nothing is left once the wrapped words are taken out),
    // and a file that does not read carries the core's problem, itself wrapped, inside.
    const left = () => stripPseudo(messages.message?.text ?? '').trim();
    platform.picked = { name: 'picked.cwtopic', text: '  ' };
    await topic.openFile();
    expect(messages.message?.tone).toBe('error');
    expect(left()).toBe('');
    for (const text of ['{"kind": "photo"}', '{"format": "chancewise-topic", "version": 99}']) {
      platform.picked = { name: 'picked.cwtopic', text };
      await topic.openFile();
      expect(messages.message?.text).toMatch(/^⟦+“picked\.cwtopic” could not be opened\. ⟦.+⟧.*⟧/);
      expect(left()).toBe('');
    }
    topic.newTopic();
    expect(messages.message?.text).toContain('⟦');
    expect(left()).toBe('');
  });

  it('leaves the topic alone when a file cannot be read or opened, and says why', async () => {
    const { topic, platform, messages } = setUp();
    platform.picked = { name: 'empty.cwtopic', text: '  ' };
    await topic.openFile();
    expect(messages.message).toEqual({
      tone: 'error',
      text: '“empty.cwtopic” is empty, so there is no topic to open. Your current topic is unchanged.',
    });
    platform.picked = new Error('The file is not readable.');
    await topic.openFile();
    expect(messages.message).toEqual({ tone: 'error', text: 'The file is not readable. Your current topic is unchanged.' });
    expect(topic.editor.draft.title).toBe(stone.topic.title);
    expect(topic.recent).toEqual([]);
  });

  it('starts a new topic or an example and tells the desktop shell the topic was replaced', () => {
    const { topic, platform, messages } = setUp();
    topic.newTopic();
    expect(topic.editor.draft.title).toBe('');
    expect(topic.windowTitle).toBe('New topic — Chancewise');
    expect(topic.fileLabel).toBe('Not saved yet');
    expect(messages.message?.text).toBe('Started a new topic.');
    topic.openDemo(screening);
    expect(topic.editor.draft.title).toBe(screening.topic.title);
    expect(messages.message?.text).toBe(`Opened the example “${screening.topic.title}”. Its numbers are invented.`);
    expect(platform.replaced).toBe(2);
  });

  it('starts a new topic in the patient language chosen, its comparison named in that language', () => {
    const { topic, messages } = setUp();
    topic.newTopic({ language: 'es', comparisonName: 'sin tratamiento' });
    expect(topic.editor.draft.language).toBe('es');
    expect(topic.editor.draft.options.map((option) => [option.name, option.isComparison])).toEqual([
      ['sin tratamiento', true],
      ['', false],
    ]);
    // The clinician's messages stay in the interface's language.
    expect(messages.message?.text).toBe('Started a new topic.');
    topic.newTopic();
    expect(topic.editor.draft.language).toBe('en');
    expect(topic.editor.draft.options[0]?.name).toBe('no treatment');
  });

  it('asks for focus on the decision’s box of a new topic, and on the topic’s heading of an opened one', async () => {
    const { topic, platform } = setUp();
    expect(topic.focusRequest).toBeNull();
    topic.newTopic();
    expect(topic.focusRequest).toEqual({ target: 'decision' });
    const first = topic.focusRequest;
    topic.newTopic();
    // A new request each time, so asking twice for the same place still moves focus.
    expect(topic.focusRequest).not.toBe(first);
    topic.openDemo(screening);
    expect(topic.focusRequest).toEqual({ target: 'topic' });
    topic.newTopic();
    platform.picked = { name: 'screening.cwtopic', text: screeningText };
    await topic.openFile();
    expect(topic.focusRequest).toEqual({ target: 'topic' });
  });

  it('knows when the patient’s details are filled in', () => {
    const { topic } = setUp();
    expect(topic.patientGiven).toBe(false);
    topic.editor.change((draft) => setTopicText(draft, 'patientReference', 'A-17'), 'patientReference');
    expect(topic.patientGiven).toBe(true);
  });

  it('opens a file the desktop shell hands over, and offers a snapshot back after a crash', () => {
    const { topic, messages } = setUp(new MemoryStorage(), 'desktop');
    topic.receive({ kind: 'file', file: { name: 'screening.cwtopic', text: screeningText } });
    expect(topic.editor.fileName).toBe('screening.cwtopic');
    topic.receive({ kind: 'snapshot', content: draftFromTopic(stone.topic), fileName: 'stone.cwtopic' });
    expect(topic.offer?.fileName).toBe('stone.cwtopic');
    expect(topic.offer?.draft.title).toBe(stone.topic.title);
    topic.receive({ kind: 'snapshot', content: { not: 'a draft' }, fileName: null });
    expect(messages.message).toEqual({ tone: 'error', text: 'A copy of unsaved work was found but could not be read.' });
  });
});

describe('a copy in another language', () => {
  const said = 'A copy in Spanish.';

  it('puts an unsaved copy in Spanish on screen, with the same numbers, and leaves the example as it was', () => {
    const { topic, messages, platform } = setUp();
    const before = topic.editor.draft;
    const shownBefore = topic.editor.shown;
    topic.copyInLanguage('es', said);
    const copy = topic.editor.draft;
    expect(copy.language).toBe('es');
    expect(copy.translation?.from).toBe('en');
    expect(copy.translation?.sourceTexts['options.water.name']).toBe('extra water each day');
    expect(copy.options).toEqual(before.options);
    expect(topic.editor.shown?.outcomes.map((outcome) => outcome.options.map((option) => option.perPeople))).toEqual(
      shownBefore?.outcomes.map((outcome) => outcome.options.map((option) => option.perPeople)),
    );
    expect(topic.editor.fileName).toBeNull();
    expect(topic.editor.hasUnsavedChanges).toBe(true);
    expect(topic.editor.canUndo).toBe(false);
    expect(before.language).toBe('en');
    expect(before.translation).toBeNull();
    // The example had no changes, so nothing is offered back.
    expect(topic.offer).toBeNull();
    expect(messages.message).toEqual({ tone: 'info', text: said });
    // The desktop shell is told that another document is on screen.
    expect(platform.replaced).toBe(1);
  });

  it('keeps unsaved changes to the topic copied above, to restore', () => {
    const { topic, messages } = setUp();
    topic.editor.change((draft) => setTopicText(draft, 'title', 'My own stone topic'), 'title');
    topic.copyInLanguage('es', said);
    expect(topic.editor.draft.title).toBe('My own stone topic');
    expect(topic.editor.draft.translation?.sourceTexts['title']).toBe('My own stone topic');
    expect(topic.offer?.draft.title).toBe('My own stone topic');
    expect(topic.offer?.draft.language).toBe('en');
    expect(messages.message?.text).toBe(
      `${said} Your previous topic had unsaved changes: they are kept above, to restore or discard.`,
    );
  });
});
