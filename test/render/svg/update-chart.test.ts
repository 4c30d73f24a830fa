import { describe, expect, it } from 'vitest';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { blackAndWhitePalette } from '../../../src/render/palette.ts';
import { updateChart } from '../../../src/render/svg/update-chart.ts';
import { topicFixture } from '../topic-fixture.ts';
import { drawIntoPage, outcomeCounts, peopleCount, testDocument } from './parse-svg.ts';

const stroke = (comparison: number, intervention: number, denominator: 100 | 1000 = 100) =>
  outcomeChart(
    topicFixture(denominator, { comparison, intervention, range: { lower: intervention - 2, upper: intervention + 3 } }),
    'stroke',
  );

/** People's shapes whose attributes an action changed, seen by a MutationObserver. */
async function touchedPeople(svg: SVGSVGElement, action: () => void): Promise<Set<Element>> {
  const touched = new Set<Element>();
  const observer = new testDocument.defaultView!.MutationObserver((records) => {
    for (const record of records) {
      const target = record.target as Element;
      if (target.parentElement?.getAttribute('class') === 'people') touched.add(target);
    }
  });
  observer.observe(svg, { attributes: true, subtree: true });
  action();
  await Promise.resolve();
  for (const record of observer.takeRecords()) {
    const target = record.target as Element;
    if (target.parentElement?.getAttribute('class') === 'people') touched.add(target);
  }
  observer.disconnect();
  return touched;
}

describe('updateChart', () => {
  it('rewrites only the shapes of the groups whose people changed, and keeps every other element', async () => {
    const svg = drawIntoPage(stroke(20, 15));
    const before = [...svg.querySelectorAll('g.people > path')];
    let update = { redrawn: true, peopleChanged: -1 };
    const touched = await touchedPeople(svg, () => {
      update = updateChart(svg, stroke(20, 12));
    });
    // 15 → 12 with the option: ranks 12, 13 and 14 go from event to prevented.
    expect(update).toEqual({ redrawn: false, peopleChanged: 3 });
    const after = [...svg.querySelectorAll('g.people > path')];
    // Same elements (no shape added or removed); of them only the option's event and prevented shapes were written.
    expect(after).toHaveLength(before.length);
    after.forEach((shape, index) => expect(shape).toBe(before[index]));
    const option = [...svg.querySelectorAll('g.chart-array')[1]!.querySelectorAll('g.people > path')];
    expect([...touched]).toEqual(option.slice(0, 2));
    expect(option.map((shape) => [shape.getAttribute('data-outcome'), shape.getAttribute('data-count')])).toEqual([
      ['event', '12'],
      ['prevented', '8'],
      ['free', '80'],
    ]);
    expect(outcomeCounts(svg.querySelectorAll('g.chart-array')[1]!)).toEqual({ event: 12, prevented: 8, free: 80 });
  });

  it('adds a shape for a group that gains its first person in its place, and removes one left with no one', () => {
    const svg = drawIntoPage(stroke(20, 20));
    const [event, free] = [...svg.querySelectorAll('g.chart-array')[1]!.querySelectorAll('g.people > path')];
    updateChart(svg, stroke(20, 17));
    const grown = [...svg.querySelectorAll('g.chart-array')[1]!.querySelectorAll('g.people > path')];
    expect(grown.map((shape) => shape.getAttribute('data-outcome'))).toEqual(['event', 'prevented', 'free']);
    expect(grown[0]).toBe(event);
    expect(grown[2]).toBe(free);
    updateChart(svg, stroke(20, 20));
    expect([...svg.querySelectorAll('g.chart-array')[1]!.querySelectorAll('g.people > path')]).toEqual([event, free]);
  });

  it('updates the labels and the text alternative with the new counts', () => {
    const svg = drawIntoPage(stroke(20, 15));
    updateChart(svg, stroke(20, 12));
    expect(svg.getAttribute('aria-label')).toContain('8 avoid a stroke because of option A');
    expect(svg.querySelector('title')?.textContent).toContain('12 have a stroke anyway');
    expect([...svg.querySelectorAll('text.legend-label')].map((element) => element.textContent)).toContain(
      '8 avoid a stroke because of option A',
    );
  });

  it('touches no one when nothing changed', () => {
    const svg = drawIntoPage(stroke(125, 94, 1000));
    expect(updateChart(svg, stroke(125, 94, 1000))).toEqual({ redrawn: false, peopleChanged: 0 });
  });

  it('ends in the same state as a fresh drawing', () => {
    const updated = drawIntoPage(stroke(20, 15), { showRange: true });
    updateChart(updated, stroke(20, 9));
    const updatedText = updated.outerHTML;
    const fresh = drawIntoPage(stroke(20, 9), { showRange: true });
    expect(updatedText).toBe(fresh.outerHTML);
  });

  it('keeps showing the range outline it was drawn with', () => {
    const svg = drawIntoPage(stroke(20, 15), { showRange: true });
    updateChart(svg, stroke(20, 12));
    // Range 10 to 15 around 12: ranks 10–14 ringed.
    const outline = svg.querySelectorAll('g.chart-array')[1]!.querySelector('path.range-outline');
    expect(outline?.getAttribute('data-count')).toBe('5');
    expect(outline?.getAttribute('d')?.match(/M/g)).toHaveLength(5);
  });

  it('redraws everything when the denominator changes or new options are given', () => {
    const svg = drawIntoPage(stroke(20, 15));
    expect(updateChart(svg, stroke(200, 150, 1000)).redrawn).toBe(true);
    expect(peopleCount(svg)).toBe(2000);
    const other = drawIntoPage(stroke(20, 15));
    expect(updateChart(other, stroke(20, 15), { palette: blackAndWhitePalette }).redrawn).toBe(true);
    expect(other.getAttribute('data-palette')).toBe('black-and-white');
  });
});

describe('updateChart and the event’s direction', () => {
  // Invented counts: 20 without and 30 with the option. As an event to avoid the 10 extra
  // people are harmed; as a wanted event the same 10 are helped (lookOf in core/direction.ts).
  const pair = (wanted: boolean) => outcomeChart(topicFixture(100, { comparison: 20, intervention: 30, wanted }), 'stroke');

  it('repaints the same people when the event turns out to be wanted, and matches a fresh drawing', () => {
    const svg = drawIntoPage(pair(false));
    const update = updateChart(svg, pair(true));
    expect(update).toEqual({ redrawn: false, peopleChanged: 10 });
    expect(svg.getAttribute('data-wanted')).toBe('true');
    const updatedText = svg.outerHTML;
    expect(updatedText).toBe(drawIntoPage(pair(true)).outerHTML);
  });
});

describe('updateChart and the range outline', () => {
  it('gives only arrays with an interval an outline, and redraws when an interval goes away', () => {
    const svg = drawIntoPage(stroke(20, 15), { showRange: true });
    const outlines = () =>
      [...svg.querySelectorAll('g.chart-array')].map((array) => array.querySelector(':scope > path.range-outline') !== null);
    expect(outlines()).toEqual([false, true]);
    const noInterval = outcomeChart(topicFixture(100, { comparison: 20, intervention: 15, range: null }), 'stroke');
    expect(updateChart(svg, noInterval).redrawn).toBe(true);
    expect(outlines()).toEqual([false, false]);
    expect(svg.getAttribute('data-show-range')).toBe('true');
  });
});
