import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeProblem } from '../../../src/core/messages/describe.ts';
import { readTopicFile, writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import { readLanguageTag, topicLanguage } from '../../../src/core/topic/topic-language.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';

// Version 6 of the topic file (Chancewise's own format) names the patient language with a BCP 47
// tag (Phillips & Davis 2009, RFC 5646 "Tags for Identifying Languages", §2.1: a primary language
// subtag, then optional region or other subtags such as "es-419" and "es-MX").

const demo = readFileSync(new URL('../../../assets/demo/01-kidney-stone.json', import.meta.url), 'utf8');

function read(contents: string): Topic {
  const reading = readTopicFile(contents);
  if (!reading.ok) throw new Error(describeProblem(reading.problem));
  return reading.topic;
}

/** The demo's file with its topic given `fields`. */
function withTopic(fields: Record<string, unknown>): string {
  const data = JSON.parse(demo) as { version: number; topic: Record<string, unknown> };
  return JSON.stringify({ ...data, version: 6, topic: { ...data.topic, ...fields } });
}

describe('the patient language of a topic', () => {
  it('is English when the topic names none, as every older file reads', () => {
    expect(read(demo).language).toBeUndefined();
    expect(topicLanguage(read(demo))).toBe('en');
  });

  it.each(['es', 'es-ES', 'es-419', 'es-MX', 'ES-mx'])('reads "%s" as Spanish (RFC 5646: the primary subtag decides)', (tag) => {
    expect(readLanguageTag(tag)).toEqual({ ok: true, language: 'es' });
    expect(topicLanguage(read(withTopic({ language: tag })))).toBe('es');
  });

  it.each(['en', 'en-GB', 'en-US'])('reads "%s" as English', (tag) => {
    expect(readLanguageTag(tag)).toEqual({ ok: true, language: 'en' });
  });

  it('keeps the tag as written through writing and reading', () => {
    const topic = read(withTopic({ language: 'es-419' }));
    expect(topic.language).toBe('es-419');
    expect(read(writeTopicFile(topic))).toEqual(topic);
    expect(JSON.parse(writeTopicFile(topic))).toMatchObject({ version: 6, topic: { language: 'es-419' } });
  });

  it('keeps the marks of a translated copy through writing and reading', () => {
    const translation = { from: 'en', sourceTexts: { title: 'Treating a kidney stone', 'outcomes.0.name': 'stone passed' } };
    const topic = read(withTopic({ language: 'es', translation }));
    expect(topic.translation).toEqual(translation);
    expect(read(writeTopicFile(topic))).toEqual(topic);
  });

  it('refuses a language Chancewise does not write, and says which it does', () => {
    const reading = readTopicFile(withTopic({ language: 'fr' }));
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect(reading.problem).toMatchObject({ code: 'topic-language-unsupported', field: 'topic.language' });
    expect(describeProblem(reading.problem)).toBe(
      'Chancewise cannot write patient wording in "fr". Set "language" in the topic to "en" for English or to a Spanish tag ("es", "es-ES", "es-419", "es-MX"), or remove it for English; the file has not been changed.',
    );
  });

  it('refuses a value that is not a language tag', () => {
    const reading = readTopicFile(withTopic({ language: 'Spanish please' }));
    if (reading.ok) throw new Error('expected a refusal');
    expect(describeProblem(reading.problem)).toBe(
      'This topic\'s "language" value "Spanish please" is not a language tag. Set "language" in the topic to "en" for English or to a Spanish tag ("es", "es-ES", "es-419", "es-MX"), or remove it for English; the file has not been changed.',
    );
    expect(readLanguageTag('e')).toEqual({ ok: false, tag: 'e', reason: 'malformed' });
    expect(readLanguageTag('es_MX')).toEqual({ ok: false, tag: 'es_MX', reason: 'malformed' });
  });

  it('refuses a language that is not text, naming the field', () => {
    const reading = readTopicFile(withTopic({ language: 34 }));
    if (reading.ok) throw new Error('expected a refusal');
    expect(reading.problem.field).toBe('topic.language');
  });
});
