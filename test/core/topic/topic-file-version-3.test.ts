import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile, writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { yearsFrom } from '../../../src/core/time-unit.ts';

// Version 3 of the topic file adds `wanted` on outcomes, the time units and the `opposite`
// flag of effects. Versions 1 and 2 read as before: every event unwanted, periods in years.

const demoFiles = readdirSync(new URL('../../../assets/demo/', import.meta.url)).filter((name) => name.endsWith('.json'));
const read = (text: string): Topic => {
  const reading = readTopicFile(text);
  if (!reading.ok) throw new Error(reading.problem.code);
  return reading.topic;
};

function wantedTopic(): Topic {
  return {
    title: 'Illustrative: ear drops for ear pain',
    population: 'children aged 2 to 10 with ear pain',
    periodYears: yearsFrom(3, 'days'),
    periodUnit: 'days',
    illustrative: true,
    options: [
      { id: 'none', name: 'no drops', isComparison: true },
      { id: 'drops', name: 'the drops', isComparison: false },
    ],
    outcomes: [
      {
        id: 'gone',
        name: 'pain gone',
        kind: 'benefit',
        wanted: true,
        isHeadline: true,
        baseline: { risk: '40%', periodYears: yearsFrom(3, 'days'), periodUnit: 'days', source: 'invented' },
        effects: [
          {
            optionId: 'drops',
            effect: { measure: 'rr', estimate: 0.75, lower: 0.6, upper: 0.9, opposite: true },
            source: 'invented',
            followUpYears: yearsFrom(1, 'weeks'),
            followUpUnit: 'weeks',
            certainty: 'low',
            importance: 'important',
          },
        ],
      },
    ],
    evidence: { summary: 'invented', reviewed: '2026-11' },
    questions: ['What if the pain comes back?'],
    clinician: 'Illustrative practice',
    patient: null,
  };
}

describe('version 3 topic files', () => {
  it('are followed by version 6, which this build writes with every version 3 field', () => {
    expect(JSON.parse(writeTopicFile(wantedTopic())).version).toBe(6);
  });

  it('keep every field a topic holds through write and read', () => {
    const topic = wantedTopic();
    expect(read(writeTopicFile(topic))).toEqual(topic);
  });

  it('keep the patient details when asked to, and only then', () => {
    const topic = { ...wantedTopic(), patient: { name: 'A. Person', reference: 'X1' } };
    expect(read(writeTopicFile(topic, { includePatient: true })).patient).toEqual({ name: 'A. Person', reference: 'X1' });
    expect(read(writeTopicFile(topic)).patient).toBeNull();
  });

  it('refuse a unit that is not one of days, weeks, months or years, naming the field', () => {
    const data = JSON.parse(writeTopicFile(wantedTopic())) as { topic: { periodUnit: string } };
    data.topic.periodUnit = 'fortnights';
    const reading = readTopicFile(JSON.stringify(data));
    expect(reading.ok).toBe(false);
    if (!reading.ok) expect(reading.problem.field).toBe('topic.periodUnit');
  });
});

describe('older topic files', () => {
  it.each(demoFiles)('%s read as version 2 give the same results when written as version 3', (name) => {
    const text = readFileSync(new URL(`../../../assets/demo/${name}`, import.meta.url), 'utf8');
    const before = read(text);
    const after = read(writeTopicFile(before));
    expect(computeTopic(after)).toEqual(computeTopic(before));
    if ((JSON.parse(text) as { version: number }).version === 2) {
      expect(computeTopic(before).outcomes.every((outcome) => !outcome.wanted)).toBe(true);
    }
  });

  it('a version 1 file is still migrated, with every event unwanted and periods in years', () => {
    const text = readFileSync(new URL('../../fixtures/topics/version-1-blood-pressure.json', import.meta.url), 'utf8');
    const result = computeTopic(read(text));
    expect(result.periodUnit).toBe('years');
    expect(result.outcomes.every((outcome) => !outcome.wanted)).toBe(true);
  });
});
