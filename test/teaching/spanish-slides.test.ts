// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import type { Topic } from '../../src/core/topic/topic.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { teachingMessagesWith } from '../../src/teaching/messages/en.ts';
import { teachingPatientSlideMessagesEs } from '../../src/teaching/messages/es.ts';
import { slidePlaces } from '../../src/teaching/slide-places.ts';
import { FOOTER_TOP, slideSvgText } from '../../src/teaching/slide-svg.ts';
import { itemOf, pairTopic } from './teaching-fixtures.ts';

// A Spanish topic's slides: the patient's words in Spanish with a decimal comma (RAE & ASALE 2010,
// Ortografía de la lengua española, chapter on numerals; from memory), the lesson's commentary in
// the clinician's English. The topic is invented and illustrative.

const spanish = teachingMessagesWith(teachingPatientSlideMessagesEs);

/** An invented illustrative topic typed in Spanish: 15 in 100 have a heart attack in 5 years; the pill cuts that by a quarter and dizziness goes from 5 to 7.5 in 100. */
function pillTopic(): Topic {
  const topic = pairTopic({
    baseline: '15%',
    effect: { measure: 'rr', estimate: 0.75 },
    name: 'un infarto',
    harm: { baseline: '5%', effect: { measure: 'rr', estimate: 1.5 }, name: 'mareos' },
  });
  return {
    ...topic,
    language: 'es',
    title: 'Una pastilla para la tensión (ilustrativo)',
    population: 'adultos de 60 años con la tensión alta',
    options: [
      { id: 'untreated', name: 'no tomar nada', isComparison: true },
      { id: 'treated', name: 'la pastilla', isComparison: false },
    ],
  };
}

const svgWords = (svg: string): string =>
  (new DOMParser().parseFromString(svg, 'image/svg+xml').documentElement.textContent ?? '').replace(/\s+/g, ' ');

describe('the slides of a Spanish topic', () => {
  const item = itemOf(pillTopic(), {}, 100);
  const slideOf = (kind: Parameters<typeof buildSlide>[1], part = 0) => buildSlide(item, kind, spanish, part);

  it('tells the story in Spanish', () => {
    const title = slideOf('title');
    expect(title.lines.map((line) => line.text).slice(0, 3)).toEqual([
      'Para adultos de 60 años con la tensión alta.',
      'Todas las cifras cuentan lo que pasa durante 5 años.',
      'Se compara la pastilla con no tomar nada.',
    ]);
    const baseline = slideOf('baseline');
    expect(baseline.heading).toBe('Sin la opción');
    expect(baseline.callouts.map((callout) => `${callout.value} ${callout.text}`)).toEqual([
      '15 de cada 100 tienen un infarto durante 5 años',
      '85 de cada 100 no tienen un infarto',
    ]);
    expect(baseline.panels[0]?.title).toBe('No tomar nada');
    const helped = slideOf('helped');
    expect(helped.heading).toBe('A quién ayuda');
    expect(helped.callouts[0]?.text).toBe('evitan un infarto gracias a la pastilla');
    expect(slideOf('harmed').callouts[0]?.text).toBe('tienen mareos a causa de la pastilla');
  });

  it('writes the framing cards with a decimal comma, under the clinician’s heading and evidence', () => {
    const framing = slideOf('framing');
    expect(framing.heading).toBe('One result, four ways');
    expect(framing.cards.map((card) => [card.value, card.detail])).toEqual([
      ['Riesgo un 25\u00a0% menor', 'De 15 a 11,25 de cada 100'],
      ['4 menos de cada 100', '15 − 11,25 = 3,75 menos de cada 100'],
      ['Tratar a 27 para evitar 1', '100 ÷ 3,75 = 26,67, redondeado hacia arriba: 27'],
    ]);
    expect(framing.evidence?.source).toBe('Akl 2011, Cochrane · Zipkin 2014, Annals');
  });

  it('keeps the format demonstrations’ titles in English and their counts in Spanish', () => {
    const arrangement = slideOf('arrangement');
    expect(arrangement.panels.map((panel) => panel.title)).toEqual(['Grouped', 'Scattered']);
    expect(arrangement.panels[0]?.description).toContain('no tienen un infarto');
  });

  it('draws every slide as SVG text in Spanish, above the footer', () => {
    for (const { kind, part } of slidePlaces([item])) {
      const slide = buildSlide(item, kind, spanish, part);
      const svg = slideSvgText(slide, document, 'Slide 1 of 12', 'Illustrative');
      const root = new DOMParser().parseFromString(svg, 'image/svg+xml').documentElement;
      expect(Number(root.getAttribute('data-content-bottom')), `${kind} ${part}`).toBeLessThanOrEqual(FOOTER_TOP);
      const words = svgWords(svg);
      expect(words, kind).not.toMatch(/\b\d+\.\d+\b/);
      expect(words, kind).not.toMatch(/ in 100|because of| have /);
    }
    const framing = svgWords(slideSvgText(slideOf('framing'), document, '', ''));
    expect(framing).toContain('11,25');
    expect(framing).toContain('3,75 menos de cada 100');
    const harmed = svgWords(slideSvgText(slideOf('harmed'), document, '', ''));
    expect(harmed).toContain('tienen mareos a causa de la pastilla');
    expect(harmed).toContain('3 de cada 100');
  });
});
