import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { handoutMessagesEn } from '../../src/handout/messages/en.ts';
import { mainHarms, valuesPrompt } from '../../src/handout/values-prompt.ts';
import { harmOutweighsTopic } from './harm-outweighs-topic.ts';
import { demos } from './support.ts';
import { wantedTopic } from './wanted-topic.ts';

// Values clarification: the prompt sets the benefit against the harms in the patient's own terms
// (IPDAS, Elwyn et al. 2006, BMJ 333:417, "clarifying and expressing values"); a wanted event is a
// chance to gain, never a risk to avoid (common practice in risk communication).
describe('the values prompt', () => {
  const result = computeTopic(harmOutweighsTopic());
  const headline = result.outcomes[0];
  if (headline === undefined) throw new Error('fixture');

  it('names the benefit to avoid and the side effect', () => {
    expect(valuesPrompt(result, headline, handoutMessagesEn)).toBe(
      'How much does avoiding a stroke matter to you? Weigh it against the chance of serious bleeding. Write it here to talk about.',
    );
  });

  it('speaks of a better chance for a wanted benefit', () => {
    const wanted = computeTopic(wantedTopic());
    const first = wanted.outcomes[0];
    if (first === undefined) throw new Error('fixture');
    const prompt = valuesPrompt(wanted, first, handoutMessagesEn);
    expect(prompt).toBe(
      'How much does a better chance of pain gone by day 3 matter to you? Weigh it against the chance of an upset stomach. Write it here to talk about.',
    );
    expect(prompt).not.toMatch(/avoid/);
  });

  it('asks about what the options ask of the patient when there are no side effects', () => {
    const topic = harmOutweighsTopic();
    const single = { ...topic, outcomes: topic.outcomes.filter((outcome) => outcome.kind === 'benefit') };
    const alone = computeTopic(single);
    const first = alone.outcomes[0];
    if (first === undefined) throw new Error('fixture');
    expect(valuesPrompt(alone, first, handoutMessagesEn)).toBe(
      'How much does avoiding a stroke matter to you? Weigh it against what each option asks of you. Write it here to talk about.',
    );
  });

  // Kidney demo: broken sleep 15% → 24% with extra water (9 more in 100); an upset stomach 5% → 12%
  // with the citrate drink (7 more): the two are named, the one adding most people first.
  it('names at most two side effects, those adding the most people first', () => {
    const kidney = demos()[0];
    if (kidney === undefined) throw new Error('no demo');
    expect(mainHarms(kidney.result).map((outcome) => outcome.outcomeId)).toEqual(['night', 'stomach']);
    const topic = kidney.topic;
    const three = {
      ...topic,
      outcomes: [
        ...topic.outcomes,
        {
          ...topic.outcomes[2]!,
          id: 'third',
          name: 'a third side effect',
          baseline: { ...topic.outcomes[2]!.baseline, risk: '1%' },
        },
      ],
    };
    expect(mainHarms(computeTopic(three)).map((outcome) => outcome.outcomeId)).toEqual(['night', 'stomach']);
  });
});
