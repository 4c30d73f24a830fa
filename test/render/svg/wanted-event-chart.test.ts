/**
 * A chart of an event people want ("a response"): the root says so, each person keeps the
 * event meaning of their group, and the gained and lost people take the helped and harmed
 * looks. Invented, illustrative counts per 100: 25 without the option, 45 with option A
 * (risk ratio 1.8 at a baseline of 25%: 0.25 × 1.8 = 0.45; Cochrane Handbook 5.1, §12.5.4).
 */
import { describe, expect, it } from 'vitest';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { OKABE_ITO, colourPalette } from '../../../src/render/palette.ts';
import { renderChartSvg } from '../../../src/render/svg/render-chart-svg.ts';
import { topicFixture } from '../topic-fixture.ts';
import { drawIntoPage, lineText, outcomeCounts, parseSvg, testDocument } from './parse-svg.ts';

const gained = () =>
  outcomeChart(
    topicFixture(100, { comparison: 25, intervention: 45, range: { lower: 35, upper: 58 }, wanted: true, name: 'a response' }),
    'stroke',
  );
const lost = () =>
  outcomeChart(
    topicFixture(100, { comparison: 25, intervention: 18, range: { lower: 14, upper: 23 }, wanted: true, name: 'a response' }),
    'stroke',
  );

/** The fill each group's people are drawn with in an array (own, or inherited from the people's group). */
function fillsByGroup(svg: SVGSVGElement, index: number): Record<string, string[]> {
  const people = svg.querySelectorAll('g.chart-array')[index]!.querySelector('g.people')!;
  const fills: Record<string, Set<string>> = {};
  for (const person of people.children) {
    const group = person.getAttribute('data-outcome') ?? '';
    (fills[group] ??= new Set()).add(person.getAttribute('fill') ?? people.getAttribute('fill') ?? '');
  }
  return Object.fromEntries(Object.entries(fills).map(([group, set]) => [group, [...set]]));
}

describe('a chart of a wanted event', () => {
  it('carries data-wanted on the root svg, true for a wanted event and false otherwise', () => {
    expect(parseSvg(renderChartSvg(gained(), { document: testDocument })).getAttribute('data-wanted')).toBe('true');
    expect(
      parseSvg(renderChartSvg(outcomeChart(topicFixture(), 'stroke'), { document: testDocument })).getAttribute('data-wanted'),
    ).toBe('false');
  });

  it('keeps the event meaning of data-outcome: the 20 who gain it are "caused"', () => {
    const svg = drawIntoPage(gained());
    expect(outcomeCounts(svg.querySelectorAll('g.chart-array')[1]!)).toEqual({ event: 25, caused: 20, free: 55 });
  });

  it('draws people who gain a wanted event in the helped look: the dotted bluish green of prevented people in a chart of an event to avoid', () => {
    const svg = drawIntoPage(gained());
    expect(fillsByGroup(svg, 1)).toEqual({
      event: [OKABE_ITO.blue],
      caused: ['url(#chart-stroke-dots)'],
      free: [colourPalette.groups.free.fill],
    });
    const unwanted = drawIntoPage(outcomeChart(topicFixture(), 'stroke'));
    expect(fillsByGroup(unwanted, 1).prevented).toEqual(['url(#chart-stroke-dots)']);
    // The dot pattern is filled with the helped colour.
    expect(svg.querySelector('#chart-stroke-dots > rect')?.getAttribute('fill')).toBe(OKABE_ITO.bluishGreen);
  });

  it('draws people who lose a wanted event ("prevented") in the harmed look: hatched vermillion', () => {
    const svg = drawIntoPage(lost());
    expect(outcomeCounts(svg.querySelectorAll('g.chart-array')[1]!)).toEqual({ event: 18, prevented: 7, free: 75 });
    expect(fillsByGroup(svg, 1).prevented).toEqual(['url(#chart-stroke-hatch)']);
    expect(svg.querySelector('#chart-stroke-hatch > rect')?.getAttribute('fill')).toBe(OKABE_ITO.vermillion);
  });

  it('gives the legend swatches the looks of their groups', () => {
    const svg = drawIntoPage(gained());
    const swatches = [...svg.querySelectorAll('g.chart-array')[1]!.querySelectorAll('path.swatch')].map((swatch) =>
      swatch.getAttribute('data-look'),
    );
    expect(swatches).toEqual(['event', 'helped', 'free']);
    const lostSwatches = [...drawIntoPage(lost()).querySelectorAll('g.chart-array')[1]!.querySelectorAll('path.swatch')];
    expect(lostSwatches.map((swatch) => swatch.getAttribute('data-look'))).toEqual(['event', 'harmed', 'free']);
  });

  it('labels the groups with words for a good event: has it anyway, has it because of the option, misses out, does not have it', () => {
    expect(
      [...drawIntoPage(gained()).querySelectorAll('g.chart-array')[1]!.querySelectorAll('text.legend-label')].map(lineText),
    ).toEqual(['25 have a response anyway', '20 have a response because of option A', '55 do not have a response']);
    expect(
      [...drawIntoPage(lost()).querySelectorAll('g.chart-array')[1]!.querySelectorAll('text.legend-label')].map(lineText),
    ).toEqual(['18 have a response anyway', '7 miss out on a response because of option A', '75 do not have a response']);
  });

  it('writes a text alternative with every count and no word of avoiding, causing or risk', () => {
    for (const model of [gained(), lost()]) {
      const svg = drawIntoPage(model);
      const label = svg.getAttribute('aria-label') ?? '';
      expect(svg.getAttribute('role')).toBe('img');
      expect(label).toBe(model.description);
      expect(svg.querySelector(':scope > title')?.textContent).toBe(label);
      expect(label).not.toMatch(/\b(avoids?|risks?|caused?|causes)\b/i);
    }
    expect(drawIntoPage(gained()).getAttribute('aria-label')).toContain(
      'With option A: 100 people over 10 years: 25 have a response anyway, 20 have a response because of option A and 55 do not have a response.',
    );
  });
});
