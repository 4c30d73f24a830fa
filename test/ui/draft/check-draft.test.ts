import { describe, expect, test } from 'vitest';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { blankDraft, setEffectField, setOptionName, setOutcomeText, setTopicText } from '../../../src/ui/draft/draft-edits.ts';
import { effectKey, outcomeKey } from '../../../src/ui/draft/field-keys.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const first = DEMO_TOPICS[0];
if (first === undefined) throw new Error('no demonstration topic');
const demo = draftFromTopic(first.topic);

/** A one-outcome topic: risk ratio `ratio` at baseline risk `baseline`, over 10 years. */
function simpleDraft(baseline: string, ratio: string) {
  let draft = blankDraft();
  draft = setTopicText(draft, 'title', 'Taking a tablet');
  draft = setTopicText(draft, 'population', 'adults at raised risk');
  draft = setOptionName(draft, 'option-1', 'the tablet');
  draft = setOutcomeText(draft, 'outcome-1', 'name', 'a stroke');
  draft = setOutcomeText(draft, 'outcome-1', 'baselineRisk', baseline);
  return setEffectField(draft, 'outcome-1', 'option-1', 'estimate', ratio);
}

describe('checkDraft', () => {
  test('computes a valid draft with the core: RR 0.92 at a 30% control risk is 24 fewer per 1000 and NNT 42', () => {
    // Cochrane Handbook 5.1 (Higgins & Green 2011), §12.5.4.2: RR 0.92, assumed control risk 0.30.
    const check = checkDraft(simpleDraft('30%', '0.92'), { per: 1000 });
    expect(check.problems).toEqual([]);
    const option = check.result?.outcomes[0]?.options.find((entry) => !entry.isComparison);
    expect(option?.perPeople.difference).toBe(24);
    expect(option?.nnt.rounded).toBe(42);
  });

  test('gives no result and one problem beside the baseline for a risk of 150%', () => {
    const check = checkDraft(setOutcomeText(demo, 'stone', 'baselineRisk', '150%'));
    expect(check.result).toBeNull();
    expect(check.savable).toBe(true);
    expect(check.problems.map((found) => [found.key, found.problem.code])).toEqual([
      [outcomeKey('stone', 'baseline.risk'), 'risk-out-of-range'],
    ]);
    expect(check.problems[0]?.message).toContain('150%');
  });

  test('reports every problem at once, each at its own field, in the order the fields appear', () => {
    let draft = setTopicText(demo, 'title', '');
    draft = setEffectField(draft, 'night', 'water', 'estimate', 'abc');
    draft = setEffectField(draft, 'stomach', 'citrate', 'lower', '2.8');
    const check = checkDraft(draft);
    expect(check.savable).toBe(false);
    expect(check.problems.map((found) => [found.key, found.problem.code])).toEqual([
      ['title', 'topic-text-missing'],
      [effectKey('night', 'water', 'estimate'), 'number-unparsable'],
      [effectKey('stomach', 'citrate', 'interval'), 'interval-excludes-estimate'],
    ]);
  });

  test('does not repeat a problem the core finds again on the stand-in for an unreadable number', () => {
    const check = checkDraft(setTopicText(demo, 'periodYears', 'ten'));
    expect(check.problems.filter((found) => found.key === 'periodYears')).toHaveLength(1);
  });

  test('reports a trial arm with more events than people once, at that arm', () => {
    let draft = simpleDraft('', '');
    draft = setEffectField(draft, 'outcome-1', 'option-1', 'measure', 'counts');
    for (const [field, value] of [
      ['interventionEvents', '30'],
      ['interventionTotal', '20'],
      ['comparisonEvents', '5'],
      ['comparisonTotal', '20'],
    ] as const) {
      draft = setEffectField(draft, 'outcome-1', 'option-1', field, value);
    }
    const check = checkDraft(draft);
    expect(check.problems.map((found) => [found.key, found.problem.code])).toEqual([
      [effectKey('outcome-1', 'option-1', 'intervention'), 'counts-events-above-total'],
    ]);
  });

  test('uses the denominator asked for', () => {
    expect(checkDraft(demo, { per: 1000 }).result?.denominator).toBe(1000);
    expect(checkDraft(demo, { per: 100 }).result?.denominator).toBe(100);
  });
});
