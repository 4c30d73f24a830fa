import { describe, expect, it } from 'vitest';
import type { Certainty, Importance } from '../../../src/core/topic/topic.ts';
import { sentenceOf, strokeTopic, topicFixture } from './result-fixture.ts';

// GRADE informative statements: Santesso N, Glenton C, Dahm P, et al. (2020). GRADE guidelines
// 26: informative statements to communicate the findings of systematic reviews of interventions.
// J Clin Epidemiol 119:126–135 (template as reproduced in the CDC ACIP GRADE Handbook, Chapter 11,
// Table 16; high and moderate rows seen there, low and very-low rows from memory). The "moderate
// effect" column for important effects and the "trivial or no effect" column for trivial ones.
describe('certaintySentence', () => {
  it.each<[Certainty, Importance, string]>([
    ['high', 'important', 'The tablet reduces the chance of a stroke.'],
    ['moderate', 'important', 'The tablet probably reduces the chance of a stroke.'],
    ['low', 'important', 'The tablet may reduce the chance of a stroke.'],
    ['very-low', 'important', 'The evidence is very uncertain about the effect of the tablet on the chance of a stroke.'],
    ['high', 'trivial', 'The tablet results in little or no difference to the chance of a stroke.'],
    ['moderate', 'trivial', 'The tablet probably results in little or no difference to the chance of a stroke.'],
    ['low', 'trivial', 'The tablet may result in little or no difference to the chance of a stroke.'],
    ['very-low', 'trivial', 'The evidence is very uncertain about the effect of the tablet on the chance of a stroke.'],
  ])('words %s certainty of a reduction of %s importance as "%s"', (certainty, importance, text) => {
    expect(sentenceOf(strokeTopic({ certainty, importance }), 'certainty')?.text).toBe(text);
  });

  it.each<[Certainty, string]>([
    ['high', 'The tablet increases the chance of muscle pain.'],
    ['moderate', 'The tablet probably increases the chance of muscle pain.'],
    ['low', 'The tablet may increase the chance of muscle pain.'],
    ['very-low', 'The evidence is very uncertain about the effect of the tablet on the chance of muscle pain.'],
  ])('words %s certainty of an important increase as "%s"', (certainty, text) => {
    const result = topicFixture([
      {
        name: 'muscle pain',
        kind: 'harm',
        comparison: 5,
        options: [{ id: 'tablet', name: 'the tablet', intervention: 8, certainty }],
      },
    ]);
    expect(sentenceOf(result, 'certainty')?.text).toBe(text);
  });

  it('uses the little-or-no-difference statement when the difference is exactly 0, whatever the importance', () => {
    const result = strokeTopic({ intervention: 15, interventionRisk: 0.15, certainty: 'moderate', importance: 'important' });
    expect(sentenceOf(result, 'certainty')?.text).toBe(
      'The tablet probably results in little or no difference to the chance of a stroke.',
    );
  });

  it('follows the exact difference when rounding hides it, so a small real effect is not called no difference', () => {
    // Santesso et al. 2020: "little or no difference" is for a trivial effect, which the clinician judges, not rounding.
    const result = strokeTopic({ intervention: 15, interventionRisk: 0.147, certainty: 'moderate', importance: 'important' });
    expect(sentenceOf(result, 'certainty')?.text).toBe('The tablet probably reduces the chance of a stroke.');
  });

  it('writes no statement when the result has no certainty, and none for the comparison', () => {
    expect(sentenceOf(strokeTopic({ certainty: null }), 'certainty')).toBeUndefined();
    expect(sentenceOf(strokeTopic(), 'certainty', 'none')).toBeUndefined();
  });

  it('has no numbers of its own', () => {
    expect(sentenceOf(strokeTopic(), 'certainty')?.numbers).toEqual({});
  });
});
