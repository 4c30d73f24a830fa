import { describe, expect, it } from 'vitest';
import { lookOf } from '../../src/core/direction.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { teachingMessagesEn } from '../../src/teaching/messages/en.ts';
import type { PresentationItem } from '../../src/teaching/presentation-item.ts';
import type { PeoplePanel, Slide } from '../../src/teaching/slide-model.ts';
import { slidePlaces } from '../../src/teaching/slide-places.ts';
import type { StepKind } from '../../src/teaching/teaching-steps.ts';
import { WANTED, fixtureTopic, itemOf, pairTopic } from './teaching-fixtures.ts';

// Events people want ("a response", "relief from the itch"): more of them helps, fewer harms, and
// such an event is had or missed, never a "risk", never "avoided", "prevented" or "caused" (common
// practice in risk communication). The option's risk is the comparison's times the risk ratio
// (Cochrane Handbook 5.1, §12.5.4.2); the absolute difference is the larger count minus the
// smaller; the NNT is 100 over that difference, labelled NNTB for a benefit and NNTH for a harm
// and written "NNTB 4 to ∞ to NNTH 20" style (Altman 1998, BMJ 317:1309), an NNTB rounded up
// (Cochrane Handbook 5.1, §12.5.4.1) and an NNTH down. The topics are invented, illustrative.

const counts = (panel: PeoplePanel | undefined): Record<string, number> =>
  Object.fromEntries((panel?.chips ?? []).map((chip) => [chip.look, chip.count]));

const callouts = (found: Slide): string[] => found.callouts.map((callout) => `${callout.value} ${callout.text}`);

/** Every text a slide shows but its research line (which is about studies, not this event). */
function slideText(found: Slide): string[] {
  return [
    found.heading,
    ...found.panels.flatMap((panel) => [panel.title, panel.description, ...panel.chips.map((chip) => chip.label)]),
    ...callouts(found),
    ...found.cards.flatMap((card) => [card.label, card.value, card.detail ?? '']),
    ...found.lines.map((line) => line.text),
  ];
}

function everySlide(item: PresentationItem): Slide[] {
  return slidePlaces([item]).map((place) => buildSlide(item, place.kind, teachingMessagesEn, place.part));
}

const cardsOf = (item: PresentationItem) => Object.fromEntries(buildSlide(item, 'framing').cards.map((card) => [card.id, card]));

