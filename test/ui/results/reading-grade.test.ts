import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readability } from '../../../src/core/wording/readability.ts';
import { handoutSentences } from '../../../src/core/wording/topic-wording.ts';
import { patientReadingGrade } from '../../../src/ui/results/reading-grade.ts';
import { DEMO_TOPICS } from '../state/demo-topics-read.ts';

describe('patientReadingGrade', () => {
  test.each(DEMO_TOPICS.map((demo) => [demo.fileName, demo]))(
    'equals the Flesch–Kincaid grade of the whole patient wording (%s)',
    (_, demo) => {
      // Flesch–Kincaid grade = 0.39 × words/sentences + 11.8 × syllables/words − 15.59 (Kincaid et al. 1975),
      // computed here once over the joined text, and by the app from per-sentence counts.
      const sentences = handoutSentences(computeTopic(demo.topic), { showNnt: false }).map((sentence) => sentence.text);
      const whole = readability(sentences.join(' ')).grade;
      expect(whole).not.toBeNull();
      expect(patientReadingGrade(sentences).grade).toBeCloseTo(Math.round((whole ?? 0) * 10) / 10, 10);
    },
  );
});
