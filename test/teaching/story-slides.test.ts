import { describe, expect, it } from 'vitest';
import { computeTopic, evaluateTopic } from '../../src/core/topic/compute-topic.ts';
import { handoutSentences } from '../../src/core/wording/topic-wording.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { teachingMessagesEn } from '../../src/teaching/messages/en.ts';
import { totalsOnly } from '../../src/teaching/people-panel.ts';
import type { PeoplePanel, PersonLook } from '../../src/teaching/slide-model.ts';
import { slidePlaces } from '../../src/teaching/slide-places.ts';
import { STONE, SCREENING, demoTopic, itemOf, pairTopic } from './teaching-fixtures.ts';

// Icon arrays show the whole denominator (Ancker et al. 2006), the same grouped layout for each
// option side by side (Zikmund-Fisher et al. 2012), and the change as its own group
// (Zikmund-Fisher et al. 2008; Fagerlin et al. 2011). The patient sentences are the core's
// wording, unchanged.

const counts = (panel: PeoplePanel | undefined): Record<string, number> =>
  Object.fromEntries((panel?.chips ?? []).map((chip) => [chip.look, chip.count]));

function looksCount(panel: PeoplePanel | undefined, look: PersonLook): number {
  return panel?.looks.filter((found) => found === look).length ?? 0;
}

