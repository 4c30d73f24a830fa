import { describe, expect, test } from 'vitest';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { Topic } from '../../../src/core/topic/topic.ts';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import {
  blankDraft,
  setBaselineUnit,
  setEffectField,
  setOptionName,
  setOutcomeText,
  setOutcomeWanted,
  setPeriodUnit,
  setTopicText,
} from '../../../src/ui/draft/draft-edits.ts';
import { parseDraft } from '../../../src/ui/draft/draft-schema.ts';
import { topicFromDraft } from '../../../src/ui/draft/topic-from-draft.ts';
import type { TopicDraft } from '../../../src/ui/draft/topic-draft.ts';
import { openTopicText, topicFileText } from '../../../src/ui/files/topic-files.ts';

/** A filled-in draft: one option against none, one outcome, every period in years. */
function filled(): TopicDraft {
  let draft = blankDraft();
  draft = setTopicText(draft, 'title', 'Gargling salt water for a sore throat');
  draft = setTopicText(draft, 'population', 'adults with a sore throat');
  draft = setOptionName(draft, 'option-1', 'gargling');
  draft = setOutcomeText(draft, 'outcome-1', 'name', 'a pain-free throat');
  draft = setOutcomeText(draft, 'outcome-1', 'baselineRisk', '40%');
  draft = setEffectField(draft, 'outcome-1', 'option-1', 'estimate', '1.25');
  return draft;
}

/** The same draft over 3 days, its baseline over 2 weeks and its follow-up over 6 months. */
function inUnits(): TopicDraft {
  let draft = setPeriodUnit(setTopicText(filled(), 'periodYears', '3'), 'days');
  draft = setBaselineUnit(setOutcomeText(draft, 'outcome-1', 'baselinePeriodYears', '2'), 'outcome-1', 'weeks');
  draft = setEffectField(draft, 'outcome-1', 'option-1', 'followUpYears', '6');
  return setEffectField(draft, 'outcome-1', 'option-1', 'followUpUnit', 'months');
}

const outcomeOf = (topic: Topic) => {
  const found = topic.outcomes[0];
  if (found === undefined) throw new Error('no outcome');
  return found;
};

describe('periods typed in a unit', () => {
  test('are stored in years with their unit: a year is 365.25 days, a month a twelfth of a year', () => {
    // The Julian year of 365.25 days (IAU, as in the core's time units); a month as 1/12 year is common practice.
    const { topic, problems } = topicFromDraft(inUnits());
    expect(problems).toEqual([]);
    expect(topic.periodYears).toBe(3 / 365.25);
    expect(topic.periodUnit).toBe('days');
    const outcome = outcomeOf(topic);
    expect(outcome.baseline.periodYears).toBe(14 / 365.25);
    expect(outcome.baseline.periodUnit).toBe('weeks');
    expect(outcome.effects[0]?.followUpYears).toBe(0.5);
    expect(outcome.effects[0]?.followUpUnit).toBe('months');
  });

  test('come back into the editor as the amount that was typed, in its unit', () => {
    const again = draftFromTopic(topicFromDraft(inUnits()).topic);
    expect([again.periodYears, again.periodUnit]).toEqual(['3', 'days']);
    expect([again.outcomes[0]?.baselinePeriodYears, again.outcomes[0]?.baselinePeriodUnit]).toEqual(['2', 'weeks']);
    // The topic holds effects of the options other than the comparison only.
    expect([again.outcomes[0]?.effects[0]?.followUpYears, again.outcomes[0]?.effects[0]?.followUpUnit]).toEqual(['6', 'months']);
  });

  test('in years leave no unit in the topic, so a topic that uses none reads and writes as before', () => {
    const { topic } = topicFromDraft(filled());
    expect(topic).not.toHaveProperty('periodUnit');
    expect(outcomeOf(topic).baseline).not.toHaveProperty('periodUnit');
    expect(outcomeOf(topic).effects[0]).not.toHaveProperty('followUpUnit');
    expect(outcomeOf(topic)).not.toHaveProperty('wanted');
    expect(outcomeOf(topic).effects[0]?.effect).not.toHaveProperty('opposite');
  });

  test('keep a problem with the typed amount at the period field, whatever the unit', () => {
    const check = checkDraft(setTopicText(inUnits(), 'periodYears', 'three'));
    expect(check.problems.map((found) => [found.key, found.problem.code])).toContainEqual(['periodYears', 'number-unparsable']);
  });

  test('give the risk over the topic’s period under a constant hazard, as in years', () => {
    // Constant hazard: 1 − (1 − 0.4)^(3 days ÷ 14 days) (common practice; the core's period conversion).
    const check = checkDraft(inUnits(), { per: 100 });
    expect(check.result?.outcomes[0]?.baselineRisk).toBeCloseTo(1 - 0.6 ** (3 / 14), 12);
    expect(check.result?.periodUnit).toBe('days');
  });
});

