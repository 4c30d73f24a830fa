import { describe, expect, test } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { effectKey, fieldId, fieldKeyForPath, outcomeKey } from '../../../src/ui/draft/field-keys.ts';
import { DEMO_TOPICS } from '../../../src/ui/state/demo-topics.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
// Options: none (comparison), standard, higher. Outcomes: heart-stroke, muscle, diabetes.
const draft = draftFromTopic(first.topic);

describe('fieldKeyForPath', () => {
  test.each([
    ['title', 'title'],
    ['periodYears', 'periodYears'],
    ['options', 'options'],
    ['options.2.name', 'options.higher.name'],
    ['outcomes.0.baseline.risk', outcomeKey('heart-stroke', 'baseline.risk')],
    ['outcomes.1.baseline.periodYears', outcomeKey('muscle', 'baseline.periodYears')],
    ['outcomes.2.name', outcomeKey('diabetes', 'name')],
    ['outcomes.2.effects', outcomeKey('diabetes', 'effects')],
    ['outcomes.1.effects.0.effect.estimate', effectKey('muscle', 'standard', 'estimate')],
    ['outcomes.1.effects.1.effect.upper', effectKey('muscle', 'higher', 'upper')],
    ['outcomes.0.effects.1.effect.interval', effectKey('heart-stroke', 'higher', 'interval')],
    ['outcomes.0.effects.0.followUpYears', effectKey('heart-stroke', 'standard', 'followUpYears')],
    ['outcomes.0.effects.0.effect.intervention', effectKey('heart-stroke', 'standard', 'intervention')],
    ['outcomes.0.effects.0.effect.comparison.total', effectKey('heart-stroke', 'standard', 'comparison.total')],
    ['outcomes.0.effects.0.effect.period', outcomeKey('heart-stroke', 'baseline.periodYears')],
    ['outcomes.0.effects.0.effect.baseline', outcomeKey('heart-stroke', 'baseline.risk')],
    ['outcomes.0.effects.0.effect.level', effectKey('heart-stroke', 'standard')],
    ['outcomes.0.effects.1.optionId', effectKey('heart-stroke', 'higher')],
  ])('maps the core field %s to the editor field %s', (path, key) => {
    expect(fieldKeyForPath(path, draft)).toBe(key);
  });

  test('skips the comparison when counting effects: effect 0 belongs to the first other option', () => {
    const swapped = { ...draft, options: draft.options.map((option) => ({ ...option, isComparison: option.id === 'standard' })) };
    expect(fieldKeyForPath('outcomes.0.effects.0.effect.estimate', swapped)).toBe(effectKey('heart-stroke', 'none', 'estimate'));
  });

  test('maps a question of the topic to its place in the draft', () => {
    expect(fieldKeyForPath('questions.0', draft, [2])).toBe('questions.2');
  });

  test('returns null for a path that belongs to no field', () => {
    expect(fieldKeyForPath('outcomes.9.name', draft)).toBeNull();
    expect(fieldKeyForPath('(file)', draft)).toBeNull();
  });
});

describe('fieldId', () => {
  test('is a valid element id made of letters, digits and dashes', () => {
    expect(fieldId('outcomes.heart-stroke.baseline.risk')).toMatch(/^field-[A-Za-z0-9-]+$/);
  });

  test('differs for keys that only differ in punctuation', () => {
    expect(fieldId('outcomes.a.b')).not.toBe(fieldId('outcomes.a-b'));
  });
});
