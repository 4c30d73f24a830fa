import { describe, expect, test } from 'vitest';
import { TOPIC_LIMITS } from '../../../src/core/topic/topic.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import {
  addOption,
  addOutcome,
  addQuestion,
  blankDraft,
  moveOption,
  removeOption,
  removeOutcome,
  setComparison,
  setEffectField,
  setBaselineUnit,
  setHeadline,
  setOutcomeText,
  setOutcomeWanted,
  setPeriodUnit,
  setTopicText,
} from '../../../src/ui/draft/draft-edits.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
const demo = draftFromTopic(first.topic);

describe('draft edits', () => {
  test('addOption adds an option with a blank effect on every outcome, up to the limit', () => {
    const once = addOption(demo);
    expect(once.optionId).toBe('option-1');
    expect(once.draft.options).toHaveLength(4);
    expect(once.draft.outcomes.every((outcome) => outcome.effects.some((entry) => entry.optionId === 'option-1'))).toBe(true);
    const again = addOption(once.draft);
    expect(again.optionId).toBeNull();
    expect(again.draft.options).toHaveLength(TOPIC_LIMITS.maxOptions);
  });

  test('removeOption keeps at least the minimum and passes the comparison on', () => {
    const removed = removeOption(demo, 'as-now');
    expect(removed.options.map((option) => [option.id, option.isComparison])).toEqual([
      ['water', true],
      ['citrate', false],
    ]);
    expect(removeOption(removed, 'water')).toBe(removed);
    expect(removed.options).toHaveLength(TOPIC_LIMITS.minOptions);
  });

  test('setComparison keeps what was typed for the old comparison’s effects', () => {
    const typed = setEffectField(demo, 'night', 'citrate', 'estimate', '1.45');
    const swapped = setComparison(setComparison(typed, 'citrate'), 'as-now');
    expect(swapped.outcomes[1]?.effects.find((entry) => entry.optionId === 'citrate')?.estimate).toBe('1.45');
  });

  test('moveOption moves an option by one place and not past either end', () => {
    expect(moveOption(demo, 'citrate', -1).options.map((option) => option.id)).toEqual(['as-now', 'citrate', 'water']);
    expect(moveOption(demo, 'as-now', -1)).toBe(demo);
  });

  test('addOutcome adds up to the outcome limit over the topic’s period', () => {
    let draft = blankDraft();
    for (let count = 1; count < TOPIC_LIMITS.maxOutcomes; count += 1) draft = addOutcome(draft, 'harm').draft;
    expect(draft.outcomes).toHaveLength(TOPIC_LIMITS.maxOutcomes);
    expect(draft.outcomes[1]?.baselinePeriodYears).toBe(draft.periodYears);
    expect(addOutcome(draft, 'benefit').outcomeId).toBeNull();
  });

  test('removeOutcome keeps one outcome and passes the headline on', () => {
    const removed = removeOutcome(demo, 'stone');
    expect(removed.outcomes.map((outcome) => [outcome.id, outcome.isHeadline])).toEqual([
      ['night', true],
      ['stomach', false],
    ]);
    const single = removeOutcome(removeOutcome(removed, 'night'), 'stomach');
    expect(single.outcomes).toHaveLength(TOPIC_LIMITS.minOutcomes);
  });

  test('setHeadline marks exactly one outcome', () => {
    expect(setHeadline(demo, 'stomach').outcomes.map((outcome) => outcome.isHeadline)).toEqual([false, false, true]);
  });

  test('addQuestion stops at the question limit', () => {
    let draft = blankDraft();
    for (let count = 0; count < TOPIC_LIMITS.maxQuestions + 2; count += 1) draft = addQuestion(draft);
    expect(draft.questions).toHaveLength(TOPIC_LIMITS.maxQuestions);
  });

  test('a unit changes only the unit: the amount typed stays, for the topic and for one baseline', () => {
    const days = setPeriodUnit(setTopicText(demo, 'periodYears', '3'), 'days');
    expect([days.periodYears, days.periodUnit]).toEqual(['3', 'days']);
    const outcomeId = demo.outcomes[1]!.id;
    const weeks = setBaselineUnit(days, outcomeId, 'weeks');
    expect(weeks.outcomes[1]?.baselinePeriodUnit).toBe('weeks');
    expect(weeks.outcomes[1]?.baselinePeriodYears).toBe(demo.outcomes[1]?.baselinePeriodYears);
    expect(weeks.outcomes[0]?.baselinePeriodUnit).toBe('years');
  });

  test('a new outcome is an event to avoid, over the topic’s period in its unit', () => {
    const days = setPeriodUnit(setTopicText(demo, 'periodYears', '3'), 'days');
    const added = addOutcome(days, 'harm');
    const outcome = added.draft.outcomes.find((found) => found.id === added.outcomeId);
    expect(outcome).toMatchObject({ wanted: false, baselinePeriodYears: '3', baselinePeriodUnit: 'days' });
  });

  test('setOutcomeWanted marks one outcome’s event as wanted and back, leaving the others', () => {
    const outcomeId = demo.outcomes[0]!.id;
    const wanted = setOutcomeWanted(demo, outcomeId, true);
    expect(wanted.outcomes.map((outcome) => outcome.wanted)).toEqual([true, false, false]);
    expect(setOutcomeWanted(wanted, outcomeId, false).outcomes.map((outcome) => outcome.wanted)).toEqual([false, false, false]);
  });

  test('an effect can be marked as given for the opposite event and its follow-up given in months', () => {
    const outcomeId = demo.outcomes[0]!.id;
    const optionId = demo.outcomes[0]!.effects[0]!.optionId;
    const edited = setEffectField(
      setEffectField(demo, outcomeId, optionId, 'opposite', true),
      outcomeId,
      optionId,
      'followUpUnit',
      'months',
    );
    expect(edited.outcomes[0]?.effects[0]).toMatchObject({ opposite: true, followUpUnit: 'months' });
    expect(edited.outcomes[0]?.effects[1]).toMatchObject({ opposite: false, followUpUnit: 'years' });
  });

  describe('periods that follow the topic', () => {
    // A risk is only meaningful with the period it was given over (common practice), so a typed
    // baseline keeps its period; an effect's follow-up is what the trial measured and never follows.
    test('a baseline with no risk typed takes up the topic’s new period and unit', () => {
      const blank = blankDraft();
      const oneYear = setTopicText(blank, 'periodYears', '1');
      expect(oneYear.outcomes[0]).toMatchObject({ baselinePeriodYears: '1', baselinePeriodUnit: 'years' });
      const sixMonths = setPeriodUnit(setTopicText(oneYear, 'periodYears', '6'), 'months');
      expect(sixMonths.outcomes[0]).toMatchObject({ baselinePeriodYears: '6', baselinePeriodUnit: 'months' });
    });

    test('once a risk is typed, its period stays when the topic’s period changes', () => {
      const typed = setOutcomeText(blankDraft(), 'outcome-1', 'baselineRisk', '25%');
      const oneYear = setPeriodUnit(setTopicText(typed, 'periodYears', '1'), 'weeks');
      expect(oneYear.outcomes[0]).toMatchObject({ baselineRisk: '25%', baselinePeriodYears: '10', baselinePeriodUnit: 'years' });
    });

    test('a risk cleared again makes its baseline follow from the next change of the topic’s period', () => {
      const typed = setOutcomeText(blankDraft(), 'outcome-1', 'baselineRisk', '25%');
      const cleared = setOutcomeText(typed, 'outcome-1', 'baselineRisk', ' ');
      expect(setTopicText(cleared, 'periodYears', '2').outcomes[0]?.baselinePeriodYears).toBe('2');
    });

    test('an effect’s follow-up starts empty and never follows the topic’s period', () => {
      const changed = setPeriodUnit(setTopicText(blankDraft(), 'periodYears', '3'), 'months');
      expect(changed.outcomes[0]?.effects.map((entry) => [entry.followUpYears, entry.followUpUnit])).toEqual([
        ['', 'years'],
        ['', 'years'],
      ]);
    });
  });
});
