/**
 * The handout of a topic whose headline outcome is an event people want (invented: pain gone
 * by day 3, 25 in 100 with usual advice and 45 in 100 with tablet B, risk ratio 1.8:
 * 0.25 × 1.8 = 0.45, Cochrane Handbook 5.1, §12.5.4). Its pictures, key, table, sentences and
 * NNT line speak of gaining or missing out on the event, never of avoiding, causing or risk,
 * and its period is in days.
 */
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { type ContentOptions, handoutContent } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import { pdfText, testFonts, writePdf } from './support.ts';
import { wantedTopic } from './wanted-topic.ts';

const options: ContentOptions = {
  date: '2026-12-01',
  appVersion: '0.1.0',
  showNnt: true,
  clinician: '',
  words: englishHandoutWords,
};
const topic = wantedTopic();
const result = computeTopic(topic);
/** Words that say a good event is a harm to avoid (the failure this guards against). */
const HARM_WORDS = /\b(avoids?|avoided|causes?|caused|prevents?|risks?)\b/i;
/** The names of the topic's wanted outcomes: only sentences about them must never read as harms. */
const WANTED = ['pain gone by day 3', 'a return to usual activities'];
const aboutWanted = (sentence: string) => WANTED.some((name) => sentence.toLowerCase().includes(name));

describe('the content of a wanted-event handout', () => {
  const content = handoutContent(result, topic, options);

  it('draws the people who gain the event in the helped look, and keys them as gaining it', () => {
    expect(content.outcomes[0]?.pictures.model.wanted).toBe(true);
    expect(content.outcomes[0]?.pictures.key).toEqual([
      { group: 'event', look: 'event', text: 'People who have it' },
      { group: 'caused', look: 'helped', text: 'People who gain it because of the option' },
      { group: 'free', look: 'free', text: 'People who do not have it' },
    ]);
  });

  it('heads the other wanted outcomes as ones the options aim to make more likely', () => {
    expect(content.table.sections.map((section) => section.heading)).toEqual([
      'What the options aim to make more likely',
      'Side effects: how common they are',
    ]);
  });

  it('gives the period in days wherever the sheet writes it', () => {
    expect(content.audience.at(-1)).toBe('Every number on this sheet is out of 100 people, over the next 3 days.');
    expect(content.caution.text).toContain('over the next 3 days');
    expect(JSON.stringify(content)).not.toMatch(/\byears?\b/);
  });

  it('takes sentences that never say avoid, cause, prevent or risk of the good event', () => {
    expect(content.wordingSentences.length).toBeGreaterThan(3);
    for (const sentence of content.wordingSentences.filter(aboutWanted)) expect(sentence).not.toMatch(HARM_WORDS);
    // NNTB = 1 / (0.45 − 0.25) = 5 (Altman 1998, BMJ 317:1309), with its interval.
    expect(content.wordingSentences.some((sentence) => /^NNTB 5 \(NNTB \d+ to \d+\):/.test(sentence))).toBe(true);
  });
});

describe('the printed wanted-event handout', () => {
  const built = buildHandout(result, topic, { date: '2026-12-01', appVersion: '0.1.0', showNnt: true }, testFonts());
  if (!built.ok) throw new Error(built.message);
  const text = pdfText(writePdf(built.pdf));

  it('prints the key, the NNT line and the table in words for a good event', () => {
    for (const words of [
      ...(built.pictures ? ['People who gain it because of the option'] : []),
      // Under compact pictures the NNT line is in its short form, after the option's name.
      built.compactPictures ? 'treating 5 people like you for 3 days' : 'treating 5 people like you with tablet B for 3 days',
      'over the next 3 days',
    ]) {
      expect(text).toContain(words);
    }
  });

  it('prints no word of avoiding, causing, preventing or risk about the good events', () => {
    const sentences = text.split(/(?<=[.?])\s+/).filter(aboutWanted);
    expect(sentences.length).toBeGreaterThan(3);
    for (const sentence of sentences) expect(sentence).not.toMatch(HARM_WORDS);
  });
});
