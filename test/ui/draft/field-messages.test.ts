import { describe, expect, test } from 'vitest';
import { writeTopicFile } from '../../../src/core/topic/topic-file.ts';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { setEffectField, setOutcomeText } from '../../../src/ui/draft/draft-edits.ts';
import { effectKey } from '../../../src/ui/draft/field-keys.ts';
import { intervalMarks } from '../../../src/ui/draft/interval-marks.ts';
import type { TopicDraft } from '../../../src/ui/draft/topic-draft.ts';
import { openTopicText } from '../../../src/ui/files/topic-files.ts';
import { RARE, effectTopic } from '../results/effect-topic.ts';

// Invented topics; the rule checked is the editor's own: limits in the wrong order are refused
// and both boxes marked, every message quotes the numbers as they were typed.

const base = draftFromTopic(RARE);
const edit = (field: Parameters<typeof setEffectField>[3], value: string, draft: TopicDraft = base) =>
  setEffectField(draft, 'bleed', 'tablet', field, value as never);
const intervalKey = effectKey('bleed', 'tablet', 'interval');
const messagesAt = (draft: TopicDraft, key: string) =>
  checkDraft(draft)
    .problems.filter((found) => found.key === key)
    .map((found) => found.message);

describe('the editor’s messages for an interval', () => {
  test('say which limit is which when they are the wrong way round, with the numbers as typed', () => {
    const draft = edit('upper', '0.7', edit('lower', '0.9'));
    expect(messagesAt(draft, intervalKey)).toEqual([
      'The limits are the wrong way round: the lower limit, 0.9, is above the upper limit, 0.7. Put 0.7 in the lower box (the first) and 0.9 in the upper box (the second).',
    ]);
  });

  test('quote an absolute reduction in the percentage points typed, not as a proportion', () => {
    let draft = edit('measure', 'arr');
    draft = edit('estimate', '0.02', draft);
    draft = edit('lower', '0.05', draft);
    draft = edit('upper', '-0.01', draft);
    const [message] = messagesAt(draft, intervalKey);
    expect(message).toContain('the lower limit, 0.05, is above the upper limit, -0.01');
    expect(message).not.toContain('0.0005');
  });

  test('ask for both boxes, in words, when one limit is missing', () => {
    const [message] = messagesAt(edit('upper', ''), intervalKey);
    expect(message).toBe('The interval needs both limits: fill in both boxes, for example 0.6 and 0.9, or leave both empty.');
    expect(message).not.toContain('0.6,0.9');
  });

  test('say that the interval leaves out the estimate', () => {
    expect(messagesAt(edit('estimate', '0.95'), intervalKey)).toEqual([
      'The interval 0.7 to 0.9 does not contain the estimate 0.95. The estimate lies between the lower and the upper limit: check all three numbers.',
    ]);
  });
});

describe('the editor’s messages for trial counts and periods', () => {
  test('name the two boxes of an arm, not events/total', () => {
    let draft = edit('measure', 'counts');
    draft = edit('interventionEvents', '12', draft);
    draft = edit('interventionTotal', '10', draft);
    draft = edit('comparisonEvents', '5', draft);
    draft = edit('comparisonTotal', '100', draft);
    const [message] = messagesAt(draft, effectKey('bleed', 'tablet', 'intervention'));
    expect(message).toBe(
      'More people had the outcome (12) than were in the arm (10). Put the people with the outcome in the first box and everyone in the arm in the second, for example 12 of 100.',
    );
  });

  test('quote a period too long in the unit it was typed in', () => {
    const draft = setOutcomeText(base, 'bleed', 'baselinePeriodYears', '6000');
    const weeks = { ...draft, outcomes: draft.outcomes.map((outcome) => ({ ...outcome, baselinePeriodUnit: 'weeks' as const })) };
    expect(messagesAt(weeks, 'outcomes.bleed.baseline.periodYears')).toEqual([
      'A period of “6000” weeks is too long: write at most 100 years.',
    ]);
  });
});

describe('a saved file with reversed limits', () => {
  const reversed = effectTopic({ baseline: 0.001, effect: { measure: 'hr', estimate: 0.8, lower: 0.9, upper: 0.7 } });

  test('still opens, with the limits as they were written', () => {
    const opened = openTopicText('reversed.cwtopic', writeTopicFile(reversed, { includePatient: false }));
    if (!opened.ok) throw new Error(opened.message);
    const effect = opened.draft.outcomes[0]?.effects[0];
    expect([effect?.lower, effect?.upper]).toEqual(['0.9', '0.7']);
  });

  test('has its results withheld and its problem on the interval, which marks both boxes', () => {
    const opened = openTopicText('reversed.cwtopic', writeTopicFile(reversed, { includePatient: false }));
    if (!opened.ok) throw new Error(opened.message);
    const check = checkDraft(opened.draft);
    expect(check.result).toBeNull();
    expect(check.savable).toBe(true);
    expect(check.problems.map((found) => [found.key, found.problem.code])).toEqual([[intervalKey, 'interval-reversed']]);
    expect(intervalMarks(check.problems, opened.draft.outcomes[0]!.effects[0]!)).toEqual({ lower: true, upper: true });
  });
});

describe('which interval boxes a problem marks', () => {
  const check = (draft: TopicDraft) => checkDraft(draft).problems.filter((found) => found.key === intervalKey);
  test('a missing limit marks only its empty box', () => {
    const draft = edit('upper', '');
    expect(intervalMarks(check(draft), draft.outcomes[0]!.effects[0]!)).toEqual({ lower: false, upper: true });
  });

  test('an interval that leaves out the estimate marks both', () => {
    const draft = edit('estimate', '0.95');
    expect(intervalMarks(check(draft), draft.outcomes[0]!.effects[0]!)).toEqual({ lower: true, upper: true });
  });

  test('a valid interval marks neither', () => {
    expect(intervalMarks(check(base), base.outcomes[0]!.effects[0]!)).toEqual({ lower: false, upper: false });
  });
});