describe('a wanted event made more likely: 25% by day 3, risk ratio 1.8 (1.4 to 2.3)', () => {
  const item = itemOf(
    pairTopic({
      baseline: '25%',
      effect: { measure: 'rr', estimate: 1.8, lower: 1.4, upper: 2.3 },
      name: 'a response: at least half as many bad days',
      wanted: true,
      period: { amount: 3, unit: 'days' },
    }),
  );
  const outcome = 'a response: at least half as many bad days';
  const slideOf = (kind: StepKind) => buildSlide(item, kind);

  it('gives the period in days, as the topic does', () => {
    expect(slideOf('title').lines[1]?.text).toBe('Every number counts what happens by day 3.');
    expect(callouts(slideOf('baseline'))).toEqual([`25 in 100 have ${outcome} by day 3`, '75 in 100 do not']);
  });

  it('shows 45 in 100 with the option: 25 × 1.8', () => {
    expect(callouts(slideOf('with-option'))).toEqual([
      '25 in 100 without it (no treatment)',
      `45 in 100 have ${outcome} with the treatment`,
    ]);
  });

  it('draws the 20 who gain the event in the helped look and says they have it because of the option', () => {
    const helped = slideOf('helped');
    const option = helped.panels[1];
    expect(counts(option)).toEqual({ event: 25, helped: 20, free: 55 });
    // The helped people are those who have the event only with the option: the core's `caused`.
    const groups = new Set(
      option?.layout.people.filter((person) => option.looks[person.index] === 'helped').map((person) => person.group),
    );
    expect([...groups]).toEqual(['caused']);
    expect(lookOf('caused', true)).toBe('helped');
    expect(helped.callouts[0]).toEqual({ look: 'helped', value: '20 in 100', text: `have ${outcome} because of the treatment` });
    expect(callouts(helped)[1]).toBe('25 in 100 have it anyway');
    expect(option?.chips.map((chip) => chip.label)).toEqual([
      `25 have ${outcome}`,
      `20 have ${outcome} because of the treatment`,
      `55 do not have ${outcome}`,
    ]);
  });

  it('frames the result four ways, the subtraction the larger count first and the NNT a benefit', () => {
    const found = cardsOf(item);
    expect(found.relative?.value).toBe('80% more people have it');
    expect(found.relative?.detail).toBe('From 25 to 45 in 100');
    expect(found.absolute?.value).toBe('20 in 100 more');
    expect(found.absolute?.detail).toBe('45 − 25 = 20 more in 100');
    expect(found.nnt?.label).toBe('NNTB');
    expect(found.nnt?.value).toBe('Treat 5 for 1 more');
    expect(found.nnt?.detail).toBe('100 ÷ 20 = 5, rounded up: 5');
  });

  it('gives the range as extra people who have it, 10 to 33 in 100', () => {
    // 25 × 1.4 = 35 and 25 × 2.3 = 57.5, which rounds half up to 58: 10 to 33 more than 25.
    const range = slideOf('uncertainty');
    expect(range.lines[0]?.text).toBe(
      `With the treatment, the number of extra people who have ${outcome} could be anywhere between 10 and 33 in 100.`,
    );
    expect(range.panels[0]?.looks.filter((look) => look === 'uncertain')).toHaveLength(58 - 35);
  });

  it('shows the same gain with 100 and 1000 people, grouped and scattered, and as totals beside the change', () => {
    expect(slideOf('denominator').panels.map(counts)).toEqual([
      { event: 25, helped: 20, free: 55 },
      { event: 250, helped: 200, free: 550 },
    ]);
    expect(slideOf('arrangement').panels.map(counts)).toEqual([
      { event: 25, helped: 20, free: 55 },
      { event: 25, helped: 20, free: 55 },
    ]);
    const incremental = slideOf('incremental');
    expect(incremental.panels.map(counts)).toEqual([
      { event: 45, free: 55 },
      { event: 25, helped: 20, free: 55 },
    ]);
    expect(incremental.lines[0]?.text).toBe('Without it (no treatment): 25 in 100.');
  });

  it('never calls the wanted event a risk, a reduction, avoided, prevented or caused, on any slide', () => {
    const texts = everySlide(item).flatMap(slideText);
    expect(texts.length).toBeGreaterThan(40);
    for (const text of texts) expect(text).not.toMatch(/\b(risk|reduc|avoid|prevent|caus)/i);
  });
});

describe('the same numbers for an event to avoid keep their words', () => {
  const item = itemOf(pairTopic({ baseline: '25%', effect: { measure: 'rr', estimate: 1.8, lower: 1.4, upper: 2.3 } }));

  it('is a higher risk, more people, and a number needed to harm rounded down', () => {
    const found = cardsOf(item);
    expect(found.relative?.value).toBe('80% higher risk');
    expect(found.absolute?.detail).toBe('45 − 25 = 20 more in 100');
    expect(found.nnt?.label).toBe('NNTH');
    expect(found.nnt?.value).toBe('Treat 5 to cause 1');
    expect(found.nnt?.detail).toBe('100 ÷ 20 = 5, rounded down: 5');
  });

  it('draws the 20 extra people in the harmed look and says no one avoids it', () => {
    const helped = buildSlide(item, 'helped');
    expect(counts(helped.panels[1])).toEqual({ event: 25, harmed: 20, free: 55 });
    expect(helped.lines.map((line) => [line.text, line.look])).toEqual([
      ['At these numbers, none of 100 avoid a stroke because of the treatment.', null],
      ['Instead, 20 in 100 get a stroke because of the treatment.', 'harmed'],
    ]);
  });
});

