import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { writeTopicFile } from '../../src/core/topic/topic-file.ts';
import { nodeTopicReader } from '../../src/teaching/node-topic-reader.ts';
import { isUsableTopicPath, resolveTeachingSet } from '../../src/teaching/resolve-teaching-set.ts';
import { readTeachingSet, writeTeachingSet } from '../../src/teaching/teaching-set-file.ts';
import type { TeachingSet } from '../../src/teaching/teaching-set-file.ts';
import { DEFAULT_STEPS, STEP_KINDS } from '../../src/teaching/teaching-steps.ts';
import { STONE, SCREENING, demoText, demoTopic, pairTopic, projectFile } from './teaching-fixtures.ts';

// The teaching-set format is this app's own (documented in src/teaching/teaching-set-schema.ts);
// the checks below hold it to that definition and to JSON (RFC 8259). Expected wording of
// "expected" and "found" is the topic file reader's (src/core/messages/en/file-words.ts).

const EXAMPLE = projectFile('assets/teaching/framing-and-format.teaching.json');
const PATHS = projectFile('test/teaching/fixtures/sets/paths.teaching.json');

/** A valid set of the given items, as text. */
function setText(items: unknown[], extra: Record<string, unknown> = {}): string {
  return JSON.stringify({ format: 'chancewise-teaching-set', version: 1, title: 'A test set', items, ...extra });
}
const embedded = (name: string): unknown => JSON.parse(demoText(name));

function readOk(text: string): TeachingSet {
  const reading = readTeachingSet('set.json', text);
  if (!reading.ok) throw new Error(reading.message);
  return reading.set;
}

function problemOf(text: string): { field: string; message: string } {
  const reading = readTeachingSet('set.json', text);
  if (reading.ok) throw new Error('the set was read');
  return { field: reading.field, message: reading.message };
}