describe('the story slides of the kidney stone topic (illustrative)', () => {
  const topic = demoTopic(STONE);
  const item = itemOf(topic);
  const result = computeTopic(topic);
  const headline = result.outcomes[0];
  const water = headline?.options.find((option) => option.optionId === 'water');

  it('opens on the decision: title, who the numbers are for, the period and the options compared', () => {
    const slide = buildSlide(item, 'title');
    expect(slide.heading).toBe(topic.title);
    expect(slide.lines.map((line) => line.text)).toEqual([
      `For ${topic.population}.`,
      'Every number is over 5 years.',
      'Comparing extra water each day with no change.',
      'Illustrative example: every number is invented, for teaching. Not for real decisions.',
      'Arrow keys, Page Up/Down or a clicker to step; Esc to leave.',
    ]);
  });

  it('shows the baseline as all 100 people, with both frames as call-outs', () => {
    const slide = buildSlide(item, 'baseline');
    expect(slide.panels).toHaveLength(1);
    expect(counts(slide.panels[0])).toEqual({ event: 40, free: 60 });
    expect(slide.panels[0]?.layout.people).toHaveLength(100);
    expect(slide.callouts.map((callout) => `${callout.value} ${callout.text}`)).toEqual([
      '40 in 100 have another kidney stone over 5 years',
      '60 in 100 do not',
    ]);
  });

  it('shows the same people with the option as totals only, the change not yet set apart', () => {
    const slide = buildSlide(item, 'with-option');
    expect(slide.panels.map((panel) => panel.title)).toEqual(['No change', 'Extra water each day']);
    expect(counts(slide.panels[1])).toEqual({ event: 24, free: 76 });
    expect(slide.callouts.map((callout) => callout.value)).toEqual(['40 in 100', '24 in 100']);
  });

  it('folds the changed people into the totals without changing the denominator', () => {
    const groups = water?.groups;
    if (groups === undefined) throw new Error('no extra water option');
    expect(totalsOnly(groups)).toEqual({ denominator: 100, event: 24, prevented: 0, caused: 0, free: 76 });
    const harm = { denominator: 100 as const, event: 5, prevented: 0, caused: 1, free: 94 };
    expect(totalsOnly(harm)).toEqual({ denominator: 100, event: 6, prevented: 0, caused: 0, free: 94 });
  });

  it('sets the people helped apart on the headline outcome, in the places the comparison’s events held', () => {
    const slide = buildSlide(item, 'helped');
    const [comparison, option] = slide.panels;
    expect(counts(option)).toEqual({ event: 24, helped: 16, free: 60 });
    // Grouped fill: the 16 helped sit right after the 24 who have it anyway, where the comparison's 25th to 40th were.
    const helpedRanks = option?.layout.people.filter((person) => person.group === 'prevented').map((person) => person.rank);
    expect(helpedRanks).toEqual(Array.from({ length: 16 }, (_, index) => 24 + index));
    expect(
      comparison?.layout.people
        .filter((person) => person.rank >= 24 && person.rank < 40)
        .every((person) => person.group === 'event'),
    ).toBe(true);
    expect(slide.callouts[0]).toEqual({
      look: 'helped',
      value: '16 in 100',
      text: 'avoid another kidney stone because of extra water each day',
    });
  });

  it('shows who is harmed on a harm outcome, the first the option adds people to', () => {
    const slide = buildSlide(item, 'harmed');
    expect(item.harmIds).toEqual(['night', 'stomach']);
    expect(counts(slide.panels[1])).toEqual({ event: 15, harmed: 9, free: 76 });
    expect(slide.callouts[0]).toEqual({
      look: 'harmed',
      value: '9 in 100',
      text: 'get broken sleep from passing urine at night because of extra water each day',
    });
  });

  it('outlines the people whose group depends on the range, and gives the range and the certainty in words', () => {
    const slide = buildSlide(item, 'uncertainty');
    const range = water?.perPeople.interventionRange;
    // RR 0.45 to 0.8 at 40%: 18% to 32% (derived).
    expect(range).toEqual({ lower: 18, upper: 32 });
    // Between 18 and 32 have it with the option (estimate 24): the people ranked 18 to 31 may or may not.
    expect(looksCount(slide.panels[0], 'uncertain')).toBe(14);
    expect(
      slide.panels[0]?.layout.people
        .filter((person, index) => slide.panels[0]?.looks[index] === 'uncertain')
        .map((person) => person.rank),
    ).toEqual(Array.from({ length: 14 }, (_, index) => 18 + index));
    expect(slide.lines.map((line) => line.text)).toEqual([
      'With extra water each day, the number who avoid another kidney stone could be anywhere between 8 and 22 in 100.',
      'The range is the research’s 95% interval.',
      'Outlined: people who may or may not have it, depending on where in the range the truth lies.',
      'Certainty of the evidence: moderate',
      'Extra water each day probably reduces the chance of another kidney stone.',
    ]);
  });

  it('gives the patient’s sentences exactly as the handout words them: the headline, then every harm', () => {
    const slides = [
      buildSlide(item, 'patient-words', teachingMessagesEn, 0),
      buildSlide(item, 'patient-words', teachingMessagesEn, 1),
    ];
    const handout = new Set(handoutSentences(result, { showNnt: false }).map((sentence) => sentence.text));
    const spoken = slides.flatMap((found) =>
      found.lines.filter((line) => line.tone === 'body').flatMap((line) => line.text.split(/(?<=\.) (?=[A-Z])/)),
    );
    expect(spoken.length).toBeGreaterThan(7);
    for (const sentence of spoken) expect(handout.has(sentence)).toBe(true);
    expect(
      slides.map((found) => [found.heading, found.lines.filter((line) => line.tone === 'subheading').map((line) => line.text)]),
    ).toEqual([
      ['What the patient hears (1 of 2)', ['About another kidney stone']],
      [
        'What the patient hears (2 of 2)',
        ['About broken sleep from passing urine at night', 'About an upset stomach bad enough to stop'],
      ],
    ]);
  });

  it('keeps the patient’s words on one slide when a set shows one harm', () => {
    const slide = buildSlide(itemOf(topic, { harm: 'night' }), 'patient-words');
    expect(slide.heading).toBe('What the patient hears');
    expect(slide.lines.filter((line) => line.tone === 'subheading').map((line) => line.text)).toEqual([
      'About another kidney stone',
      'About broken sleep from passing urine at night',
    ]);
  });

  it('shows every harm on a slide of its own, each with its own people', () => {
    const slides = slidePlaces([item])
      .filter((place) => place.kind === 'harmed')
      .map((place) => buildSlide(item, 'harmed', teachingMessagesEn, place.part));
    expect(slides.map((found) => found.heading)).toEqual(['Who is harmed (1 of 2)', 'Who is harmed (2 of 2)']);
    expect(slides.map((found) => counts(found.panels[1]))).toEqual([
      // Broken sleep: 15 in 100 without, 15 × 1.6 = 24 with extra water (derived).
      { event: 15, harmed: 9, free: 76 },
      // An upset stomach: risk ratio 1 with extra water, so 5 in 100 either way (derived).
      { event: 5, free: 95 },
    ]);
    expect(slides[1]?.callouts.map((callout) => `${callout.value} ${callout.text}`)).toEqual([]);
  });

  it('never shows a number the core did not compute: every array holds the whole denominator', () => {
    for (const { kind, part } of slidePlaces([item])) {
      for (const panel of buildSlide(item, kind, teachingMessagesEn, part).panels) {
        const total = panel.chips.reduce((sum, chip) => sum + chip.count, 0);
        expect(total).toBe(panel.layout.denominator);
        expect(panel.looks).toHaveLength(panel.layout.denominator);
      }
    }
  });
});

