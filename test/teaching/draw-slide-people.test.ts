// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { scaleLayout } from '../../src/render/icon-array-layout.ts';
import { colourPalette } from '../../src/render/palette.ts';
import { buildSlide } from '../../src/teaching/build-slide.ts';
import { drawSlidePeople, drawSwatch } from '../../src/teaching/draw-slide-people.ts';
import { teachingMessagesEn } from '../../src/teaching/messages/en.ts';
import { pathRuns, runBox } from '../render/svg/path-subpaths.ts';
import { STONE, SCREENING, WANTED, demoTopic, fixtureTopic, itemOf } from './teaching-fixtures.ts';

// One figure per person (joined into one shape per group and look), the whole denominator drawn (Ancker et al. 2006); the changed groups
// carry a pattern as well as a colour, so colour is never the only cue (WCAG 2.2, 1.4.1).

const SVG = 'http://www.w3.org/2000/svg';

function drawn(name: string, kind: 'helped' | 'harmed' | 'uncertainty', index: number) {
  const panel = buildSlide(itemOf(demoTopic(name)), kind).panels[index];
  if (panel === undefined) throw new Error('no panel');
  const svg = document.createElementNS(SVG, 'svg');
  drawSlidePeople(svg, panel.layout, panel.looks, `test-${kind}`);
  return { svg, panel };
}

/** People per look: the `data-count`s of the shapes of each look added up. */
const lookCounts = (svg: SVGSVGElement): Record<string, number> => {
  const found: Record<string, number> = {};
  for (const path of svg.querySelectorAll('path.person')) {
    const look = path.getAttribute('data-look') ?? '';
    found[look] = (found[look] ?? 0) + Number(path.getAttribute('data-count'));
  }
  return found;
};

/** Every person the shapes matching `selector` draw. */
const countOf = (svg: SVGSVGElement, selector: string): number =>
  [...svg.querySelectorAll(selector)].reduce((sum, path) => sum + Number(path.getAttribute('data-count')), 0);

