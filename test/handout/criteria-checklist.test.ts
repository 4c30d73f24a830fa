/**
 * The IPDAS probability criteria, item by item, over every demo topic's handout and the
 * invented topic where a harm outweighs the benefit: read from the content and checked in
 * the PDF's own text (pdftotext).
 */
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import type { Topic } from '../../src/core/topic/topic.ts';
import type { TopicResult } from '../../src/core/topic/topic-result.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { handoutContent } from '../../src/handout/handout-content.ts';
import { englishHandoutWords } from '../../src/handout/handout-words.ts';
import { harmOutweighsTopic } from './harm-outweighs-topic.ts';
import { demos, normalise, pdfText, testFonts, writePdf } from './support.ts';

const date = '2026-12-01';
const topics: { name: string; topic: Topic; result: TopicResult }[] = [
  ...demos(),
  { name: 'harm outweighs benefit', topic: harmOutweighsTopic(), result: computeTopic(harmOutweighsTopic()) },
];

describe.each(topics)('the handout of $name meets the IPDAS probability criteria', ({ topic, result }) => {
  const content = handoutContent(result, topic, {
    date,
    appVersion: '0.1.0',
    showNnt: false,
    clinician: '',
    words: englishHandoutWords,
  });
  const handout = buildHandout(result, topic, { date, appVersion: '0.1.0' }, testFonts());
  if (!handout.ok) throw new Error(handout.message);
  const text = pdfText(writePdf(handout.pdf));
  const printed = (sentence: string) => expect(text, sentence).toContain(normalise(sentence));
  // Under compact pictures each option's sentences are printed in their short form.
  const paragraphsOf = (outcome: (typeof content.outcomes)[number]) =>
    handout.compactPictures ? outcome.shortParagraphs : outcome.paragraphs;

  it('prints every outcome, benefits and side effects', () => {
    expect(content.outcomes.map((outcome) => outcome.outcomeId).sort()).toEqual(
      result.outcomes.map((outcome) => outcome.outcomeId).sort(),
    );
    for (const outcome of content.outcomes) printed(outcome.label);
  });

  // IPDASi item 5, number from memory (Elwyn et al. 2009; Trevena et al. 2013, "use the same denominator and time period"):
  // every outcome's numbers are out of the sheet's one words denominator, over its one period.
  it('IPDAS probabilities (Trevena 2013): the same denominator and period for every printed outcome', () => {
    const period = /in the next ([\d.]+ \w+|\w+)|by day [\d.]+|within a day/;
    const periods = new Set<string>();
    for (const outcome of content.outcomes) {
      for (const [event] of outcome.frames) {
        expect(event, event).toMatch(
          new RegExp(`(about \\d+|fewer than 1|none of|nearly all|all) (in )?${result.wordsDenominator}\\b`),
        );
        periods.add(period.exec(event ?? '')?.[0] ?? event ?? '');
      }
    }
    expect(periods.size).toBe(1);
    // A side-effect row written per more people, so its band word and number agree, is said under the
    // table wherever that table is printed.
    const raised = content.table.sections
      .flatMap((section) => section.rows)
      .filter((row) => row.denominator !== result.wordsDenominator);
    for (const row of raised) {
      if (text.includes(`in ${row.denominator.toLocaleString('en-GB')}`)) printed(content.table.rareNote ?? 'a note');
    }
  });

  // IPDAS 2005 checklist, "presenting probabilities": positive and negative frames; IPDASi item 8, number from memory
  // (balanced information to limit framing biases).
  it('IPDAS probabilities (Trevena 2013): both frames for every printed outcome and option', () => {
    for (const outcome of content.outcomes) {
      expect(outcome.frames).toHaveLength(result.outcomes[0]?.options.length ?? 0);
      for (const frames of outcome.frames) {
        expect(frames).toHaveLength(2);
        expect(frames[1]).toMatch(/will not\.|will stay free of it\.|None of them will stay free of it\./);
        for (const frame of frames) printed(frame);
      }
    }
  });

  // IPDASi item 6, number from memory (levels of uncertainty), an IPDAS certification criterion (Joseph-Williams et al.
  // 2014): a range for every option's change, or an explicit "does not tell us how precise".
  it('IPDAS probabilities (Trevena 2013): a range, or an explicit "does not tell us how precise", for every printed outcome', () => {
    for (const outcome of content.outcomes) {
      paragraphsOf(outcome).forEach((paragraph, index) => {
        if (index === 0) return;
        const uncertainty = paragraph.find((sentence) =>
          /could be anywhere|anything from|somewhere between|anywhere from|with little uncertainty|little or no change|whole range|does not tell us how precise/.test(
            sentence,
          ),
        );
        expect(uncertainty, `${outcome.outcomeId}, option ${index}`).toBeDefined();
        printed(uncertainty ?? '');
      });
    }
  });

  // Santesso et al. 2020 (GRADE guidelines 26): a certainty statement for every option's effect, harms as benefits.
  it('a GRADE informative statement for every printed outcome and option', () => {
    for (const outcome of content.outcomes) {
      paragraphsOf(outcome)
        .slice(1)
        .forEach((paragraph) => {
          const statement = paragraph.find((sentence) =>
            /(reduces?|increases?|little or no difference to) the chance( of|\.)|very uncertain about (the|its) effect/.test(
              sentence,
            ),
          );
          expect(statement, outcome.outcomeId).toBeDefined();
          printed(statement ?? '');
        });
    }
  });

  // Trevena et al. 2013, "outcomes over time": say when numbers rest on a period conversion or on an
  // effect carried past the trials' follow-up (Altman & Andersen 1999, BMJ 319:1492; Cochrane Handbook
  // 5.1 §12.5.3).
  it('states the assumptions line where a period was converted or an effect extrapolated, and only then', () => {
    for (const outcome of result.outcomes) {
      const section = content.outcomes.find((found) => found.outcomeId === outcome.outcomeId);
      const converted = outcome.baselineConversion !== null && outcome.baselineConversion !== undefined;
      const beyond = outcome.options.filter((option) => option.notices.some((found) => found.code === 'period-beyond-followup'));
      expect(section?.assumptions).toHaveLength(Number(converted) + beyond.length);
      for (const line of section?.assumptions ?? []) printed(line);
    }
  });
});

describe('the screening demo’s assumptions', () => {
  const screening = topics.find((found) => found.name === '02-bowel-screening.json');
  if (screening === undefined) throw new Error('no screening demo');
  const content = handoutContent(screening.result, screening.topic, {
    date,
    appVersion: '0.1.0',
    showNnt: false,
    clinician: '',
    words: englishHandoutWords,
  });

  // The demo file: baseline over 10 years, the sheet's period 15 years, the trials' follow-up 12 years.
  it('says the starting chance was worked out for 15 years, and that the effect is assumed to carry on past 12 years', () => {
    expect(content.outcomes[0]?.assumptions).toEqual([
      'Your starting chance of dying of bowel cancer was given for 10 years. It was worked out for 15 years, assuming it stays steady.',
      'The research on screening lasted 12 years. The numbers for 15 years assume its effect carries on.',
    ]);
  });
});
