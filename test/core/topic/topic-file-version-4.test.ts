import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readTopicFile, writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import { TOPIC_VERSION } from '../../../src/core/topic/topic-schema.ts';
import type { Topic, TopicHandoutChoices } from '../../../src/core/topic/topic.ts';

// Version 4 of the topic file keeps the handout's choices (`topic.handout`); versions 2 and 3
// read as before, with no choices stored.

const demoText = readFileSync(new URL('../../../assets/demo/01-kidney-stone.json', import.meta.url), 'utf8');
const read = (text: string): Topic => {
  const reading = readTopicFile(text);
  if (!reading.ok) throw new Error(reading.problem.code);
  return reading.topic;
};

const choices: TopicHandoutChoices = { showNnt: true, per: 1000, outline: true, paper: 'letter' };

describe('version 4 topic files', () => {
  it('are followed by version 6, which this build writes', () => {
    expect(TOPIC_VERSION).toBe(6);
    expect(JSON.parse(writeTopicFile(read(demoText))).version).toBe(6);
  });

  it('keep every handout choice through writing and reading', () => {
    const topic = { ...read(demoText), handout: choices };
    const text = writeTopicFile(topic);
    expect(JSON.parse(text).topic.handout).toEqual({ showNnt: true, per: 1000, outline: true, paper: 'letter' });
    expect(read(text)).toEqual(topic);
  });

  it('read a version 2 or 3 file as before, with no choices stored', () => {
    const data = JSON.parse(demoText) as { version: number; topic: Record<string, unknown> };
    expect(data.version).toBe(2);
    expect(read(demoText).handout).toBeUndefined();
    expect(read(JSON.stringify({ ...data, version: 3 })).handout).toBeUndefined();
  });

  it('refuse a choice that is not one of the allowed, naming the field', () => {
    const data = JSON.parse(writeTopicFile({ ...read(demoText), handout: choices })) as {
      topic: { handout: Record<string, unknown> };
    };
    data.topic.handout.paper = 'a5';
    const reading = readTopicFile(JSON.stringify(data));
    expect(reading.ok).toBe(false);
    if (reading.ok) return;
    expect(reading.problem).toMatchObject({ code: 'file-field-invalid', field: 'topic.handout.paper' });
  });
});