describe('reading a teaching set', () => {
  it('reads the shipped example: two embedded demonstration topics with their steps', async () => {
    const set = readOk(readFileSync(EXAMPLE, 'utf8'));
    expect(set.title).toBe('Framing and format: two illustrative topics');
    expect(set.items.map((item) => item.source.kind)).toEqual(['embedded', 'embedded']);
    expect(set.items[0]?.steps).toEqual(DEFAULT_STEPS);
    expect(set.items[1]?.steps).toEqual(['title', 'baseline', 'with-option', 'helped', 'harmed', 'framing', 'denominator']);
    const resolved = await resolveTeachingSet('example', set, null);
    if (!resolved.ok) throw new Error(resolved.message);
    expect(resolved.items.map((item) => [item.topic.title, item.optionId, item.harmIds])).toEqual([
      [demoTopic(STONE).title, 'water', ['night']],
      [demoTopic(SCREENING).title, 'screening', ['camera']],
    ]);
  });

  it('fills in the choices an item leaves out: every step, no fixed option, harm or denominator', () => {
    const set = readOk(setText([{ topic: embedded(STONE) }]));
    expect(set.items[0]).toMatchObject({ option: null, harm: null, per: null, steps: [...STEP_KINDS] });
  });

  it('reads back what it writes, topics inside and without the patient’s details', () => {
    const topic = { ...demoTopic(STONE), patient: { name: 'A. Patient', reference: 'X-1' } };
    const text = writeTeachingSet('Round trip', [
      { topic, option: 'citrate', harm: 'stomach', per: 1000, steps: ['helped', 'framing'] },
    ]);
    expect(text).not.toContain('A. Patient');
    const set = readOk(text);
    expect(set.title).toBe('Round trip');
    const item = set.items[0];
    expect(item).toMatchObject({ option: 'citrate', harm: 'stomach', per: 1000, steps: ['helped', 'framing'] });
    expect(item?.source).toEqual({ kind: 'embedded', topic: { ...topic, patient: null } });
  });

  it('migrates an embedded version 1 topic, as the topic reader does', () => {
    const old = JSON.parse(readFileSync(projectFile('test/fixtures/topics/version-1-blood-pressure.json'), 'utf8')) as unknown;
    const set = readOk(setText([{ topic: old }]));
    expect(set.items[0]?.source.kind).toBe('embedded');
  });

  it.each([
    ['text that is not JSON', '{ "format": ', '(file)', /“set\.json” is not a readable teaching set: it is not complete JSON/],
    ['an empty file', '  \n', '(file)', /“set\.json” is empty/],
    ['a topic file', demoText(STONE), 'format', /“set\.json” is a topic, not a teaching set/],
    [
      'another format',
      JSON.stringify({ format: 'slides', version: 1 }),
      'format',
      /not a Chancewise teaching set \(its format is "slides"\)/,
    ],
    [
      'a newer version',
      setText([], { version: 2 }),
      'version',
      /version 2, newer than this version of Chancewise reads \(up to 1\)/,
    ],
    [
      'a title that is a number',
      setText([{ topic: embedded(STONE) }], { title: 12 }),
      'title',
      /damaged at "title": expected text, found the number 12/,
    ],
    ['no items', setText([]), 'items', /damaged at "items": expected at least one topic, found an empty list/],
    [
      'items that are not a list',
      setText([], { items: { topic: 'a.json' } }),
      'items',
      /damaged at "items": expected a list, found a group of fields/,
    ],
    [
      'an unknown step',
      setText([{ topic: embedded(STONE), steps: ['baseline', 'summary'] }]),
      'items.0.steps.1',
      /damaged at "items\.0\.steps\.1": expected one of "title", "baseline", .* or "incremental", found the text "summary"/,
    ],
    [
      'no steps',
      setText([{ topic: embedded(STONE), steps: [] }]),
      'items.0.steps',
      /expected at least one step, found an empty list/,
    ],
    [
      'a denominator of 50',
      setText([{ topic: embedded(STONE), per: 50 }]),
      'items.0.per',
      /damaged at "items\.0\.per": expected 100 or 1000 or null, found the number 50/,
    ],
    [
      'a topic that is a number',
      setText([{ topic: 7 }]),
      'items.0.topic',
      /damaged at "items\.0\.topic": expected text or a group of fields, found the number 7/,
    ],
  ])('names the first wrong field of %s', (_case, text, field, message) => {
    const found = problemOf(text);
    expect(found.field).toBe(field);
    expect(found.message).toMatch(message);
  });

  it('names a wrong field inside an embedded topic by its whole path in the set', () => {
    const topic = embedded(STONE) as { topic: { periodYears: unknown } };
    topic.topic.periodYears = 'ten';
    const found = problemOf(setText([{ topic: embedded(SCREENING) }, { topic }]));
    expect(found.field).toBe('items.1.topic.topic.periodYears');
    expect(found.message).toBe(
      '“set.json” is damaged at "items.1.topic.topic.periodYears": expected a number, found the text "ten".',
    );
  });

  it('says which item holds a file that is not a topic', () => {
    const found = problemOf(setText([{ topic: { format: 'notes', text: 'hello' } }]));
    expect(found.field).toBe('items.0.topic.format');
    expect(found.message).toBe(
      '“set.json”, topic 1 ("items.0.topic"): This file is not a Chancewise topic (its format is "notes").',
    );
  });
});

