import { describe, expect, it } from 'vitest';
import { lookOf } from '../../../src/core/direction.ts';
import type { PersonGroup } from '../../../src/core/types.ts';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { type ChartPalette, blackAndWhitePalette, colourPalette } from '../../../src/render/palette.ts';
import { updateChart } from '../../../src/render/svg/update-chart.ts';
import { topicFixture } from '../topic-fixture.ts';
import { drawIntoPage, outcomeCounts, testDocument } from './parse-svg.ts';

const stroke = (comparison: number, intervention: number, denominator: 100 | 1000 = 100) =>
  outcomeChart(
    topicFixture(denominator, { comparison, intervention, range: { lower: intervention - 2, upper: intervention + 3 } }),
    'stroke',
  );

/**
 * The fill and outline a person is painted with: their own attribute, or else the one
 * their people group sets. SVG 1.1 (Second Edition, W3C 2011), §11.3: the `fill` and
 * `stroke` properties are inherited.
 */
function effectivePaint(person: Element): { fill: string | null; stroke: string | null } {
  const group = person.parentElement;
  return {
    fill: person.getAttribute('fill') ?? group?.getAttribute('fill') ?? null,
    stroke: person.getAttribute('stroke') ?? group?.getAttribute('stroke') ?? null,
  };
}

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

describe('drawn people', () => {
  it.each([
    ['colour', colourPalette],
    ['black-and-white', blackAndWhitePalette],
  ] as const)('paint every person in their group’s %s look, whether their own or inherited from the group', (_, palette) => {
    // Invented counts per 1000: 125 without and 94 with the option, so all of event,
    // prevented and free are drawn.
    const svg = drawIntoPage(stroke(125, 94, 1000), { palette });
    const people = [...svg.querySelectorAll('g.people > [data-outcome]')];
    expect(people).toHaveLength(2000);
    for (const person of people) {
      const group = person.getAttribute('data-outcome') as PersonGroup;
      expect(effectivePaint(person)).toEqual(expectedPaint(palette, group, false, 'chart-stroke'));
    }
  });

  it('lets people without the outcome carry only their place and group, and no per-person style or transform', () => {
    const svg = drawIntoPage(stroke(125, 94, 1000));
    const free = [...svg.querySelectorAll('g.people > [data-outcome="free"]')];
    expect(free).toHaveLength(875 + 875);
    for (const person of free) expect(person.getAttributeNames()).toEqual(['d', 'data-outcome']);
    expect(svg.querySelectorAll('g.people [style], g.people [transform], g.people [class]')).toHaveLength(0);
    // Every person's path starts at an absolute point of their own.
    const starts = new Set(
      [...svg.querySelectorAll('g.people > path')].map((person) => /^M[^a-z]+/.exec(person.getAttribute('d') ?? '')?.[0]),
    );
    expect(starts.size).toBe(1000);
  });
});

describe('updated people', () => {
  it('ends in the same state as a fresh drawing when people return to the inherited look and the range moves', () => {
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

  it('ends in the same state as a fresh drawing after several updates back and forth', () => {
    const updated = drawIntoPage(stroke(125, 94, 1000), { palette: blackAndWhitePalette });
    for (const [comparison, intervention] of [
      [200, 150],
      [90, 60],
      [125, 94],
    ] as const) {
      updateChart(updated, stroke(comparison, intervention, 1000));
    }
    const updatedText = updated.outerHTML;
    const fresh = drawIntoPage(stroke(125, 94, 1000), { palette: blackAndWhitePalette });
    expect(updatedText).toBe(fresh.outerHTML);
  });

  it('writes no attribute with the value it already has', () => {
    // In the black-and-white theme events and benefits share a black outline, so a person
    // moving between them keeps their stroke.
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
