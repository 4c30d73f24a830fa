import { describe, expect, test } from 'vitest';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setEffectField, setHandoutChoice, setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { topicFromDraft } from '../../../src/ui/draft/topic-from-draft.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
const draft = draftFromTopic(first.topic);

describe('topicFromDraft', () => {
  test.each(DEMO_TOPICS.map((demo) => [demo.fileName, demo]))(
    'gives back the very topic a draft was made from (%s)',
    (_, demo) => {
      const reading = topicFromDraft(draftFromTopic(demo.topic));
      expect(reading.problems).toEqual([]);
      expect(reading.topic).toEqual({ ...demo.topic, patient: demo.topic.patient ?? null });
    },
  );

  test('reads an absolute reduction typed in percentage points as a proportion', () => {
    const edited = setEffectField(setEffectField(draft, 'stone', 'water', 'measure', 'arr'), 'stone', 'water', 'estimate', '3');
    const cleared = setEffectField(setEffectField(edited, 'stone', 'water', 'lower', '1.5%'), 'stone', 'water', 'upper', '4.5');
    const effect = topicFromDraft(cleared).topic.outcomes[0]?.effects[0]?.effect;
    expect(effect?.measure).toBe('arr');
    if (effect === undefined || effect.measure === 'counts') throw new Error('expected an entered effect');
    expect(effect.estimate).toBeCloseTo(0.03, 12);
    expect(effect.lower).toBeCloseTo(0.015, 12);
    expect(effect.upper).toBeCloseTo(0.045, 12);
  });

  test('keeps the text of an unreadable number and reports it at its own field', () => {
    const edited = setEffectField(draft, 'night', 'citrate', 'estimate', '1,4');
    const reading = topicFromDraft(edited);
    expect(reading.problems).toEqual([
      { code: 'number-unparsable', field: 'outcomes.1.effects.1.effect.estimate', values: { input: '1,4' } },
    ]);
    // The typed text stays in the draft; only the topic carries a stand-in.
    expect(edited.outcomes[1]?.effects[1]?.estimate).toBe('1,4');
  });

  test('names an empty number as missing, with an example of what to write', () => {
    const reading = topicFromDraft(setTopicText(draft, 'periodYears', '  '));
    expect(reading.problems).toEqual([
      { code: 'number-missing', field: 'periodYears', values: { what: 'period', example: '10' } },
    ]);
  });

  test('checks trial arms and reports them at the arm of the effect', () => {
    let edited = setEffectField(draft, 'stone', 'water', 'measure', 'counts');
    edited = setEffectField(edited, 'stone', 'water', 'interventionEvents', '120');
    edited = setEffectField(edited, 'stone', 'water', 'interventionTotal', '100');
    edited = setEffectField(edited, 'stone', 'water', 'comparisonEvents', '15');
    edited = setEffectField(edited, 'stone', 'water', 'comparisonTotal', '100');
    expect(topicFromDraft(edited).problems).toEqual([
      { code: 'counts-events-above-total', field: 'outcomes.0.effects.0.effect.intervention', values: { input: '120/100' } },
    ]);
  });

  test('leaves blank questions out and remembers where the others were', () => {
    const edited = { ...draft, questions: ['', 'What matters most to me?', ' '] };
    const reading = topicFromDraft(edited);
    expect(reading.topic.questions).toEqual(['What matters most to me?']);
    expect(reading.questionPlaces).toEqual([1]);
  });

  test('gives the topic a patient only when a name or reference was typed', () => {
    expect(topicFromDraft(draft).topic.patient).toBeNull();
    expect(topicFromDraft({ ...draft, patientReference: 'A-12' }).topic.patient).toEqual({ name: '', reference: 'A-12' });
  });
});

describe('the handout’s choices in a draft', () => {
  const stone = DEMO_TOPICS[0];
  if (stone === undefined) throw new Error('no demonstration topic');

  test('a topic without stored choices gets the defaults, and none are written back', () => {
    const draft = draftFromTopic(stone.topic);
    expect(draft.handout).toEqual({ showNnt: false, per: null, outline: false, paper: 'a4' });
    expect(topicFromDraft(draft).topic.handout).toBeUndefined();
  });

  test('changed choices go into the topic, and come back from it', () => {
    const draft = setHandoutChoice(setHandoutChoice(draftFromTopic(stone.topic), 'paper', 'letter'), 'outline', true);
    const topic = topicFromDraft(draft).topic;
    expect(topic.handout).toEqual({ showNnt: false, per: null, outline: true, paper: 'letter' });
    expect(draftFromTopic(topic).handout).toEqual(topic.handout);
  });

  test('setting a choice to what it already is changes nothing', () => {
    const draft = draftFromTopic(stone.topic);
    expect(setHandoutChoice(draft, 'showNnt', false)).toBe(draft);
  });
});
