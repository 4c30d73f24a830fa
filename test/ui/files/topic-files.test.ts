import { describe, expect, test } from 'vitest';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setEffectField } from '../../../src/ui/draft/draft-edits.ts';
import { openTopicText, suggestedFileName, topicFileText } from '../../../src/ui/files/topic-files.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
const demo = draftFromTopic(first.topic);
const withPatient = { ...demo, patientName: 'Ann Example', patientReference: 'A-12' };

describe('topic files', () => {
  test('a saved draft opens as the same draft', () => {
    const saved = topicFileText(demo, false);
    if (!saved.ok) throw new Error(saved.message);
    const opened = openTopicText('kidney-stone.chancewise.json', saved.text);
    expect(opened.ok && opened.draft).toEqual(demo);
  });

  test('leaves the patient’s details out unless asked to include them', () => {
    const without = topicFileText(withPatient, false);
    const included = topicFileText(withPatient, true);
    if (!without.ok || !included.ok) throw new Error('expected both to be written');
    expect(without.text).not.toContain('Ann Example');
    expect(without.text).not.toContain('A-12');
    const reading = readTopicFile(included.text);
    expect(reading.ok && reading.topic.patient).toEqual({ name: 'Ann Example', reference: 'A-12' });
  });

  test('will not write a file while a number cannot be read, and says so', () => {
    const saved = topicFileText(setEffectField(demo, 'night', 'water', 'estimate', '1..2'), false);
    expect(saved.ok).toBe(false);
    expect(!saved.ok && saved.message).toMatch(/One number cannot be read yet/);
  });

  test('a damaged file gives one clear sentence naming the file and what is wrong', () => {
    const saved = topicFileText(demo, false);
    if (!saved.ok) throw new Error(saved.message);
    const cut = openTopicText('cut.chancewise.json', saved.text.slice(0, 200));
    expect(cut.ok).toBe(false);
    expect(!cut.ok && cut.message).toMatch(/^“cut\.chancewise\.json” could not be opened\. This file is not a readable topic/);
    const foreign = openTopicText('photo.json', '{"kind": "photo"}');
    expect(!foreign.ok && foreign.message).toContain('not a Chancewise topic');
    expect(openTopicText('empty.json', '  ').ok).toBe(false);
  });

  test('names a new file after the decision, and keeps the name of an opened file', () => {
    expect(suggestedFileName(demo, null)).toBe('ways-to-cut-the-chance-of-a-second.cwtopic');
    expect(suggestedFileName({ ...demo, title: '  ' }, null)).toBe('topic.cwtopic');
    expect(suggestedFileName(demo, 'mine.cwtopic')).toBe('mine.cwtopic');
    expect(suggestedFileName(demo, 'old.json')).toBe('old.cwtopic');
    expect(suggestedFileName(demo, 'older.chancewise.json')).toBe('older.cwtopic');
  });
});
