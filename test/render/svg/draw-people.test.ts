import { describe, expect, it } from 'vitest';
import { lookOf } from '../../../src/core/direction.ts';
import type { PersonGroup } from '../../../src/core/types.ts';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { type ChartPalette, blackAndWhitePalette, colourPalette } from '../../../src/render/palette.ts';
import { drawChart } from '../../../src/render/svg/draw-chart.ts';
import { ringPath } from '../../../src/render/svg/draw-range-rings.ts';
import { updateChart } from '../../../src/render/svg/update-chart.ts';
import { topicFixture } from '../topic-fixture.ts';
import { drawIntoPage, outcomeCounts, testDocument } from './parse-svg.ts';
import { pathRuns, runBox } from './path-subpaths.ts';

const stroke = (comparison: number, intervention: number, denominator: 100 | 1000 = 100) =>
  outcomeChart(
    topicFixture(denominator, { comparison, intervention, range: { lower: intervention - 2, upper: intervention + 3 } }),
    'stroke',
  );

/** The palette's paint of a group's look, with pattern fills named by the chart's ids. */
function expectedPaint(
  palette: ChartPalette,
  group: PersonGroup,
  wanted: boolean,
  idPrefix: string,
): { fill: string; stroke: string } {
  const style = palette.groups[lookOf(group, wanted)];
  const fill = style.pattern === 'solid' ? style.fill : `url(#${idPrefix}-${style.pattern})`;
  return { fill, stroke: style.outline };
}

/** The text of a number as the renderer rounds it (two decimals). */
const hundredths = (value: number) => Math.round(value * 100) / 100;

describe('drawn people', () => {
  it.each([
    ['colour', colourPalette],
    ['black-and-white', blackAndWhitePalette],
  ] as const)('paint each group’s one shape in the group’s %s look', (_, palette) => {
    // Invented counts per 1000: 125 without and 94 with the option, so all of event,
    // prevented and free are drawn.
    const svg = drawIntoPage(stroke(125, 94, 1000), { palette });
    const shapes = [...svg.querySelectorAll('g.people > [data-outcome]')];
    expect(shapes.map((shape) => shape.getAttribute('data-outcome'))).toEqual(['event', 'free', 'event', 'prevented', 'free']);
    for (const shape of shapes) {
      const group = shape.getAttribute('data-outcome') as PersonGroup;
      expect({ fill: shape.getAttribute('fill'), stroke: shape.getAttribute('stroke') }).toEqual(
        expectedPaint(palette, group, false, 'chart-stroke'),
      );
    }
    expect(svg.querySelectorAll('g.people [style], g.people [transform], g.people [class]')).toHaveLength(0);
  });

  it.each([
    [100, 'grouped'],
    [1000, 'grouped'],
    [1000, 'scattered'],
  ] as const)(
    'draw every person of the layout (per %i, %s) inside their group’s shape, at their place',
    (denominator, arrangement) => {
      const model = outcomeChart(
        topicFixture(
          denominator,
          denominator === 100 ? { comparison: 20, intervention: 13 } : { comparison: 200, intervention: 125 },
        ),
        'stroke',
        { arrangement },
      );
      const svg = testDocument.createElementNS('http://www.w3.org/2000/svg', 'svg');
      const frame = drawChart(svg, model);
      model.arrays.forEach((_, index) => {
        const layout = frame.arrays[index]!.grid.layout;
        const { iconSize } = layout.geometry;
        const drawn = new Map<string, string>();
        for (const shape of svg.querySelectorAll('g.chart-array')[index]!.querySelectorAll('g.people > path')) {
          const runs = pathRuns(shape.getAttribute('d') ?? '');
          expect(runs).toHaveLength(Number(shape.getAttribute('data-count')));
          for (const run of runs) {
            const box = runBox(run);
            drawn.set(`${hundredths(box.left)} ${hundredths(box.top)}`, shape.getAttribute('data-outcome') ?? '');
            // The figure stays inside its glyph box (half a hundredth of rounding allowed).
            expect(box.right - box.left).toBeLessThanOrEqual(iconSize + 0.01);
            expect(box.bottom - box.top).toBeLessThanOrEqual(iconSize + 0.01);
          }
        }
        expect(drawn.size).toBe(denominator);
        // Every person of the model is drawn in their own group's shape, inside their own box.
        for (const person of layout.people) {
          const match = [...drawn].find(([key]) => {
            const [left, top] = key.split(' ').map(Number) as [number, number];
            return left >= person.x - 0.01 && left <= person.x + iconSize && top >= person.y - 0.01 && top <= person.y + iconSize;
          });
          expect(match?.[1]).toBe(person.group);
        }
      });
    },
  );
});

