import { describe, expect, it } from 'vitest';
import type { PersonGroup } from '../../../src/core/types.ts';
import { type ChartModel, outcomeChart, pairChart } from '../../../src/render/chart-model.ts';
import { blackAndWhitePalette } from '../../../src/render/palette.ts';
import { svgForExport } from '../../../src/render/export/svg-for-export.ts';
import { renderChartSvg } from '../../../src/render/svg/render-chart-svg.ts';
import { topicFixture } from '../topic-fixture.ts';
import { drawIntoPage, lineText, outcomeCounts, parseSvg, peopleCount, testDocument } from './parse-svg.ts';
import { pathRuns, runBox } from './path-subpaths.ts';

const GROUPS: readonly PersonGroup[] = ['event', 'prevented', 'caused', 'free'];

/** The counts the model says each array should draw, with zeros left out. */
function expectedCounts(model: ChartModel, index: number): Record<string, number> {
  const groups = model.arrays[index]!.groups;
  return Object.fromEntries(GROUPS.filter((group) => groups[group] > 0).map((group) => [group, groups[group]]));
}

function drawnCounts(svg: SVGSVGElement, index: number): Record<string, number> {
  return outcomeCounts(svg.querySelectorAll('g.chart-array')[index]!);
}

/** Render in the shared test document (a fresh jsdom per call is slow). */
const render = (model: ChartModel, options: Parameters<typeof renderChartSvg>[1] = {}) =>
  renderChartSvg(model, { document: testDocument, ...options });

describe('renderChartSvg people', () => {
  // Counts per 100 and per 1000 including risks of 0 and 1 and a difference of 0 (invented
  // numbers); expected counts are the model's groups, from peopleGroups (every person drawn,
  // Ancker et al. 2006, JAMIA 13:608: part-to-whole graphics show the whole denominator).
  it.each([
    [100, 19, 15],
    [100, 0, 0],
    [100, 100, 100],
    [100, 0, 3],
    [100, 100, 96],
    [100, 20, 20],
    [1000, 125, 94],
    [1000, 0, 0],
    [1000, 1000, 1000],
    [1000, 20, 30],
    [1000, 40, 40],
  ] as const)(
    'draws every person of each group in one shape per group, per %i with %i without and %i with the option',
    (denominator, comparison, intervention) => {
      const model = outcomeChart(topicFixture(denominator, { comparison, intervention }), 'stroke');
      const svg = drawIntoPage(model);
      for (const index of [0, 1]) expect(drawnCounts(svg, index)).toEqual(expectedCounts(model, index));
      expect(peopleCount(svg)).toBe(denominator * 2);
      for (const array of svg.querySelectorAll('g.chart-array')) {
        const shapes = [...array.querySelectorAll('[data-outcome]')];
        expect(new Set(shapes.map((shape) => shape.getAttribute('data-outcome'))).size).toBe(shapes.length);
        // Each shape has one run of subpaths per person it counts.
        for (const shape of shapes)
          expect(pathRuns(shape.getAttribute('d') ?? '')).toHaveLength(Number(shape.getAttribute('data-count')));
      }
    },
  );

  // A bare pair: baseline 20%, RR 0.75 → 15% (p1 = p0 × RR; Cochrane Handbook 5.1, §12.5.4), per 100.
  it('draws 200 people for a bare pair of 20% and RR 0.75 per 100', () => {
    const model = pairChart({
      perPeople: { denominator: 100, comparison: 20, intervention: 15, difference: 5, interventionRange: null },
      risks: { comparison: 0.2, intervention: 0.15 },
    });
    const svg = parseSvg(render(model));
    expect(peopleCount(svg)).toBe(200);
    expect(drawnCounts(svg, 0)).toEqual({ event: 20, free: 80 });
    expect(drawnCounts(svg, 1)).toEqual({ event: 15, prevented: 5, free: 80 });
  });

  it('gives data-outcome and data-count to the people’s shapes only; the outline and swatches have none', () => {
    const svg = drawIntoPage(outcomeChart(topicFixture(), 'stroke'), { showRange: true });
    for (const element of svg.querySelectorAll('[data-outcome]')) {
      expect(element.tagName).toBe('path');
      expect(element.parentElement?.getAttribute('class')).toBe('people');
      expect(Number(element.getAttribute('data-count'))).toBeGreaterThan(0);
    }
    for (const group of svg.querySelectorAll('g.people')) {
      expect(peopleCount(group)).toBe(100);
      for (const child of group.children) expect(child.hasAttribute('data-outcome')).toBe(true);
    }
    const outlines = [...svg.querySelectorAll('[data-look="outline"]')];
    expect(outlines.map((outline) => [outline.hasAttribute('data-outcome'), outline.getAttribute('data-count')])).toEqual([
      [false, '6'],
    ]);
    expect(svg.querySelectorAll('path.swatch').length).toBeGreaterThan(0);
    expect(svg.querySelectorAll('path.swatch[data-outcome]')).toHaveLength(0);
    expect(svg.querySelectorAll('use')).toHaveLength(0);
  });

  it('fills the benefit with the dot pattern and the harm with the hatch pattern', () => {
    const result = topicFixture();
    const benefit = drawIntoPage(outcomeChart(result, 'stroke'));
    const harm = drawIntoPage(outcomeChart(result, 'muscle-pain'));
    const fills = (svg: SVGSVGElement, group: string) =>
      new Set([...svg.querySelectorAll(`[data-outcome="${group}"]`)].map((element) => element.getAttribute('fill')));
    expect(fills(benefit, 'prevented')).toEqual(new Set(['url(#chart-stroke-dots)']));
    expect(fills(harm, 'caused')).toEqual(new Set(['url(#chart-muscle-pain-hatch)']));
    expect(fills(benefit, 'event')).toEqual(new Set(['#0072B2']));
    expect(benefit.querySelector('pattern#chart-stroke-dots circle')).not.toBeNull();
    expect(harm.querySelector('pattern#chart-muscle-pain-hatch path')).not.toBeNull();
  });
});

