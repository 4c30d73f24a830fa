import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { TOPIC_LIMITS } from '../../src/core/topic/topic.ts';
import { READING_GRADE_LIMIT, readability } from '../../src/core/wording/readability.ts';
import { buildHandout, type HandoutBuild, type HandoutBuilt, type HandoutOptions } from '../../src/handout/build-handout.ts';
import { HANDOUT_MARGIN } from '../../src/handout/paper-size.ts';
import type { Paper } from '../../src/handout/paper-size.ts';
import { blackAndWhitePalette } from '../../src/render/palette.ts';
import { type Demo, demos, firstDemo, normalise, pdfInfo, pdfText, testFonts, wordBoxes, writePdf } from './support.ts';
import { shapedTopic, wordsOfLength } from './topic-builder.ts';

const base: HandoutOptions = { date: '2026-12-01', appVersion: '0.1.0' };
const points = (millimetres: number) => (millimetres * 72) / 25.4;

function built(found: HandoutBuild): HandoutBuilt {
  if (!found.ok) throw new Error(`expected a handout, got: ${found.message}`);
  return found;
}

function build(demo: Demo, options: Partial<HandoutOptions> = {}): HandoutBuilt {
  return built(buildHandout(demo.result, demo.topic, { ...base, ...options }, testFonts()));
}

// ISO 216 A4 = 210 × 297 mm = 595.28 × 841.89 pt; ANSI Letter = 8.5 × 11 in = 612 × 792 pt (72 pt to the inch).
const PAGE_SIZES: Readonly<Record<Paper, string>> = {
  a4: '595.28 x 841.89 pts (A4)',
  letter: '612 x 792 pts (letter)',
};
const PAGE_POINTS: Readonly<Record<Paper, { width: number; height: number }>> = {
  a4: { width: 595.28, height: 841.89 },
  letter: { width: 612, height: 792 },
};

describe.each(demos().flatMap((demo) => (['a4', 'letter'] as const).map((paper) => ({ demo, paper }))))(
  'the handout of $demo.name on $paper',
  ({ demo, paper }) => {
    const handout = build(demo, { paper });
    const path = writePdf(handout.pdf);
    const text = pdfText(path);

    it('is one page of exactly the paper asked for', () => {
      const info = pdfInfo(path);
      expect(info.Pages).toBe('1');
      expect(info['Page size']).toBe(PAGE_SIZES[paper]);
      expect(handout.pages).toBe(1);
    });

    it('holds every sentence it took from the wording, and the caution, as extractable text', () => {
      expect(handout.wordingSentences.length).toBeGreaterThan(5);
      for (const sentence of handout.wordingSentences) expect(text).toContain(normalise(sentence));
      expect(text).toContain('Please keep in mind: these numbers are estimates for groups of');
      expect(text).toContain('not a prediction for you');
      expect(text).toContain('does not replace their advice. Follow local guidance.');
    });

    it('names the decision, marks the invented numbers, and prints the date, version and page', () => {
      expect(text).toContain(normalise(demo.topic.title));
      expect(text).toContain('Illustrative example');
      expect(text).toContain('Printed on 1 December 2026');
      expect(text).toContain('Chancewise 0.1.0');
      expect(text).toContain('Page 1 of 1');
    });

    it('keeps every word inside the 15 mm margins', () => {
      const margin = points(HANDOUT_MARGIN);
      const page = PAGE_POINTS[paper];
      const boxes = wordBoxes(path);
      expect(boxes.length).toBeGreaterThan(100);
      for (const box of boxes) {
        expect(box.xMin, box.word).toBeGreaterThanOrEqual(margin - 0.01);
        expect(box.yMin, box.word).toBeGreaterThanOrEqual(margin - 0.01);
        expect(box.xMax, box.word).toBeLessThanOrEqual(page.width - margin + 0.01);
        expect(box.yMax, box.word).toBeLessThanOrEqual(page.height - margin + 0.01);
      }
    });

    it('sets body text at 11 points or more and table and list text at 9 or more', () => {
      expect(handout.settings.body).toBeGreaterThanOrEqual(11);
      expect(Math.min(handout.settings.list, handout.settings.table)).toBeGreaterThanOrEqual(9);
    });

    it('is under 200 KB', () => {
      expect(handout.pdf.length).toBeLessThan(200 * 1024);
    });
  },
);

