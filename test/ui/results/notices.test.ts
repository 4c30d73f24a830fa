import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { draftFromTopic } from '../../../src/ui/draft/draft-from-topic.ts';
import { resultWarnings } from '../../../src/ui/results/notices.ts';
import { patientTextsKey, readingNoticesFor } from '../../../src/ui/results/reading-notices.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

const demo = DEMO_TOPICS[0]!;
const draft = draftFromTopic(demo.topic);

describe('warnings on the typed texts', () => {
  test('the texts key stays the same when only a number changes, and changes with the texts', () => {
    const outcome = draft.outcomes[0]!;
    const numberChanged = { ...draft, outcomes: [{ ...outcome, baselineRisk: '20%' }, ...draft.outcomes.slice(1)] };
    expect(patientTextsKey(numberChanged)).toBe(patientTextsKey(draft));
    expect(patientTextsKey({ ...draft, title: `${draft.title} today` })).not.toBe(patientTextsKey(draft));
  });

  test('a decision worded above the handout grade gets a warning naming the decision; a plain one does not', () => {
    // Flesch–Kincaid grade 0.39 × words/sentences + 11.8 × syllables/words − 15.59 (Kincaid et al. 1975):
    // one 30-word sentence of long words lands far above grade 8; "Take a tablet each day." far below.
    const hard =
      'Considering pharmacological cardiovascular prophylaxis necessitates individualised evaluation of comparative therapeutic effectiveness, ' +
      'anticipated adverse consequences, concomitant medications, and personal preferences regarding continuous medication administration indefinitely';
    const aboutDecision = (title: string) =>
      readingNoticesFor(patientTextsKey({ ...draft, title })).filter((notice) => notice.values?.['field'] === 'the decision');
    expect(aboutDecision('Take a tablet each day.')).toEqual([]);
    const notices = aboutDecision(hard);
    expect(notices.length).toBe(1);
    const sentences = resultWarnings(computeTopic(demo.topic), notices);
    expect(sentences.some((sentence) => sentence.includes('the decision'))).toBe(true);
  });

  test('repeated warnings are shown once', () => {
    const result = computeTopic(demo.topic);
    const hardKey = patientTextsKey({
      ...draft,
      title: 'Pharmacological cardiovascular prophylaxis necessitates individualised evaluation considerations.',
    });
    const notices = readingNoticesFor(hardKey);
    expect(resultWarnings(result, [...notices, ...notices])).toEqual(resultWarnings(result, notices));
  });
});