describe('drawing a slide’s people', () => {
  it('draws one path per group and look, counting its people, in a square view box for 100', () => {
    const { svg } = drawn(STONE, 'helped', 1);
    expect(svg.querySelectorAll('path.person')).toHaveLength(3);
    expect(countOf(svg, 'path.person')).toBe(100);
    expect(lookCounts(svg)).toEqual({ event: 24, helped: 16, free: 60 });
    const [, , width, height] = (svg.getAttribute('viewBox') ?? '').split(' ').map(Number);
    expect(width).toBeCloseTo(102.5, 6);
    expect(height).toBeCloseTo(102.5, 6);
  });

  it('fills helped people with the dot pattern and harmed people with the hatch, both defined in the drawing', () => {
    const helped = drawn(STONE, 'helped', 1).svg;
    const dots = helped.querySelector('path[data-look="helped"]')?.getAttribute('fill') ?? '';
    expect(dots).toMatch(/^url\(#test-helped-dots\)$/);
    expect(helped.querySelector('pattern#test-helped-dots')).not.toBeNull();
    const harmed = drawn(STONE, 'harmed', 1).svg;
    expect(harmed.querySelector('path[data-look="harmed"]')?.getAttribute('fill')).toBe('url(#test-harmed-hatch)');
    expect(harmed.querySelector('path[data-look="event"]')?.getAttribute('fill')).toBe(colourPalette.groups.event.fill);
  });

  it('draws the people who gain a wanted event with the helped dots and those who miss out with the harm hatch, keeping their groups', () => {
    const item = itemOf(fixtureTopic(WANTED));
    const helped = buildSlide(item, 'helped').panels[1];
    const missed = buildSlide(item, 'harmed', teachingMessagesEn, 1).panels[1];
    if (helped === undefined || missed === undefined) throw new Error('no panel');
    const svg = document.createElementNS(SVG, 'svg');
    drawSlidePeople(svg, helped.layout, helped.looks, 'gain');
    const gained = [...svg.querySelectorAll('path[data-look="helped"]')];
    expect(countOf(svg, 'path[data-look="helped"]')).toBe(18);
    for (const path of gained) {
      expect(path.getAttribute('data-outcome')).toBe('caused');
      expect(path.getAttribute('fill')).toBe('url(#gain-dots)');
    }
    drawSlidePeople(svg, missed.layout, missed.looks, 'miss');
    const lost = [...svg.querySelectorAll('path[data-look="harmed"]')];
    expect(countOf(svg, 'path[data-look="harmed"]')).toBe(10);
    for (const path of lost) {
      expect(path.getAttribute('data-outcome')).toBe('prevented');
      expect(path.getAttribute('fill')).toBe('url(#miss-hatch)');
    }
  });

  it('refuses looks that do not match the people', () => {
    const { panel } = drawn(STONE, 'helped', 1);
    expect(() => drawSlidePeople(document.createElementNS(SVG, 'svg'), panel.layout, panel.looks.slice(1), 'short')).toThrow(
      /100 people but 99 looks/,
    );
  });

  it('draws uncertain people with a dashed outline and no fill colour of their group', () => {
    const { svg } = drawn(STONE, 'uncertainty', 0);
    const outlined = [...svg.querySelectorAll('path[data-look="uncertain"]')];
    // Between 18 and 32 in 100 with extra water, 24 the estimate: 14 people outlined (derived).
    expect(countOf(svg, 'path[data-look="uncertain"]')).toBe(14);
    for (const path of outlined) {
      expect(path.getAttribute('stroke-dasharray')).not.toBeNull();
      expect(path.getAttribute('fill')).toBe(colourPalette.background);
    }
  });

  it('draws 1000 people in blocks, wider than tall', () => {
    const { svg } = drawn(SCREENING, 'helped', 1);
    expect(countOf(svg, 'path.person')).toBe(1000);
    const [, , width, height] = (svg.getAttribute('viewBox') ?? '').split(' ').map(Number);
    expect((width ?? 0) / (height ?? 1)).toBeCloseTo(54 / 21, 6);
  });

  it.each([
    [STONE, 'uncertainty', 0],
    [SCREENING, 'helped', 1],
  ] as const)(
    'draws every person of the model (%s, %s slide) in the shape of their group and look, at their place',
    (name, kind, index) => {
      const { svg, panel } = drawn(name, kind, index);
      // The drawing is in units of a tenth of a cell.
      const scaled = scaleLayout(panel.layout, 10 / panel.layout.geometry.cellSize);
      const { iconSize } = scaled.geometry;
      const drawnAt: { box: ReturnType<typeof runBox>; group: string | null; look: string | null }[] = [];
      for (const path of svg.querySelectorAll('path.person')) {
        const runs = pathRuns(path.getAttribute('d') ?? '');
        expect(runs).toHaveLength(Number(path.getAttribute('data-count')));
        for (const run of runs)
          drawnAt.push({ box: runBox(run), group: path.getAttribute('data-outcome'), look: path.getAttribute('data-look') });
      }
      expect(drawnAt).toHaveLength(scaled.people.length);
      for (const person of scaled.people) {
        const inside = drawnAt.filter(
          ({ box }) =>
            box.left >= person.x - 0.01 &&
            box.right <= person.x + iconSize + 0.01 &&
            box.top >= person.y - 0.01 &&
            box.bottom <= person.y + iconSize + 0.01,
        );
        expect(inside.map(({ group, look }) => `${group} ${look}`)).toEqual([`${person.group} ${panel.looks[person.index]}`]);
      }
    },
  );

  it('draws a legend figure of one look in a unit box', () => {
    const svg = document.createElementNS(SVG, 'svg');
    drawSwatch(svg, 'harmed', 'swatch-test');
    expect(svg.getAttribute('viewBox')).toBe('0 0 10 10');
    const figures = svg.querySelectorAll(':scope > path');
    expect(figures).toHaveLength(1);
    expect(figures[0]?.getAttribute('fill')).toBe('url(#swatch-test-hatch)');
    expect(figures[0]?.getAttribute('data-look')).toBe('harmed');
    expect(figures[0]?.hasAttribute('data-outcome')).toBe(false);
    expect(svg.querySelector('pattern#swatch-test-hatch')).not.toBeNull();
  });
});
