import * as v from 'valibot';
import { describe, expect, it } from 'vitest';
import { describeReceived, expectedAt, schemasAt } from '../../../src/core/topic/schema-expectation.ts';
import type { PathStep, SchemaNode } from '../../../src/core/topic/schema-expectation.ts';
import { topicFileSchema } from '../../../src/core/topic/topic-schema.ts';

// The words follow the topic schema (src/core/topic/topic-schema.ts); the path steps are those
// valibot reports with an issue: each key with the object or list it was read from.

const root = topicFileSchema as unknown as SchemaNode;
const steps = (...keys: (string | number)[]): PathStep[] => keys.map((key) => ({ key, input: {} }));

describe('expectedAt', () => {
  it.each([
    [['topic', 'title'], 'text'],
    [['topic', 'periodYears'], 'a number'],
    [['topic', 'illustrative'], 'true or false'],
    [['topic', 'options'], 'a list'],
    [['topic', 'options', 0], 'a group of fields (id, name, isComparison)'],
    [['topic', 'outcomes', 0, 'kind'], '"benefit" or "harm"'],
    [['topic', 'outcomes', 0, 'baseline', 'risk'], 'a number, text or null'],
    [['topic', 'outcomes', 0, 'effects', 0, 'followUpYears'], 'a number or null'],
    [['topic', 'outcomes', 0, 'effects', 0, 'certainty'], 'one of "high", "moderate", "low" or "very-low"'],
    [['topic', 'patient'], 'a group of fields (name, reference) or null'],
    [['version'], 'one of 2, 3, 4, 5 or 6'],
  ] as const)('words the value at %j as %s', (keys, words) => {
    expect(expectedAt(root, steps(...keys))).toBe(words);
  });

  it('names every measure with its plain name when the measure is wrong', () => {
    const path = [...steps('topic', 'outcomes', 0, 'effects', 0, 'effect'), { key: 'measure', input: { measure: 'rd' } }];
    expect(expectedAt(root, path)).toBe(
      'one of "counts" (trial counts), "rr" (risk ratio), "or" (odds ratio), "hr" (hazard ratio), "rrr" (relative risk reduction) or "arr" (absolute risk reduction)',
    );
  });

  it('follows the measure to the right kind of effect', () => {
    const counts = [
      ...steps('topic', 'outcomes', 0, 'effects', 0, 'effect'),
      { key: 'intervention', input: { measure: 'counts' } },
    ];
    expect(expectedAt(root, counts)).toBe('a group of fields (events, total)');
    const events = [...counts, { key: 'events', input: {} }];
    expect(expectedAt(root, events)).toBe('a whole number');
    const estimate = [...steps('topic', 'outcomes', 0, 'effects', 0, 'effect'), { key: 'estimate', input: { measure: 'rr' } }];
    expect(expectedAt(root, estimate)).toBe('a number');
  });

  it('has nothing to say for a path the schema does not have', () => {
    expect(expectedAt(root, steps('topic', 'colour'))).toBeNull();
    expect(schemasAt(root, steps('nowhere', 'at', 'all'))).toEqual([]);
  });

  it('reads records and unions of its own schemas', () => {
    const schema = v.object({
      byId: v.record(v.string(), v.union([v.literal(1), v.literal(2), v.literal(3)])),
    }) as unknown as SchemaNode;
    expect(expectedAt(schema, steps('byId'))).toBe('a group of fields');
    expect(expectedAt(schema, steps('byId', 'any'))).toBe('one of 1, 2 or 3');
  });
});

describe('describeReceived', () => {
  it.each([
    [undefined, 'nothing'],
    [null, 'null'],
    [[1, 2], 'a list'],
    [{ a: 1 }, 'a group of fields'],
    ['10', 'the text "10"'],
    [1.5, 'the number 1.5'],
    [Number.POSITIVE_INFINITY, 'a number too large to use'],
    [true, 'the value true'],
  ])('words %j as %s', (value, words) => {
    expect(describeReceived(value)).toBe(words);
  });

  it('shortens long text to 30 characters', () => {
    expect(describeReceived('a'.repeat(40))).toBe(`the text "${'a'.repeat(30)}…"`);
  });
});
