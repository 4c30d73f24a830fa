import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { handoutSentences } from '../../src/core/wording/topic-wording.ts';
import { type ContentOptions, handoutContent, headlineOutcome } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import { handoutMessagesEn } from '../../src/handout/messages/en.ts';
import { outcomeChart } from '../../src/render/chart-model.ts';
import { firstDemo } from './support.ts';

const options: ContentOptions = {
  date: '2026-12-01',
  appVersion: '0.1.0',
  showNnt: false,
  clinician: '',
  words: englishHandoutWords,
};

describe('the content of a handout', () => {
  const { topic, result } = firstDemo();
  const content = handoutContent(result, topic, options);
  const headline = headlineOutcome(result);
  const section = content.outcomes[0];
  if (section === undefined) throw new Error('no outcome section');
  const wording = handoutSentences(result, { showNnt: false }).filter((sentence) => sentence.outcomeId === headline.outcomeId);

  it('gives every outcome a section, the headline first, then side effects, one picture per option, the comparison first', () => {
    expect(content.outcomes.map((outcome) => outcome.outcomeId)).toEqual(['stone', 'night', 'stomach']);
    expect(section.pictures.model.arrays.map((array) => array.optionId)).toEqual(['as-now', 'water', 'citrate']);
    expect(content.titles).toEqual(['No change', 'Extra water each day', 'A citrate drink twice a day']);
    expect(content.outcomes.map((outcome) => outcome.heading)).toEqual([
      'Chance of another kidney stone over 5 years',
      'Side effect: chance of broken sleep from passing urine at night over 5 years',
      'Side effect: chance of an upset stomach bad enough to stop over 5 years',
    ]);
  });

  it('leaves the pictures themselves unchanged: the same people in the same places as the chart', () => {
    for (const outcome of content.outcomes) {
      const chart = outcomeChart(result, outcome.outcomeId);
      expect(outcome.pictures.model.arrays.map((array) => array.layout)).toEqual(chart.arrays.map((array) => array.layout));
      expect(outcome.pictures.model.arrays.every((array) => array.title === '' && array.labels.length === 0)).toBe(true);
      // Every outcome's pictures are of the same number of people.
      expect(outcome.pictures.model.denominator).toBe(result.denominator);
    }
  });

  it('captions each picture with its option’s two frames from the wording, in the pictures’ order', () => {
    section.pictures.model.arrays.forEach((array, index) => {
      const frames = wording.filter((sentence) => sentence.optionId === array.optionId && sentence.kind.endsWith('frame'));
      expect(frames.map((sentence) => sentence.kind)).toEqual(['event-frame', 'free-frame']);
      expect(section.pictures.captions[index]).toBe(frames.map((sentence) => sentence.text).join(' '));
    });
  });

  it('states in each caption the counts the picture draws, for side effects as for the benefit', () => {
    for (const outcome of content.outcomes) {
      outcome.pictures.model.arrays.forEach((array, index) => {
        const having = array.groups.event + array.groups.caused;
        const caption = outcome.pictures.captions[index] ?? '';
        expect(caption).toContain(`about ${having} in ${result.denominator}`);
        expect(caption).toContain(`About ${result.denominator - having} will not.`);
      });
    }
  });

  it('keeps every other sentence of each outcome, a paragraph per option, the ranges’ one level after the sheet’s last', () => {
    const rest = wording.filter((sentence) => !sentence.kind.endsWith('frame')).map((sentence) => sentence.text);
    expect(section.paragraphs.flat()).toEqual(rest);
    expect(section.paragraphs.map((paragraph) => paragraph.length)).toEqual([0, 3, 3]);
    const last = content.outcomes.at(-1)?.paragraphs.at(-1) ?? [];
    expect(last).toContain('Each range is a 95% interval.');
    expect(
      content.outcomes.flatMap((outcome) => outcome.paragraphs.flat()).filter((text) => text.includes('interval.')),
    ).toHaveLength(1);
  });

  it('adds the number needed to treat, with its interval, only when asked', () => {
    expect(section.paragraphs.flat().some((text) => text.startsWith('NNTB'))).toBe(false);
    const withNnt = handoutContent(result, topic, { ...options, showNnt: true });
    const lines = withNnt.outcomes[0]?.paragraphs.flat().filter((text) => text.startsWith('NNTB')) ?? [];
    expect(lines).toHaveLength(2);
    // Another stone: 40% × RR 0.6 (0.45 to 0.8) = 24% (18% to 32%): difference 0.16 (0.08 to 0.22), NNTB
    // 1/0.16 = 6.25 → 7, interval 1/0.22 = 4.5 → 5 and 1/0.08 = 12.5 → 13 (Altman 1998, rounded up).
    expect(lines[0]).toMatch(/^NNTB 7 \(NNTB 5 to 13\): treating 7 people like you/);
  });

  it('lists every sentence it took from the wording: who the numbers are for, then each outcome’s', () => {
    const all = handoutSentences(result, { showNnt: false });
    const population = all.filter((sentence) => sentence.kind === 'population');
    expect(content.wordingSentences[0]).toBe(population[0]?.text);
    expect(content.wordingSentences).toHaveLength(all.length);
    expect(new Set(content.wordingSentences)).toEqual(new Set(all.map((sentence) => sentence.text)));
  });

  it('puts every outcome in the table, benefits then side effects, its cells in the order of the pictures', () => {
    const rows = content.table.sections.flatMap((found) => found.rows);
    expect(rows.map((row) => row.outcomeId)).toEqual(['stone', 'night', 'stomach']);
    for (const row of rows) expect(row.cells).toHaveLength(3);
  });

  // EU SmPC guideline (European Commission 2009, section 4.8) / CIOMS III: common is ≥ 1/100 and < 1/10.
  // Very common is ≥ 1/10 in the same guideline. Demo: broken sleep 15% with no change, RR 1.6 with
  // extra water → 24%, RR 1 with the citrate drink → 15%; an upset stomach 5%, RR 1 → 5%, and
  // OR 2.6 → 2.6 × 0.05 / (0.95 + 0.13) = 12.04% with the citrate drink (derived).
  it('gives each side effect its frequency band with the numbers with and without and the change beside the word', () => {
    const [, night, stomach] = content.table.sections.flatMap((found) => found.rows);
    expect(night?.cells.map((cell) => cell.value)).toEqual([
      'very common: 15 in 100',
      'very common: 24 in 100',
      'very common: 15 in 100',
    ]);
    expect(night?.cells.map((cell) => cell.change)).toEqual([null, '9 more', 'no change']);
    expect(stomach?.cells.map((cell) => cell.value)).toEqual(['common: 5 in 100', 'common: 5 in 100', 'very common: 12 in 100']);
    expect(stomach?.cells.map((cell) => cell.change)).toEqual([null, 'no change', '7 more']);
    expect(night?.cells.map((cell) => cell.note)).toEqual([null, 'low certainty', 'low certainty']);
    expect(stomach?.cells.map((cell) => cell.note)).toEqual([null, 'very low certainty', 'moderate certainty']);
    expect(content.table.sections.map((found) => found.heading)).toEqual([
      'What the options aim to lower',
      'Side effects: how common they are',
    ]);
  });

  it('asks what matters by naming the benefit and the side effects that add the most people', () => {
    expect(content.matters.prompt).toBe(
      'How much does avoiding another kidney stone matter to you? Weigh it against the chance of broken sleep from passing urine at night or an upset stomach bad enough to stop. Write it here to talk about.',
    );
  });

  // Trevena et al. 2013 (IPDAS update): avoid "1 in X" formats; only the sheet's one denominator follows "1 in".
  it('never writes a "1 in X" figure', () => {
    const text = JSON.stringify(content);
    for (const found of text.matchAll(/\b1 in (\d+)/g)) expect(['100', '1000']).toContain(found[1]);
  });

  it('marks an illustrative topic as illustrative, and only then', () => {
    expect(content.illustrative).toBe('Illustrative example: invented numbers');
    const real = { ...topic, illustrative: false };
    expect(handoutContent(computeTopic(real), real, options).illustrative).toBeNull();
  });

  it('names who the numbers are for and the one period and denominator', () => {
    expect(content.audience.join(' ')).toContain('adults who have passed one kidney stone');
    expect(content.audience).toContain('Every number on this sheet is out of 100 people, over the next 5 years.');
  });

  it('gives the evidence source, the date it was checked in words, and where the starting chance comes from', () => {
    expect(content.evidence.items[0]).toBe(topic.evidence.summary);
    expect(content.evidence.items[1]).toBe('The research was last checked on 1 November 2026.');
    expect(content.evidence.items[2]).toBe(
      'Your starting chance of another kidney stone comes from: Invented clinic follow-up figures.',
    );
  });

  it('asks the topic’s questions, and general ones when it has none', () => {
    expect(content.questions.items).toEqual(topic.questions);
    const none = { ...topic, questions: [] };
    expect(handoutContent(result, none, options).questions.items).toEqual(handoutMessagesEn.defaultQuestions);
  });

  it('prints the clinician given, else the topic’s, else a line to write one on, with the date and version', () => {
    expect(content.footer.left).toBe('Prepared by: ______________________  ·  Printed on 1 December 2026');
    expect(content.footer.right).toBe('Chancewise 0.1.0  ·  Page 1 of 1');
    const named = { ...topic, clinician: 'Riverside Surgery' };
    expect(handoutContent(result, named, options).footer.left).toContain('Prepared by Riverside Surgery');
    expect(handoutContent(result, named, { ...options, clinician: 'Dr A. Patel' }).footer.left).toContain(
      'Prepared by Dr A. Patel',
    );
  });

  it('carries the standard caution with the sheet’s denominator and period', () => {
    expect(content.caution.text).toContain('estimates for groups of 100 people like you over the next 5 years');
    expect(content.caution.text).toContain('not a prediction for you');
    expect(content.caution.text).toContain('does not replace their advice');
    expect(content.caution.text).toContain('Follow local guidance');
  });
});