describe('a wanted event made less likely: 50% over 6 months, risk ratio 0.8', () => {
  const outcome = 'pain relief';
  const item = itemOf(
    pairTopic({
      baseline: '50%',
      effect: { measure: 'rr', estimate: 0.8 },
      name: outcome,
      wanted: true,
      period: { amount: 6, unit: 'months' },
    }),
  );

  it('words the period in months', () => {
    expect(buildSlide(item, 'title').lines[1]?.text).toBe('Every number counts what happens over the next 6 months.');
    expect(callouts(buildSlide(item, 'baseline'))[0]).toBe(`50 in 100 have ${outcome} over the next 6 months`);
  });

  it('helps no one: the 10 who miss out are drawn harmed, and said so', () => {
    const helped = buildSlide(item, 'helped');
    expect(counts(helped.panels[1])).toEqual({ event: 40, harmed: 10, free: 50 });
    expect(helped.callouts).toEqual([]);
    expect(helped.lines.map((line) => [line.text, line.look])).toEqual([
      [`At these numbers, none of 100 have ${outcome} because of the treatment.`, null],
      [`Instead, 10 in 100 miss out on ${outcome} because of the treatment.`, 'harmed'],
    ]);
  });

  it('frames it as fewer people having it, 50 − 40, and a number needed to harm', () => {
    const found = cardsOf(item);
    expect(found.relative?.value).toBe('20% fewer people have it');
    expect(found.absolute?.value).toBe('10 in 100 fewer');
    expect(found.absolute?.detail).toBe('50 − 40 = 10 fewer in 100');
    expect(found.nnt?.label).toBe('NNTH');
    expect(found.nnt?.value).toBe('Treat 10 for 1 fewer');
    expect(found.nnt?.detail).toBe('100 ÷ 10 = 10, rounded down: 10');
  });
});

describe('every harm of a topic with a wanted headline, one unwanted and one wanted harm (illustrative)', () => {
  const item = itemOf(fixtureTopic(WANTED));
  const harms = slidePlaces([item])
    .filter((place) => place.kind === 'harmed')
    .map((place) => buildSlide(item, 'harmed', teachingMessagesEn, place.part));

  it('shows each harm on its own slide with its own people', () => {
    expect(item.harmIds).toEqual(['drowsy', 'alert']);
    expect(harms.map((found) => found.heading)).toEqual(['Who is harmed (1 of 2)', 'Who is harmed (2 of 2)']);
    // Drowsiness: 8 × 2.5 = 20 with the tablet, 12 more. Feeling alert: 85 × 0.88 = 74.8 → 75, 10 fewer.
    expect(harms.map((found) => counts(found.panels[1]))).toEqual([
      { event: 8, harmed: 12, free: 80 },
      { event: 75, harmed: 10, free: 15 },
    ]);
  });

  it('says an unwanted harm is got and a wanted one missed out on', () => {
    expect(harms.map(callouts)).toEqual([
      ['12 in 100 get drowsiness the next day because of the night-time tablet', '8 in 100 have it anyway'],
      ['10 in 100 miss out on feeling alert the next morning because of the night-time tablet', '75 in 100 have it anyway'],
    ]);
    // The people who lose a wanted event are those who have it only without the option: `prevented`.
    const alert = harms[1]?.panels[1];
    const groups = new Set(
      alert?.layout.people.filter((person) => alert.looks[person.index] === 'harmed').map((person) => person.group),
    );
    expect([...groups]).toEqual(['prevented']);
  });

  it('gives the patient every harm’s words after the headline’s', () => {
    const words = slidePlaces([item])
      .filter((place) => place.kind === 'patient-words')
      .map((place) => buildSlide(item, 'patient-words', teachingMessagesEn, place.part));
    expect(words.map((found) => found.lines.filter((line) => line.tone === 'subheading').map((line) => line.text))).toEqual([
      ['About relief from the itch'],
      ['About drowsiness the next day', 'About feeling alert the next morning'],
    ]);
    expect(words[0]?.lines[1]?.text).toBe(
      'No tablet: about 30 in 100 people like you will have relief from the itch by day 3. About 70 will not.',
    );
    expect(words[1]?.lines.map((line) => line.text)).toContain(
      'With the night-time tablet, about 10 fewer of those 100 people end up feeling alert the next morning.',
    );
  });

  it('frames the headline as 18 more in 100: 30 × 1.6 = 48, NNTB 100 ÷ 18 = 5.56, rounded up to 6', () => {
    const found = cardsOf(item);
    expect([found.relative?.value, found.absolute?.detail, found.nnt?.label, found.nnt?.value, found.nnt?.detail]).toEqual([
      '60% more people have it',
      '48 − 30 = 18 more in 100',
      'NNTB',
      'Treat 6 for 1 more',
      '100 ÷ 18 = 5.56, rounded up: 6',
    ]);
  });
});