describe('renderChartSvg accessibility', () => {
  // WCAG 2.2 SC 1.1.1 Non-text Content: the graphic has a text alternative that serves the same
  // purpose, so it repeats every count.
  it('marks the chart role="img" with a title and label stating every count', () => {
    const model = outcomeChart(topicFixture(), 'stroke');
    const svg = parseSvg(render(model));
    expect(svg.getAttribute('role')).toBe('img');
    const label = svg.getAttribute('aria-label') ?? '';
    const title = svg.querySelector('title')?.textContent ?? '';
    expect(title).toBe(label);
    for (const text of [
      '19 have a stroke',
      '81 do not have a stroke',
      '15 have a stroke anyway',
      '4 avoid a stroke because of option A',
      'between 12 and 18 of these 100',
    ]) {
      expect(label).toContain(text);
    }
  });

  it('writes the labels with their counts beside the groups as text', () => {
    const svg = drawIntoPage(outcomeChart(topicFixture(), 'muscle-pain'));
    const texts = [...svg.querySelectorAll('text.legend-label')].map(lineText);
    expect(texts).toEqual([
      '3 have muscle pain',
      '97 do not have muscle pain',
      '3 have muscle pain anyway',
      '2 get muscle pain because of option A',
      '95 do not have muscle pain',
    ]);
    expect([...svg.querySelectorAll('text.legend-note')].map(lineText)).toEqual([
      'With option A, anywhere between 4 and 7 of these 100 could have muscle pain (range: 95% interval).',
    ]);
  });
});

describe('renderChartSvg range', () => {
  it('draws no one ringed by default', () => {
    const svg = drawIntoPage(outcomeChart(topicFixture(), 'stroke'));
    expect(svg.querySelectorAll('.range-outline, [stroke-dasharray]')).toHaveLength(0);
  });

  it('rings the people between the lower and upper count when showRange is on', () => {
    const svg = drawIntoPage(outcomeChart(topicFixture(), 'stroke'), { showRange: true });
    // Range 12 to 18 around 15: ranks 12–17 (six people) could be either way.
    expect(ringedOutcomes(svg, 1)).toEqual(['event', 'event', 'event', 'prevented', 'prevented', 'prevented']);
    expect(ringedOutcomes(svg, 0)).toEqual([]);
    expect(svg.querySelectorAll('g.people [stroke-dasharray]')).toHaveLength(0);
  });

  // The outline marks people; it never moves them between groups, so the picture shows the
  // totals its legend gives (Ancker et al. 2006, JAMIA 13:608: part-to-whole graphics).
  it.each([false, true])('keeps every person’s group and paint when the outline is on (wanted event: %s)', (wanted) => {
    const model = outcomeChart(
      topicFixture(100, { comparison: 20, intervention: 31, range: { lower: 24, upper: 40 }, wanted }),
      'stroke',
    );
    const paint = (svg: SVGSVGElement) =>
      [...svg.querySelectorAll('g.people > path')].map(
        (person) => `${person.getAttribute('data-outcome')} ${person.getAttribute('fill')} ${person.getAttribute('stroke')}`,
      );
    const plain = paint(drawIntoPage(model));
    const outlined = drawIntoPage(model, { showRange: true });
    expect(paint(outlined)).toEqual(plain);
    expect(drawnCounts(outlined, 1)).toEqual({ event: 20, caused: 11, free: 69 });
    // Ranks 24–39: 7 gained people and 9 without the event, every one still in their own look.
    expect(ringedOutcomes(outlined, 1)).toEqual([...Array<string>(7).fill('caused'), ...Array<string>(9).fill('free')]);
  });
});

