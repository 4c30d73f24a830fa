// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { FOOTER_TOP, SLIDE_HEIGHT, SLIDE_WIDTH, slideSvgText } from '../../src/teaching/slide-svg.ts';
import { teachingMessagesEn } from '../../src/teaching/messages/en.ts';
import { slidePlaces } from '../../src/teaching/slide-places.ts';
import { STONE, SCREENING, WANTED, demoTopic, fixtureTopic, itemOf } from './teaching-fixtures.ts';

// A slide for slide decks: 16:9 at 1920 × 1080 (ITU-R BT.709 full HD frame), standalone SVG 1.1
// text with its XML declaration (W3C SVG 1.1, §1.3), every person of every array drawn.

function parsed(text: string): Document {
  return new DOMParser().parseFromString(text, 'image/svg+xml');
}

describe('a slide as an SVG file', () => {
  it.each([
    [STONE, demoTopic],
    [SCREENING, demoTopic],
    [WANTED, fixtureTopic],
  ])('writes every slide of %s as a full-HD standalone SVG with all its people', (name, topicOf) => {
    const item = itemOf(topicOf(name));
    for (const { kind, part } of slidePlaces([item])) {
      const slide = buildSlide(item, kind, teachingMessagesEn, part);
      const text = slideSvgText(slide, document, 'Slide 1 of 11', 'Illustrative');
      expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg')).toBe(true);
      const doc = parsed(text);
      expect(doc.querySelector('parsererror')).toBeNull();
      const root = doc.documentElement;
      expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
      expect(root.getAttribute('viewBox')).toBe(`0 0 ${SLIDE_WIDTH} ${SLIDE_HEIGHT}`);
      const people = slide.panels.reduce((sum, panel) => sum + panel.layout.denominator, 0);
      // One shape per group and look of each panel; their counts add up to every person (none without a count).
      const shapes = [...doc.querySelectorAll('path.person')];
      expect(shapes.every((shape) => shape.hasAttribute('data-count') && shape.hasAttribute('data-outcome'))).toBe(true);
      expect(shapes.reduce((sum, shape) => sum + Number(shape.getAttribute('data-count')), 0)).toBe(people);
      // Legend swatches keep no group.
      expect(doc.querySelectorAll('svg svg [data-outcome]')).toHaveLength(0);
      const words = doc.documentElement.textContent ?? '';
      expect(words).toContain(slide.heading.split(' ')[0] ?? '');
      // Everything of the slide stays above the footer rule.
      expect(Number(root.getAttribute('data-content-bottom')), `${name} ${kind} ${part}`).toBeLessThanOrEqual(FOOTER_TOP);
      expect(words.includes('Illustrative')).toBe(slide.illustrative);
    }
  });

  it('keeps the framing cards, the evidence and its source in the file', () => {
    const slide = buildSlide(itemOf(demoTopic(STONE)), 'framing');
    const words = (parsed(slideSvgText(slide, document, 'footer', 'Illustrative')).documentElement.textContent ?? '').replace(
      /\s+/g,
      ' ',
    );
    for (const text of ['40% lower risk', '16 in 100 fewer', 'Treat 7 to prevent 1', 'Akl 2011', 'footer']) {
      expect(words).toContain(text);
    }
  });

  it('keeps pattern ids unique within the file', () => {
    const slide = buildSlide(itemOf(demoTopic(STONE)), 'helped');
    const ids = [...parsed(slideSvgText(slide, document, '', '')).querySelectorAll('[id]')].map((element) => element.id);
    expect(new Set(ids).size).toBe(ids.length);
  });
});
