import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { topicWording } from '../../src/core/wording/topic-wording.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { framingNumbers } from '../../src/teaching/framing-slide.ts';
import { shortDecimal } from '../../src/teaching/messages/en.ts';
import { STONE, SCREENING, demoTopic, itemOf, pairTopic } from './teaching-fixtures.ts';

// NNT = 1/ARR rounded up, ARR = p0 − p1 (Cochrane Handbook 5.1, §12.5.4.1–12.5.4.3; Altman 1998,
// BMJ 317:1309). The worked examples are the Handbook's own (§12.5.4.2 for a risk ratio,
// §12.5.4.3 for an odds ratio).

function cards(topic: ReturnType<typeof pairTopic>, per: 100 | 1000 | null = null) {
  const slide = buildSlide(itemOf(topic, {}, per), 'framing');
  return Object.fromEntries(slide.cards.map((card) => [card.id, card]));
}

describe('the framing step', () => {
  it('gives the Handbook’s risk-ratio example four ways: RR 0.92 at a control risk of 30%', () => {
    // Cochrane Handbook 5.1 §12.5.4.2: 24 fewer per 1000, NNT 1/0.024 = 41.67 → 42.
    const found = cards(pairTopic({ baseline: '30%', effect: { measure: 'rr', estimate: 0.92 } }), 1000);
    expect(found.relative?.value).toBe('8% lower risk');
    expect(found.absolute?.value).toBe('24 in 1000 fewer');
    expect(found.absolute?.detail).toBe('300 − 276 = 24 fewer in 1000');
    expect(found.nnt?.value).toBe('Treat 42 to prevent 1');
    expect(found.nnt?.detail).toBe('1000 ÷ 24 = 41.67, rounded up: 42');
  });

  it('gives the Handbook’s odds-ratio example: OR 0.73 at a control risk of 30%', () => {
    // Cochrane Handbook 5.1 §12.5.4.3: p1 = 0.2383, 62 fewer per 1000, NNT 16.21 → 17.
    // The implied risk ratio 0.2383 / 0.30 = 0.794 is a 21% reduction (computed from the Handbook's p1).
    const found = cards(pairTopic({ baseline: '30%', effect: { measure: 'or', estimate: 0.73 } }), 1000);
    expect(found.absolute?.value).toBe('62 in 1000 fewer');
    expect(found.nnt?.value).toBe('Treat 17 to prevent 1');
    expect(found.relative?.value).toBe('21% lower risk');
  });

  it('words a harm as a higher risk, more people and a number needed to harm', () => {
    // Check values C4 (harm): p0 0.02, RR 1.5 → p1 0.03, ARI 0.01, NNH 100.
    const found = cards(pairTopic({ baseline: '2%', effect: { measure: 'rr', estimate: 1.5 } }), 100);
    expect(found.relative?.value).toBe('50% higher risk');
    expect(found.absolute?.value).toBe('1 in 100 more');
    expect(found.nnt?.label).toBe('NNTH');
    expect(found.nnt?.value).toBe('Treat 100 to cause 1');
    // Larger count first, so the subtraction reads the way the change goes: 3 − 2, not 2 − 3.
    expect(found.absolute?.detail).toBe('3 − 2 = 1 more in 100');
    // An NNTH is rounded down (it is whole here: 100 ÷ 1).
    expect(found.nnt?.detail).toBe('100 ÷ 1 = 100, rounded down: 100');
  });

  it('says there is no difference rather than an NNT when the ratio is 1', () => {
    const found = cards(pairTopic({ baseline: '20%', effect: { measure: 'rr', estimate: 1 } }), 100);
    expect(found.relative?.value).toBe('No relative change at these numbers');
    expect(found.absolute?.value).toBe('No difference in 100');
    expect(found.nnt?.value).toBe('No number needed to treat');
  });

  it.each([STONE, SCREENING])('uses the core’s own figures for %s: its relative sentence, drawn people and NNT', (name) => {
    const topic = demoTopic(name);
    const result = computeTopic(topic);
    const wording = topicWording(result);
    for (const outcome of result.outcomes) {
      for (const option of outcome.options.filter((entry) => !entry.isComparison)) {
        const numbers = framingNumbers(option, result.denominator, outcome.wanted);
        const relative = wording.outcomes
          .find((entry) => entry.outcomeId === outcome.outcomeId)
          ?.options.find((entry) => entry.optionId === option.optionId)
          ?.sentences.find((sentence) => sentence.kind === 'relative');
        if (relative !== undefined) expect(numbers.relativePercent).toBe(relative.numbers.percent);
        expect(numbers.people).toBe(Math.abs(option.perPeople.difference));
        expect(numbers.nnt).toBe(option.nnt.rounded);
        expect(numbers.nntLabel).toBe(option.nnt.label);
        expect(numbers.from).toBeCloseTo(option.comparisonRisk.estimate * result.denominator, 10);
        expect(numbers.to).toBeCloseTo(option.interventionRisk.estimate * result.denominator, 10);
      }
    }
  });

  it('shows the people of the same result beside the cards, with its source line', () => {
    const slide = buildSlide(itemOf(demoTopic(STONE)), 'framing');
    expect(slide.layout).toBe('cards');
    expect(slide.panels.map((panel) => panel.chips.map((chip) => [chip.look, chip.count]))).toEqual([
      [
        ['event', 24],
        ['helped', 16],
        ['free', 60],
      ],
    ]);
    // RR 0.6 at 40%: 40% lower, 40 − 24 = 16 in 100 fewer, 100 ÷ 16 = 6.25 → 7 (derived).
    expect(slide.cards.map((card) => card.value)).toEqual(['40% lower risk', '16 in 100 fewer', 'Treat 7 to prevent 1']);
    // Akl et al. (Cochrane Database Syst Rev 2011;(3):CD006776), abstract: compared with the absolute
    // reduction, a relative reduction made little or no difference to understanding but was seen as
    // larger and was more persuasive; the NNT was understood less well than the absolute reduction.
    // Zipkin et al. (Ann Intern Med 2014;161:270–280), abstract: absolute formats were better
    // understood than relative ones, and the NNT lessened understanding.
    expect(slide.evidence).toEqual({
      finding:
        'Relative reductions looked bigger and swayed patients and clinicians more; absolute numbers were as clear or clearer, the NNT less.',
      source: 'Akl 2011, Cochrane · Zipkin 2014, Annals',
    });
  });
});

describe('the working shown on the cards', () => {
  it('writes decimals to at most two places, trailing zeros dropped, without float noise', () => {
    // 1.005 is stored as 1.00499999999999989…; a risk of 1.005 in 100 still reads 1.01 (common practice: decimal rounding).
    expect([11.25, 3.75, 26.666666, 15, 1.005, 0.1 + 0.2, 169.5560560966].map(shortDecimal)).toEqual([
      '11.25',
      '3.75',
      '26.67',
      '15',
      '1.01',
      '0.3',
      '169.56',
    ]);
  });
});
