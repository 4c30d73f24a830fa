import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { handoutSentences } from '../../src/core/wording/topic-wording.ts';
import { type ContentOptions, handoutContent, headlineOutcome } from '../../src/handout/handout-content.ts';
import { handoutMessagesEn } from '../../src/handout/messages/en.ts';
import { outcomeChart } from '../../src/render/chart-model.ts';
import { firstDemo } from './support.ts';

const options: ContentOptions = {
  date: '2026-12-01',
  appVersion: '0.1.0',
  showNnt: false,
  clinician: '',
  messages: handoutMessagesEn,
};

describe('the content of a handout', () => {
  const { topic, result } = firstDemo();
  const content = handoutContent(result, topic, options);
  const headline = headlineOutcome(result);
  const wording = handoutSentences(result, { showNnt: false }).filter((sentence) => sentence.outcomeId === headline.outcomeId);

  it('shows the headline outcome, one picture per option, the comparison first', () => {
    expect(headline.isHeadline).toBe(true);
    expect(content.chart.model.arrays.map((array) => array.optionId)).toEqual(['as-now', 'water', 'citrate']);
    expect(content.chart.titles).toEqual(['No change', 'Extra water each day', 'A citrate drink twice a day']);
  });

  it('leaves the pictures themselves unchanged: the same people in the same places as the chart', () => {
    const chart = outcomeChart(result, headline.outcomeId);
    expect(content.chart.model.arrays.map((array) => array.layout)).toEqual(chart.arrays.map((array) => array.layout));
    expect(content.chart.model.arrays.every((array) => array.title === '' && array.labels.length === 0)).toBe(true);
  });

  it('captions each picture with its option’s two frames from the wording, in the pictures’ order', () => {
    content.chart.model.arrays.forEach((array, index) => {
      const frames = wording.filter((sentence) => sentence.optionId === array.optionId && sentence.kind.endsWith('frame'));
      expect(frames.map((sentence) => sentence.kind)).toEqual(['event-frame', 'free-frame']);
      expect(content.chart.captions[index]).toBe(frames.map((sentence) => sentence.text).join(' '));
    });
  });

  it('states in each caption the counts the picture draws', () => {
    content.chart.model.arrays.forEach((array, index) => {
      const having = array.groups.event + array.groups.caused;
      const caption = content.chart.captions[index] ?? '';
      expect(caption).toContain(`about ${having} in ${result.denominator}`);
      expect(caption).toContain(`About ${result.denominator - having} will not.`);
    });
  });

  it('keeps every other headline sentence of the wording, a paragraph per option, the ranges’ one level after the last', () => {
    const rest = wording.filter((sentence) => !sentence.kind.endsWith('frame')).map((sentence) => sentence.text);
    expect(content.paragraphs.flat()).toEqual([...rest.slice(0, -1), 'Each range is a 95% interval.', ...rest.slice(-1)]);
    expect(content.paragraphs).toHaveLength(2);
    expect(new Set(wording.filter((sentence) => !sentence.kind.endsWith('frame')).map((sentence) => sentence.kind))).toEqual(
      new Set(['change', 'range', 'certainty']),
    );
  });

  it('adds the number needed to treat only when asked', () => {
    expect(content.paragraphs.flat().some((text) => text.startsWith('NNTB'))).toBe(false);
    const withNnt = handoutContent(result, topic, { ...options, showNnt: true });
    expect(withNnt.paragraphs.flat().filter((text) => text.startsWith('NNTB'))).toHaveLength(2);
  });

  it('lists every sentence it took from the wording: who the numbers are for, the frames, then the rest', () => {
    const population = handoutSentences(result, { showNnt: false }).filter((sentence) => sentence.kind === 'population');
    expect(content.wordingSentences[0]).toBe(population[0]?.text);
    expect(content.wordingSentences).toHaveLength(1 + wording.length);
    expect(new Set(content.wordingSentences)).toEqual(new Set([...population, ...wording].map((sentence) => sentence.text)));
  });

  it('puts every other outcome in the table, its cells in the order of the pictures', () => {
    const rows = content.table.sections.flatMap((section) => section.rows);
    expect(rows.map((row) => row.outcomeId)).toEqual(['night', 'stomach']);
    for (const row of rows) expect(row.cells).toHaveLength(3);
  });

  // EU SmPC guideline (European Commission 2009, section 4.8) / CIOMS III: common is ≥ 1/100 and < 1/10.
  // Very common is ≥ 1/10 in the same guideline. Demo: broken sleep 15% with no change, RR 1.6 with
  // extra water → 24%, RR 1 with the citrate drink → 15%; an upset stomach 5%, RR 1 → 5%, and
  // OR 2.6 → 2.6 × 0.05 / (0.95 + 0.13) = 12.04% with the citrate drink (derived).
  it('gives each side effect its frequency band with the number beside the word', () => {
    const [night, stomach] = content.table.sections.flatMap((section) => section.rows);
    expect(night?.cells.map((cell) => cell.value)).toEqual([
      'very common: 15 in 100',
      'very common: 24 in 100',
      'very common: 15 in 100',
    ]);
    expect(stomach?.cells.map((cell) => cell.value)).toEqual(['common: 5 in 100', 'common: 5 in 100', 'very common: 12 in 100']);
    expect(night?.cells.map((cell) => cell.note)).toEqual([null, 'low certainty', 'low certainty']);
    expect(stomach?.cells.map((cell) => cell.note)).toEqual([null, 'very low certainty', 'moderate certainty']);
    expect(content.table.sections.map((section) => section.heading)).toEqual(['Side effects: how common they are']);
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