/**
 * The groups of the people an array's range outline rings: each ring (one run of the
 * outline's path) is matched to the person whose figure holds the ring's centre.
 */
function ringedOutcomes(svg: SVGSVGElement, index: number): (string | null)[] {
  const array = svg.querySelectorAll('g.chart-array')[index]!;
  const figures = [...array.querySelectorAll('g.people > path')].flatMap((shape) =>
    pathRuns(shape.getAttribute('d') ?? '').map((run) => ({ group: shape.getAttribute('data-outcome'), box: runBox(run) })),
  );
  const outline = array.querySelector('path.range-outline');
  if (outline === null) return [];
  const rings = pathRuns(outline.getAttribute('d') ?? '');
  expect(rings).toHaveLength(Number(outline.getAttribute('data-count')));
  return rings.map((ring) => {
    const box = runBox(ring);
    const [x, y] = [(box.left + box.right) / 2, (box.top + box.bottom) / 2];
    const found = figures.filter(({ box: f }) => f.left <= x && x <= f.right && f.top <= y && y <= f.bottom);
    expect(found).toHaveLength(1);
    return found[0]?.group ?? null;
  });
}

describe('renderChartSvg output', () => {
  it('is byte-identical for the same input, with one shape per group and array in the text', () => {
    const model = outcomeChart(
      topicFixture(1000, { comparison: 125, intervention: 94, range: { lower: 80, upper: 110 } }),
      'stroke',
    );
    const text = render(model, { showRange: true });
    expect(render(model, { showRange: true })).toBe(text);
    const count = (group: string) =>
      [...text.matchAll(new RegExp(`data-outcome="${group}" data-count="(\\d+)"`, 'g'))].map((found) => Number(found[1]));
    expect([count('event'), count('prevented'), count('caused'), count('free')]).toEqual([[125, 94], [31], [], [875, 875]]);
    expect(text.split('data-outcome=').length - 1).toBe(5);
    const scattered = outcomeChart(topicFixture(), 'stroke', { arrangement: 'scattered' });
    expect(render(scattered)).toBe(render(outcomeChart(topicFixture(), 'stroke', { arrangement: 'scattered' })));
  });

  it('changes when a count changes', () => {
    const first = render(outcomeChart(topicFixture(100, { comparison: 19, intervention: 15 }), 'stroke'));
    const second = render(outcomeChart(topicFixture(100, { comparison: 19, intervention: 14 }), 'stroke'));
    expect(first).not.toBe(second);
  });

  it('rounds every coordinate to at most three decimals', () => {
    const text = render(outcomeChart(topicFixture(), 'stroke'), { width: 613.37, fontSize: 13.333 });
    expect(text.match(/\d\.\d{4,}/g)).toBeNull();
  });

  it('is standalone SVG with the namespace, a viewBox and the palette it used', () => {
    const text = render(outcomeChart(topicFixture(), 'stroke'), { palette: blackAndWhitePalette, width: 600 });
    expect(text.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    const svg = parseSvg(text);
    expect(svg.getAttribute('viewBox')).toMatch(/^0 0 600 \d+(\.\d+)?$/);
    expect(svg.getAttribute('data-palette')).toBe('black-and-white');
    expect(svg.querySelector('[data-outcome="event"]')?.getAttribute('fill')).toBe('#000000');
  });

  it('draws in a fresh jsdom document when none is given, with the same result', () => {
    const model = outcomeChart(topicFixture(), 'stroke');
    expect(renderChartSvg(model)).toBe(render(model));
  });

  it('becomes a standalone file 180 mm wide that still parses, with every person', () => {
    const svg = parseSvg(svgForExport(render(outcomeChart(topicFixture(), 'stroke'))));
    expect(svg.getAttribute('width')).toBe('180mm');
    expect(peopleCount(svg)).toBe(200);
  });
});
