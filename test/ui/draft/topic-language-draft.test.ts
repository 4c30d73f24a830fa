import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { parseDraft } from '../../../src/ui/draft/draft-schema.ts';
import { blankDraft } from '../../../src/ui/draft/draft-edits.ts';
import { openTopicText, topicFileText } from '../../../src/ui/files/topic-files.ts';

const demo = readFileSync(new URL('../../../assets/demo/04-sore-throat.json', import.meta.url), 'utf8');
const translation = { from: 'en', sourceTexts: { title: 'Easing a sore throat' } };
const spanishFile = (() => {
  const data = JSON.parse(demo) as { topic: Record<string, unknown> };
  return JSON.stringify({ ...data, version: 6, topic: { ...data.topic, language: 'es-MX', translation } });
})();

describe('the editor keeps a topic’s patient language', () => {
  it('opens a Spanish topic with its tag and its translation marks, and saves both back', () => {
    const opened = openTopicText('garganta.json', spanishFile);
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.draft.language).toBe('es-MX');
    expect(opened.draft.translation).toEqual(translation);
    const saved = topicFileText(opened.draft, false);
    if (!saved.ok) throw new Error(saved.message);
    const reading = readTopicFile(saved.text);
    if (!reading.ok) throw new Error('the saved file does not read');
    expect(reading.topic.language).toBe('es-MX');
    expect(reading.topic.translation).toEqual(translation);
  });

  it('writes no language for an English topic, so the file reads as older ones do', () => {
    const opened = openTopicText('throat.json', demo);
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.draft.language).toBe('en');
    const saved = topicFileText(opened.draft, false);
    if (!saved.ok) throw new Error(saved.message);
    expect(saved.text).not.toMatch(/"language"|"translation"/);
  });

  it('starts a new topic in English, and reads a draft stored before topics had a language as English', () => {
    const draft = blankDraft();
    expect(draft.language).toBe('en');
    const { language: _language, translation: _translation, ...older } = draft;
    expect(parseDraft(older)).toMatchObject({ language: 'en', translation: null });
  });
});