describe('building a handout', () => {
  const demo = firstDemo();

  it('writes the same bytes every time for the same date', () => {
    const first = build(demo).pdf;
    const second = build(demo).pdf;
    expect(Buffer.from(first).equals(Buffer.from(second))).toBe(true);
    expect(Buffer.from(build(demo, { date: '2026-12-02' }).pdf).equals(Buffer.from(first))).toBe(false);
  });

  it('writes the printed date as the creation date, with fixed producer and creator', () => {
    const path = writePdf(build(demo).pdf);
    const raw = readFileSync(path, 'latin1');
    expect(raw).toContain("/CreationDate (D:20261201000000+00'00')");
    const info = pdfInfo(path);
    expect(info.Creator).toBe('Chancewise 0.1.0');
    expect(info.Producer).toMatch(/^jsPDF /);
    expect(info.Title).toBe(demo.topic.title);
  });

  // pdffonts lists the embedded fonts: both DejaVu Sans faces, embedded, with a Unicode map.
  it('embeds the font it measured with, so text stays selectable', () => {
    const raw = Buffer.from(build(demo).pdf).toString('latin1');
    expect(raw.match(/\/FontFile2 /g)).toHaveLength(2);
    expect(raw).toContain('/BaseFont /DejaVuSans');
    expect(raw).toContain('/ToUnicode');
  });

  it('prints the symbols of clinical text exactly', () => {
    const topic = {
      ...demo.topic,
      population: 'people aged ≥ 65 with a risk ≤ 15% – Zoë’s clinic, café ∞',
    };
    const handout = built(buildHandout(computeTopic(topic), topic, base, testFonts()));
    expect(pdfText(writePdf(handout.pdf))).toContain('people aged ≥ 65 with a risk ≤ 15% – Zoë’s clinic, café ∞');
  });

  // Flesch–Kincaid grade (Kincaid et al. 1975); patient material at grade 8 or below, the top of the usual
  // plain-language target of grade 6 to 8 (common practice).
  it('returns the Flesch Reading Ease and Flesch–Kincaid grade of its prose, at grade 8 or below for the demos', () => {
    for (const each of demos()) {
      const handout = build(each);
      expect(handout.readability).toEqual(readability(handout.prose.join('\n\n')));
      expect(handout.readability.grade).not.toBeNull();
      expect(handout.readability.grade ?? 99).toBeLessThanOrEqual(READING_GRADE_LIMIT);
      expect(handout.readability.readingEase ?? 0).toBeGreaterThanOrEqual(60);
    }
  });

  it('prints the clinician given and the NNT sentences, with their intervals, when asked', () => {
    const fracture = demos().find((each) => each.name === '03-fracture-medicine.json') ?? demo;
    const text = pdfText(writePdf(build(fracture, { clinician: 'Dr A. Patel, Riverside Surgery', showNnt: true }).pdf));
    expect(text).toContain('Prepared by Dr A. Patel, Riverside Surgery');
    // Trial counts 91/1000 and 52/1000: difference 0.039, NNTB 1/0.039 = 25.6 → 26 (Altman 1998, rounded up).
    expect(text).toMatch(/NNTB 26 \(NNTB \d+ to \d+\): treating 26 people like you with the weekly tablet/);
  });

  it('builds in the black-and-white print theme too', () => {
    const handout = build(demo, { palette: blackAndWhitePalette });
    expect(pdfInfo(writePdf(handout.pdf)).Pages).toBe('1');
  });

  // Every outcome with the same detail takes room: the most options fit with two outcomes, and three
  // options with three outcomes (the size of the first demo), on either paper.
  it('fits the most options with two outcomes, and three options with three outcomes, on either paper', () => {
    const wide = shapedTopic({ options: TOPIC_LIMITS.maxOptions, outcomes: 2 });
    const square = shapedTopic({ options: 3, outcomes: 3 });
    for (const paper of ['a4', 'letter'] as const) {
      expect(buildHandout(computeTopic(wide), wide, { ...base, paper }, testFonts()).ok).toBe(true);
      expect(buildHandout(computeTopic(square), square, { ...base, paper }, testFonts()).ok).toBe(true);
    }
  });

  it('refuses, writing nothing, content that cannot fit on one page, and says in one line what to shorten', () => {
    const topic = shapedTopic({
      options: TOPIC_LIMITS.maxOptions,
      outcomes: TOPIC_LIMITS.maxOutcomes,
      optionName: (index) => wordsOfLength(TOPIC_LIMITS.optionNameLength, 'treatment', String(index)),
      outcomeName: (index) => wordsOfLength(TOPIC_LIMITS.outcomeNameLength, 'complication', String(index)),
      title: wordsOfLength(TOPIC_LIMITS.titleLength, 'deciding'),
      population: wordsOfLength(TOPIC_LIMITS.populationLength, 'people'),
      questions: Array.from({ length: TOPIC_LIMITS.maxQuestions }, () => wordsOfLength(TOPIC_LIMITS.questionLength, 'question')),
      summary: wordsOfLength(TOPIC_LIMITS.evidenceSummaryLength, 'evidence'),
    });
    const handout = buildHandout(computeTopic(topic), topic, base, testFonts());
    expect(handout.ok).toBe(false);
    if (handout.ok) return;
    expect(handout.reason).toBe('does-not-fit');
    expect(handout.message).not.toContain('\n');
    expect(handout.message).toMatch(/^The handout does not fit on one page \(about \d+ mm too long\): shorten the /);
    expect(handout.overMillimetres).toBeGreaterThan(0);
  });

  it('refuses a date that is not a real YYYY-MM-DD date', () => {
    expect(() => buildHandout(demo.result, demo.topic, { ...base, date: '2026-02-30' }, testFonts())).toThrow(RangeError);
    expect(() => buildHandout(demo.result, demo.topic, { ...base, date: '01/12/2026' }, testFonts())).toThrow(RangeError);
  });
});
