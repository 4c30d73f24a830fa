// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { AppMessages } from '../../../src/ui/state/app-messages.svelte.ts';
import { DEMO_TOPICS } from './demo-topics-read.ts';
import { MemoryStorage } from '../../../src/ui/state/key-value-storage.ts';
import { TopicDocument } from '../../../src/ui/state/topic-document.svelte.ts';
import { TopicSaving } from '../../../src/ui/state/topic-saving.svelte.ts';
import { fakePlatform, settle } from './fake-platform.ts';

// Patient-identifying details are written only when the person asks (data minimisation,
// GDPR Art. 5(1)(c)); the file endings are the app's own (.cwtopic, older .json).

function setUp(kind: 'browser' | 'desktop') {
  const platform = fakePlatform(kind, new MemoryStorage());
  const messages = new AppMessages(() => undefined);
  const topic = new TopicDocument({ platform, demos: DEMO_TOPICS, messages, editor: { schedule: () => () => undefined } });
  return { platform, messages, topic, saving: new TopicSaving(topic, platform, messages) };
}

const stoneTitle = DEMO_TOPICS[0]?.topic.title ?? '';

describe('TopicSaving', () => {
  it('asks the browser user for a file name, suggesting one made from the decision', () => {
    const { saving, platform } = setUp('browser');
    saving.request();
    expect(saving.dialogOpen).toBe(true);
    expect(saving.asksName).toBe(true);
    expect(saving.suggestedName).toBe('ways-to-cut-the-chance-of-a-second.cwtopic');
    expect(platform.savedTopics).toHaveLength(0);
  });

  it('saves at once on the desktop when no patient is named, and marks the topic saved', async () => {
    const { saving, platform, topic, messages } = setUp('desktop');
    topic.editor.change((draft) => setTopicText(draft, 'title', 'Knee exercise'), 'title');
    saving.request('save-as');
    await settle();
    expect(saving.dialogOpen).toBe(false);
    expect(platform.savedTopics.map(({ name, mode }) => [name, mode])).toEqual([['knee-exercise.cwtopic', 'save-as']]);
    expect(topic.editor.hasUnsavedChanges).toBe(false);
    expect(topic.editor.fileName).toBe('knee-exercise.cwtopic');
    expect(topic.recent).toEqual(['knee-exercise.cwtopic']);
    expect(messages.message?.text).toBe('Saved “knee-exercise.cwtopic”.');
  });

  it('asks on the desktop when a patient is named, and writes their details only when asked', async () => {
    const { saving, platform, topic, messages } = setUp('desktop');
    topic.editor.change((draft) => setTopicText(draft, 'patientName', 'Ann Example'), 'patientName');
    saving.request();
    expect(saving.dialogOpen).toBe(true);
    await saving.save('for-ann', false);
    const without = readTopicFile(platform.savedTopics[0]?.text ?? '');
    expect(without.ok && without.topic.patient?.name).toBeFalsy();
    await saving.save('for-ann', true);
    expect(platform.savedTopics[1]?.name).toBe('for-ann.cwtopic');
    const withDetails = readTopicFile(platform.savedTopics[1]?.text ?? '');
    expect(withDetails.ok && withDetails.topic.patient?.name).toBe('Ann Example');
    expect(messages.message?.text).toBe('Saved “for-ann.cwtopic”, with the patient’s details.');
  });

  it('says where the browser puts the file, and keeps an older .json ending', async () => {
    const { saving, platform, messages } = setUp('browser');
    await saving.save('stone.chancewise.json', false);
    expect(platform.savedTopics[0]?.name).toBe('stone.chancewise.json');
    expect(messages.message?.text).toBe('Saved “stone.chancewise.json”. Your browser puts it in its downloads folder.');
  });

  it('changes nothing when saving is cancelled, and keeps the work when it fails', async () => {
    const { saving, platform, topic, messages } = setUp('browser');
    platform.saveAnswer = () => null;
    await saving.save('stone', false);
    expect(messages.message).toBeNull();
    expect(topic.editor.fileName).toBeNull();
    platform.saveAnswer = () => new Error('The folder is read-only.');
    await saving.save('stone', false);
    expect(messages.message).toEqual({
      tone: 'error',
      text: 'The topic was not saved: The folder is read-only. Your work is still here.',
    });
    expect(topic.editor.draft.title).toBe(stoneTitle);
  });

  it('does not save a draft with a number that cannot be read, and says how many to fix', () => {
    const { saving, topic, messages } = setUp('browser');
    topic.editor.change((draft) => setTopicText(draft, 'periodYears', 'ten'), 'periodYears');
    saving.request();
    expect(saving.dialogOpen).toBe(false);
    expect(messages.message).toEqual({
      tone: 'error',
      text: 'One number cannot be read yet. Fix it to save a file; meanwhile Chancewise keeps your work on this computer.',
    });
  });
});