describe('an outcome people want', () => {
  test('is written into the topic and gives NNTB when the option makes it more likely', () => {
    // 40% × 1.25 = 50%: 10 more in 100; NNT = 1/0.10 = 10 (Altman 1998), a benefit because the event is wanted.
    const check = checkDraft(setOutcomeWanted(filled(), 'outcome-1', true), { per: 100 });
    expect(outcomeOf(check.topic).wanted).toBe(true);
    const option = check.result?.outcomes[0]?.options.find((found) => !found.isComparison);
    expect(check.result?.outcomes[0]?.wanted).toBe(true);
    expect(option?.nnt.label).toBe('NNTB');
    expect(option?.nnt.text).toMatch(/^NNTB 10\b/);
  });

  test('is an event to avoid until the editor is told otherwise, so the same increase gives NNTH', () => {
    const check = checkDraft(filled(), { per: 100 });
    const option = check.result?.outcomes[0]?.options.find((found) => !found.isComparison);
    expect(check.result?.outcomes[0]?.wanted).toBe(false);
    expect(option?.nnt.label).toBe('NNTH');
  });
});

describe('an effect reported for the opposite event', () => {
  test('an odds ratio of 0.5 for not having it is an odds ratio of 2 for having it', () => {
    // The odds of the opposite event are the reciprocal odds (common practice): at 40%, odds 2/3 × 2 = 4/3, a risk of 4/7.
    let draft = setEffectField(filled(), 'outcome-1', 'option-1', 'measure', 'or');
    draft = setEffectField(
      setEffectField(draft, 'outcome-1', 'option-1', 'estimate', '0.5'),
      'outcome-1',
      'option-1',
      'opposite',
      true,
    );
    const check = checkDraft(draft, { per: 100 });
    expect(outcomeOf(check.topic).effects[0]?.effect).toMatchObject({ measure: 'or', estimate: 0.5, opposite: true });
    const option = check.result?.outcomes[0]?.options.find((found) => !found.isComparison);
    expect(option?.interventionRisk.estimate).toBeCloseTo(4 / 7, 12);
    expect(check.result?.notices.map((notice) => notice.code)).toContain('opposite-odds-ratio-inverted');
  });

  test('trial counts of the opposite event are turned into counts of the event', () => {
    // 30 of 100 still in pain with the option and 60 of 100 without: 70% and 40% have the wanted event.
    let draft = setEffectField(filled(), 'outcome-1', 'option-1', 'measure', 'counts');
    const counts = {
      interventionEvents: '30',
      interventionTotal: '100',
      comparisonEvents: '60',
      comparisonTotal: '100',
    } as const;
    for (const [field, value] of Object.entries(counts))
      draft = setEffectField(draft, 'outcome-1', 'option-1', field as keyof typeof counts, value);
    draft = setOutcomeText(setEffectField(draft, 'outcome-1', 'option-1', 'opposite', true), 'outcome-1', 'baselineRisk', '');
    const check = checkDraft(setOutcomeWanted(draft, 'outcome-1', true), { per: 100 });
    const option = check.result?.outcomes[0]?.options.find((found) => !found.isComparison);
    expect(option?.comparisonRisk.estimate).toBeCloseTo(0.4, 12);
    expect(option?.interventionRisk.estimate).toBeCloseTo(0.7, 12);
    expect(option?.nnt.label).toBe('NNTB');
  });
});

describe('saving and opening', () => {
  test('keeps units, wanted events and opposite-event effects through a file written and read again', () => {
    let draft = setOutcomeWanted(inUnits(), 'outcome-1', true);
    draft = setEffectField(draft, 'outcome-1', 'option-1', 'opposite', true);
    const saved = topicFileText(draft, false);
    if (!saved.ok) throw new Error(saved.message);
    const file = JSON.parse(saved.text) as {
      version: number;
      topic: { periodUnit: string; outcomes: { wanted: boolean; effects: { effect: { opposite: boolean } }[] }[] };
    };
    expect(file.version).toBe(6);
    expect(file.topic.periodUnit).toBe('days');
    expect(file.topic.outcomes[0]?.wanted).toBe(true);
    expect(file.topic.outcomes[0]?.effects[0]?.effect.opposite).toBe(true);
    const opened = openTopicText('throat.cwtopic', saved.text);
    if (!opened.ok) throw new Error(opened.message);
    // The blank draft's effect of the comparison is not a part of the topic, so it is not saved.
    const saveable = {
      ...draft,
      outcomes: draft.outcomes.map((outcome) => ({
        ...outcome,
        effects: outcome.effects.filter((entry) => entry.optionId !== 'comparison'),
      })),
    };
    expect(opened.draft).toEqual(saveable);
    const reading = readTopicFile(saved.text);
    expect(reading.ok && reading.topic).toEqual(topicFromDraft(draft).topic);
  });

  test('a draft kept in the browser before units and wanted events existed is read with their defaults', () => {
    const old = JSON.parse(JSON.stringify(filled())) as Record<string, unknown> & { outcomes: Record<string, unknown>[] };
    delete old.periodUnit;
    for (const outcome of old.outcomes) {
      delete outcome.wanted;
      delete outcome.baselinePeriodUnit;
      for (const entry of outcome.effects as Record<string, unknown>[]) {
        delete entry.opposite;
        delete entry.followUpUnit;
      }
    }
    expect(parseDraft(old)).toEqual(filled());
  });

  test('a stored draft with an unknown unit is refused rather than loaded half-way', () => {
    expect(parseDraft({ ...filled(), periodUnit: 'fortnights' })).toBeNull();
  });
});