describe('story slides of other topics', () => {
  it('says so on the harm step when a topic lists no harm', () => {
    const item = itemOf(pairTopic({ baseline: '20%', effect: { measure: 'rr', estimate: 0.8 } }));
    expect(item.harmIds).toEqual([]);
    const slide = buildSlide(item, 'harmed');
    expect(slide.panels).toEqual([]);
    expect(slide.lines.map((line) => line.text)).toEqual([
      'This topic lists no harms.',
      'Ask: what could go wrong, and how often? Leaving harms out is a choice too.',
    ]);
  });

  it('says when the option helps no one at these numbers', () => {
    const item = itemOf(pairTopic({ baseline: '20%', effect: { measure: 'rr', estimate: 1 } }));
    const slide = buildSlide(item, 'helped');
    expect(slide.callouts).toEqual([]);
    expect(slide.lines[0]?.text).toBe('At these numbers, none of 100 avoid a stroke because of the treatment.');
  });

  it('counts per 1000 for the screening topic, as the core chose', () => {
    const item = itemOf(demoTopic(SCREENING));
    const slide = buildSlide(item, 'helped');
    expect(counts(slide.panels[1])).toEqual({ event: 24, helped: 6, free: 970 });
    expect(slide.callouts[0]?.text).toBe('avoid dying of bowel cancer because of screening');
    expect(buildSlide(item, 'baseline').callouts[0]?.text).toBe('end up dying of bowel cancer over 15 years');
  });

  it('presents the option a set names, on every step', () => {
    const item = itemOf(demoTopic(STONE), { option: 'citrate' });
    const slide = buildSlide(item, 'helped');
    expect(slide.panels[1]?.title).toBe('A citrate drink twice a day');
    // RR 0.45 at 40%: 18 in 100 have it, 22 avoid it (derived).
    expect(counts(slide.panels[1])).toEqual({ event: 18, helped: 22, free: 60 });
    const evaluation = evaluateTopic(demoTopic(STONE));
    if (!evaluation.ok) throw new Error('kidney stone topic did not compute');
    expect(evaluation.result.outcomes[0]?.options[2]?.groups).toEqual({
      denominator: 100,
      event: 18,
      prevented: 22,
      caused: 0,
      free: 60,
    });
  });
});

describe('the level of the range on the teaching slides', () => {
  it('names a 90% interval when the topic carries one', () => {
    const topic = demoTopic(STONE);
    const at90 = {
      ...topic,
      outcomes: topic.outcomes.map((outcome) => ({
        ...outcome,
        effects: outcome.effects.map((entry) =>
          entry.effect.measure === 'counts' ? entry : { ...entry, effect: { ...entry.effect, level: 0.9 } },
        ),
      })),
    };
    const lines = buildSlide(itemOf(at90), 'uncertainty').lines.map((found) => found.text);
    expect(lines).toContain('The range is the research’s 90% interval.');
    expect(buildSlide(itemOf(topic), 'uncertainty').lines.map((found) => found.text)).toContain(
      'The range is the research’s 95% interval.',
    );
  });
});