describe('updated people', () => {
  it('ends in the same state as a fresh drawing when a group empties and the range moves', () => {
    // 20 → 10 without and 15 → 8 with the option: comparison ranks 10–19 lose the event,
    // and the outlined ranks move from 13–17 to 6–10.
    const updated = drawIntoPage(stroke(20, 15), { showRange: true });
    const update = updateChart(updated, stroke(10, 8));
    expect(update.redrawn).toBe(false);
    const updatedText = updated.outerHTML;
    const fresh = drawIntoPage(stroke(10, 8), { showRange: true });
    expect(updatedText).toBe(fresh.outerHTML);
    expect(outcomeCounts(fresh.querySelectorAll('g.chart-array')[0]!)).toEqual({ event: 10, free: 90 });
  });

  it('ends in the same state as a fresh drawing after several updates back and forth, through groups that come and go', () => {
    const updated = drawIntoPage(stroke(125, 94, 1000), { palette: blackAndWhitePalette });
    for (const [comparison, intervention] of [
      [200, 150],
      [90, 90],
      [90, 160],
      [0, 0],
      [125, 94],
    ] as const) {
      updateChart(updated, stroke(comparison, intervention, 1000));
      expect(updated.outerHTML).toBe(
        drawIntoPage(stroke(comparison, intervention, 1000), { palette: blackAndWhitePalette }).outerHTML,
      );
    }
  });

  it('writes no attribute with the value it already has', () => {
    // In the black-and-white theme events and benefits share a black outline.
    const svg = drawIntoPage(stroke(20, 15), { palette: blackAndWhitePalette, showRange: true });
    const rewrites: string[] = [];
    const observer = new testDocument.defaultView!.MutationObserver(() => undefined);
    observer.observe(svg, { attributes: true, attributeOldValue: true, subtree: true });
    updateChart(svg, stroke(20, 12));
    // Taken at once, before the observer's callback could receive them.
    for (const record of observer.takeRecords()) {
      const target = record.target as Element;
      const name = record.attributeName ?? '';
      if (target.getAttribute(name) === record.oldValue) rewrites.push(`${target.tagName}[${name}]`);
    }
    observer.disconnect();
    expect(rewrites).toEqual([]);
    expect(outcomeCounts(svg.querySelectorAll('g.chart-array')[1]!)).toEqual({ event: 12, prevented: 8, free: 80 });
  });

  it('keeps unchanged titles and swatches, and swaps in only the labels whose counts changed', () => {
    const svg = drawIntoPage(stroke(20, 15));
    const title = svg.querySelectorAll('g.chart-array')[1]!.querySelector('text.array-title');
    const swatches = [...svg.querySelectorAll('path.swatch')];
    updateChart(svg, stroke(20, 12));
    expect(svg.querySelectorAll('g.chart-array')[1]!.querySelector('text.array-title')).toBe(title);
    const after = [...svg.querySelectorAll('path.swatch')];
    expect(after).toHaveLength(swatches.length);
    after.forEach((swatch, index) => expect(swatch).toBe(swatches[index]));
    expect([...svg.querySelectorAll('text.legend-label')].map((element) => element.textContent)).toContain(
      '8 avoid a stroke because of option A',
    );
  });
});

describe('the range outline’s ring path', () => {
  // The path a rounded <rect> stands for: SVG 2 (W3C 2018), §10.2 "The rect element".
  it('starts at (x + r, y) and goes clockwise with a quarter arc at each corner', () => {
    expect(ringPath({ x: 1, y: 2, side: 10, radius: 1, lineWidth: 0.1, dash: [1, 1] })).toBe(
      'M2,2h8a1,1,0,0,1,1,1v8a1,1,0,0,1,-1,1h-8a1,1,0,0,1,-1,-1v-8a1,1,0,0,1,1,-1z',
    );
  });
});
