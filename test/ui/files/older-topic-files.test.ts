import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { computeTopic } from '../../../src/core/topic/compute-topic.ts';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import type { TopicResult } from '../../../src/core/topic/topic-result.ts';
import { checkDraft } from '../../../src/ui/draft/check-draft.ts';
import { openTopicText, topicFileText } from '../../../src/ui/files/topic-files.ts';
import { keyNumberTables } from '../../../src/ui/results/key-numbers.ts';

const fixture = (name: string): string => readFileSync(new URL(`../../fixtures/topics/${name}`, import.meta.url), 'utf8');

/** The key numbers as rows of [option, people, change, NNT]. */
const rows = (result: TopicResult) =>
  keyNumberTables(result).map((table) => [
    table.outcomeId,
    table.rows.map((row) => [row.name, row.people.value, row.change?.value ?? null, row.nnt?.value ?? null]),
  ]);

/**
 * Expected numbers by hand. Baselines over another period follow a constant hazard,
 * 1 − (1 − p)^(t/T) (common practice); a risk ratio multiplies the risk and an odds ratio the
 * odds (Cochrane Handbook 5.1, Higgins & Green 2011, §12.5.4); NNT = 1/ARR, NNTB rounded up and
 * NNTH down (Altman 1998; rounding as the core documents it).
 */
const CASES = [
  {
    file: 'version-1-blood-pressure.json',
    version: 1,
    // 1 − 0.95^(5/10) = 2.532%, × 0.7 = 1.772%: 3 and 2 in 100, NNTB ⌈1/0.007596⌉ = 132.
    // 3% + 2 points = 5%: 3 and 5 in 100, NNTH ⌊1/0.02⌋ = 50.
    rows: [
      [
        'stroke',
        [
          ['no tablet', '3', null, null],
          ['the tablet', '2', '1 fewer', 'NNTB 132'],
        ],
      ],
      [
        'dizzy',
        [
          ['no tablet', '3', null, null],
          ['the tablet', '5', '2 more', 'NNTH 50'],
        ],
      ],
    ],
  },
  {
    file: 'version-2-knee-exercise.json',
    version: 2,
    // 1 − 0.8^(1/2) = 10.557%, × 0.75 = 7.918%: 11 and 8 in 100, NNTB ⌈1/0.026393⌉ = 38.
    // Odds 1/9 × 2 = 2/9, a risk of 2/11 = 18.18%: 10 and 18 in 100, NNTH ⌊1/0.081818⌋ = 12.
    rows: [
      [
        'fall',
        [
          ['no programme', '11', null, null],
          ['the exercise programme', '8', '3 fewer', 'NNTB 38'],
        ],
      ],
      [
        'sore',
        [
          ['no programme', '10', null, null],
          ['the exercise programme', '18', '8 more', 'NNTH 12'],
        ],
      ],
    ],
  },
] as const;

describe('older topic files', () => {
  test.each(CASES)('$file opens with every event to avoid and every period in years', ({ file }) => {
    const opened = openTopicText(file, fixture(file));
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.draft.periodUnit).toBe('years');
    expect(opened.draft.outcomes.map((outcome) => [outcome.wanted, outcome.baselinePeriodUnit])).toEqual([
      [false, 'years'],
      [false, 'years'],
    ]);
    expect(
      opened.draft.outcomes.flatMap((outcome) => outcome.effects.map((entry) => [entry.opposite, entry.followUpUnit])),
    ).toEqual([
      [false, 'years'],
      [false, 'years'],
    ]);
  });

  test.each(CASES)('$file gives the numbers worked out by hand', ({ file, rows: expected }) => {
    const opened = openTopicText(file, fixture(file));
    if (!opened.ok) throw new Error(opened.message);
    const check = checkDraft(opened.draft);
    if (check.result === null) throw new Error(check.problems.map((found) => found.message).join(' '));
    expect(check.result.denominator).toBe(100);
    expect(rows(check.result)).toEqual(expected);
  });

  test.each(CASES)('$file saved from the editor as version 4 gives identical results', ({ file }) => {
    const original = readTopicFile(fixture(file));
    if (!original.ok) throw new Error('fixture does not read');
    const opened = openTopicText(file, fixture(file));
    if (!opened.ok) throw new Error(opened.message);
    const saved = topicFileText(opened.draft, false);
    if (!saved.ok) throw new Error(saved.message);
    expect((JSON.parse(saved.text) as { version: number }).version).toBe(6);
    // Nothing of versions 3 to 6 is written for a topic that uses none of it.
    expect(saved.text).not.toMatch(
      /"wanted"|"periodUnit"|"followUpUnit"|"opposite"|"handout"|"about"|"screening"|"language"|"translation"/,
    );
    const again = readTopicFile(saved.text);
    if (!again.ok) throw new Error('saved file does not read');
    expect(computeTopic(again.topic)).toEqual(computeTopic(original.topic));
  });
});
