import { describe, expect, test } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { effectKey, fieldId, fieldKeyForPath, fieldOrder, fieldPlace, outcomeKey } from '../../../src/ui/draft/field-keys.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
// Options: as-now (comparison), water, citrate. Outcomes: stone, night, stomach.
const draft = draftFromTopic(first.topic);

describe('fieldKeyForPath', () => {
  test.each([
    ['title', 'title'],
    ['periodYears', 'periodYears'],
    ['options', 'options'],
    ['options.2.name', 'options.citrate.name'],
    ['outcomes.0.baseline.risk', outcomeKey('stone', 'baseline.risk')],
    ['outcomes.1.baseline.periodYears', outcomeKey('night', 'baseline.periodYears')],
    ['outcomes.2.name', outcomeKey('stomach', 'name')],
    ['outcomes.2.effects', outcomeKey('stomach', 'effects')],
    ['outcomes.1.effects.0.effect.estimate', effectKey('night', 'water', 'estimate')],
    ['outcomes.1.effects.1.effect.upper', effectKey('night', 'citrate', 'upper')],
    ['outcomes.0.effects.1.effect.interval', effectKey('stone', 'citrate', 'interval')],
    ['outcomes.0.effects.0.followUpYears', effectKey('stone', 'water', 'followUpYears')],
    ['outcomes.0.effects.0.effect.intervention', effectKey('stone', 'water', 'intervention')],
    ['outcomes.0.effects.0.effect.comparison.total', effectKey('stone', 'water', 'comparison.total')],
    ['outcomes.0.effects.0.effect.period', outcomeKey('stone', 'baseline.periodYears')],
    ['outcomes.0.effects.0.effect.baseline', outcomeKey('stone', 'baseline.risk')],
    ['outcomes.0.effects.0.effect.level', effectKey('stone', 'water')],
    ['outcomes.0.effects.1.optionId', effectKey('stone', 'citrate')],
  ])('maps the core field %s to the editor field %s', (path, key) => {
    expect(fieldKeyForPath(path, draft)).toBe(key);
  });

  test('skips the comparison when counting effects: effect 0 belongs to the first other option', () => {
    const swapped = { ...draft, options: draft.options.map((option) => ({ ...option, isComparison: option.id === 'water' })) };
    expect(fieldKeyForPath('outcomes.0.effects.0.effect.estimate', swapped)).toBe(effectKey('stone', 'as-now', 'estimate'));
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
    expect(fieldId('outcomes.stone.baseline.risk')).toMatch(/^field-[A-Za-z0-9-]+$/);
  });

  test('differs for keys that only differ in punctuation', () => {
    expect(fieldId('outcomes.a.b')).not.toBe(fieldId('outcomes.a-b'));
  });
});

describe('fieldOrder', () => {
  test('lists the fields top to bottom: the decision, the options, then each outcome with its effects', () => {
    const order = fieldOrder(draft);
    const at = (key: string) => order.indexOf(key);
    expect(order.slice(0, 3)).toEqual(['title', 'population', 'periodYears']);
    expect(at('options.citrate.name')).toBeLessThan(at(outcomeKey('stone', 'name')));
    expect(at(outcomeKey('stone', 'baseline.risk'))).toBeLessThan(at(effectKey('stone', 'water', 'estimate')));
    expect(at(effectKey('stone', 'citrate', 'source'))).toBeLessThan(at(outcomeKey('night', 'name')));
    expect(at(effectKey('stone', 'as-now', 'estimate'))).toBe(-1);
  });
});

describe('fieldPlace', () => {
  test('names where a field is, for a list of problems', () => {
    expect(fieldPlace('options.citrate.name', draft)).toBe('Option 3');
    expect(fieldPlace(outcomeKey('night', 'baseline.risk'), draft)).toBe('broken sleep from passing urine at night');
    expect(fieldPlace(effectKey('stomach', 'water', 'estimate'), draft)).toBe(
      'an upset stomach bad enough to stop, effect of extra water each day',
    );
    expect(fieldPlace('title', draft)).toBeNull();
  });

  test('falls back to a number for what has no name yet', () => {
    const unnamed = {
      ...draft,
      outcomes: draft.outcomes.map((outcome, index) => (index === 1 ? { ...outcome, name: ' ' } : outcome)),
    };
    expect(fieldPlace(outcomeKey('night', 'name'), unnamed)).toBe('Outcome 2');
  });
});