describe('resolving a teaching set into topics to present', () => {
  it('says in a browser that a topic named by path must be written inside the set', async () => {
    const set = readOk(readFileSync(PATHS, 'utf8'));
    const resolved = await resolveTeachingSet('paths.teaching.json', set, null);
    expect(resolved.ok).toBe(false);
    if (resolved.ok) return;
    expect(resolved.field).toBe('items.0.topic');
    expect(resolved.message).toMatch(
      /topic 1 is a file \(“\.\.\/\.\.\/\.\.\/\.\.\/assets\/demo\/01-kidney-stone\.json”\), which a browser cannot open by itself/,
    );
  });

  it('reads topics named by path relative to the set’s folder in Node', async () => {
    const set = readOk(readFileSync(PATHS, 'utf8'));
    const resolved = await resolveTeachingSet('paths.teaching.json', set, nodeTopicReader(PATHS));
    if (!resolved.ok) throw new Error(resolved.message);
    expect(resolved.items.map((item) => [item.topic.title, item.optionId, item.steps.length])).toEqual([
      [demoTopic(STONE).title, 'citrate', 3],
      [demoTopic(SCREENING).title, 'screening', STEP_KINDS.length],
    ]);
  });

  it('accepts only relative paths to .json files', () => {
    expect(isUsableTopicPath('../demo/01-kidney-stone.json')).toBe(true);
    expect(isUsableTopicPath('topics/a.JSON')).toBe(true);
    for (const path of ['/etc/passwd.json', 'C:\\topics\\a.json', 'https://example.org/a.json', 'file:///a.json', 'a.txt', '']) {
      expect(isUsableTopicPath(path)).toBe(false);
    }
  });

  it('refuses an absolute path and names the item', async () => {
    const set = readOk(setText([{ topic: '/tmp/a.json' }]));
    const resolved = await resolveTeachingSet('set.json', set, nodeTopicReader(PATHS));
    expect(resolved).toMatchObject({ ok: false, field: 'items.0.topic' });
    if (!resolved.ok) expect(resolved.message).toMatch(/must be a relative path to a \.json file next to the set/);
  });

  it('says when a named topic file cannot be read or is not a topic', async () => {
    const missing = await resolveTeachingSet(
      'set.json',
      readOk(setText([{ topic: 'no-such-topic.json' }])),
      nodeTopicReader(PATHS),
    );
    expect(missing).toMatchObject({ ok: false, field: 'items.0.topic' });
    if (!missing.ok) expect(missing.message).toMatch(/topic 1 \(“no-such-topic\.json”\) could not be read: ENOENT/);
    const notTopic = await resolveTeachingSet(
      'set.json',
      readOk(setText([{ topic: 'paths.teaching.json' }])),
      nodeTopicReader(PATHS),
    );
    expect(notTopic).toMatchObject({ ok: false, field: 'items.0.topic' });
    if (!notTopic.ok)
      expect(notTopic.message).toMatch(/This file is not a Chancewise topic \(its format is "chancewise-teaching-set"\)/);
  });

  it.each([
    [{ option: 'lower' }, 'items.0.option', /there is no option "lower" to present \(the options are "water", "citrate"\)/],
    [{ option: 'as-now' }, 'items.0.option', /"as-now" is the comparison; name an option to compare with it/],
    [{ harm: 'stone' }, 'items.0.harm', /there is no harm "stone" in this topic \(the harms are "night", "stomach"\)/],
  ])('checks the choices %j against the topic', async (choices, field, message) => {
    const resolved = await resolveTeachingSet('set.json', readOk(setText([{ topic: embedded(STONE), ...choices }])), null);
    expect(resolved).toMatchObject({ ok: false, field });
    if (!resolved.ok) expect(resolved.message).toMatch(message);
  });

  it('says which topic cannot be computed, and why, at its field', async () => {
    const topic = JSON.parse(
      writeTopicFile(pairTopic({ baseline: '150%', effect: { measure: 'rr', estimate: 0.8 } })),
    ) as unknown;
    const resolved = await resolveTeachingSet('set.json', readOk(setText([{ topic: embedded(STONE) }, { topic }])), null);
    expect(resolved).toMatchObject({ ok: false, field: 'items.1.topic.topic.outcomes.0.baseline.risk' });
    if (!resolved.ok)
      expect(resolved.message).toMatch(/“set\.json”, topic 2 cannot be shown .*A risk of "150%" is outside 0% to 100%/);
  });
});
