// @vitest-environment node
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import type { PeopleGroups, PersonGroup } from '../../../src/core/types.ts';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { iconArrayLayout } from '../../../src/render/icon-array-layout.ts';
import { colourPalette } from '../../../src/render/palette.ts';
import { drawChartPdf } from '../../../src/render/pdf/draw-chart-pdf.ts';
import { drawIconArrayPdf } from '../../../src/render/pdf/draw-icon-array-pdf.ts';
import { topicFixture } from '../topic-fixture.ts';
import { paintings, pdfColour } from './pdf-content.ts';
import { formPlacements, formStreams, pageContent } from './pdf-forms.ts';

const PDFINFO = '/usr/bin/pdfinfo';

function newDocument(): jsPDF {
  const doc = new jsPDF({ unit: 'mm', format: 'a4' });
  doc.setCreationDate(new Date(Date.UTC(2020, 0, 1)));
  doc.setFileId('00000000000000000000000000000000');
  return doc;
}

/**
 * How many figures the document draws in each look's colour: each form filled in a look's
 * colour counts once per placement on the page, a figure drawn on the page itself (a legend
 * sample) once.
 */
function figuresByGroup(pdf: string) {
  const forms = formStreams(pdf);
  const placements = formPlacements(pdf);
  const uses = (name: string) => placements.filter((placement) => placement.form === name).length;
  const painted = [
    ...paintings(pageContent(pdf)).map((painting) => ({ painting, times: 1 })),
    ...[...forms].flatMap(([name, stream]) =>
      paintings(`stream\n${stream}endstream`).map((painting) => ({ painting, times: uses(name) })),
    ),
  ];
  const count = (hex: string, operators: readonly string[]) =>
    painted
      .filter(({ painting }) => painting.fill === pdfColour(hex) && operators.includes(painting.operator))
      .reduce((sum, { times }) => sum + times, 0);
  const { groups } = colourPalette;
  // Solid groups are filled and stroked in one operator (B); patterned ones are filled (f),
  // then overlaid through a clip and stroked (ISO 32000-1 §8.5.3).
  return {
    event: count(groups.event.fill, ['B']),
    helped: count(groups.helped.fill, ['f']),
    harmed: count(groups.harmed.fill, ['f']),
    free: count(groups.free.fill, ['B']),
  };
}

const hundred: PeopleGroups = { denominator: 100, event: 15, prevented: 5, caused: 0, free: 80 };
const thousand: PeopleGroups = { denominator: 1000, event: 20, prevented: 0, caused: 10, free: 970 };

describe('drawIconArrayPdf', () => {
  it('draws one figure per person, in each group’s colour, for 100 and 1000 on one page', () => {
    const doc = newDocument();
    const first = drawIconArrayPdf(doc, iconArrayLayout(100, hundred), { x: 20, y: 20, width: 70 }, colourPalette);
    const second = drawIconArrayPdf(doc, iconArrayLayout(1000, thousand), { x: 20, y: 110, width: 170 }, colourPalette);
    expect(first.drawn).toEqual({ event: 15, prevented: 5, caused: 0, free: 80 });
    expect(second.drawn).toEqual({ event: 20, prevented: 0, caused: 10, free: 970 });
    const pdf = doc.output();
    // An event to avoid: prevented people are drawn helped, caused people harmed (lookOf).
    expect(figuresByGroup(pdf)).toEqual({ event: 35, helped: 5, harmed: 10, free: 1050 });
    expect(pdf.startsWith('%PDF-')).toBe(true);
    expect(pdf.trimEnd().endsWith('%%EOF')).toBe(true);
    expect(pdf.match(/\/Type \/Page\b/g)).toHaveLength(1);
  });

  it('returns the height of the grid at the width asked for', () => {
    const doc = newDocument();
    expect(drawIconArrayPdf(doc, iconArrayLayout(100, hundred), { x: 0, y: 0, width: 60 }, colourPalette).height).toBeCloseTo(
      60,
      9,
    );
    // 1000: 50 cells + 4 gutters across, 20 cells + 1 gutter down.
    expect(drawIconArrayPdf(doc, iconArrayLayout(1000, thousand), { x: 0, y: 0, width: 162 }, colourPalette).height).toBeCloseTo(
      63,
      9,
    );
  });

  it('lays the dots and hatching through a clipping path, once in the form of each patterned look', () => {
    const doc = newDocument();
    drawIconArrayPdf(doc, iconArrayLayout(1000, thousand), { x: 20, y: 20, width: 170 }, colourPalette);
    const pdf = doc.output();
    // W n: set the clipping path, end the path without painting (ISO 32000-1 §8.5.4): only the harmed look has a pattern here.
    expect(pdf.match(/^W\r?\nn$/gm)).toHaveLength(1);
    expect([...formStreams(pdf).values()].filter((stream) => /^W\r?\nn$/m.test(stream))).toHaveLength(1);
    expect(pdf.match(/^q$/gm)?.length).toBe(pdf.match(/^Q$/gm)?.length);
  });

  it.each([
    [100, hundred, 70],
    [1000, thousand, 170],
  ] as const)(
    'places one form per look at every person of the layout (per %i), each cell where the layout puts it',
    (_, groups, width) => {
      const doc = newDocument();
      const layout = iconArrayLayout(groups.denominator, groups, { arrangement: 'scattered' });
      const box = { x: 20, y: 30, width };
      drawIconArrayPdf(doc, layout, box, colourPalette);
      const pdf = doc.output();
      const placements = formPlacements(pdf);
      expect(placements).toHaveLength(groups.denominator);
      // Points per millimetre (PostScript points, 72 per inch), and the A4 page height in points.
      const k = 72 / 25.4;
      const pageHeight = 297 * k;
      const scale = width / layout.geometry.width;
      const { cellSize, iconSize } = layout.geometry;
      const inset = ((cellSize - iconSize) / 2) * scale;
      const formOf = new Map<PersonGroup, string>();
      for (const person of layout.people) {
        // The cell's top-left corner, in millimetres from the page's top-left corner.
        const left = box.x + person.x * scale - inset;
        const top = box.y + person.y * scale - inset;
        const found = placements.filter(
          (placement) =>
            Math.abs(placement.x - left * k) < 0.011 && Math.abs(pageHeight - placement.y - (top + cellSize * scale) * k) < 0.011,
        );
        expect(found).toHaveLength(1);
        // One form per group: everyone of a group is placed from the same one, and no two groups share one.
        const form = found[0]!.form;
        expect(formOf.get(person.group) ?? form).toBe(form);
        formOf.set(person.group, form);
      }
      expect(new Set(formOf.values()).size).toBe(formOf.size);
      expect(formStreams(pdf).size).toBe(formOf.size);
      for (const [group, form] of formOf)
        expect(placements.filter((placement) => placement.form === form)).toHaveLength(groups[group]);
    },
  );

  it('outlines the uncertain people with a dash when asked', () => {
    const doc = newDocument();
    const drawing = drawIconArrayPdf(doc, iconArrayLayout(100, hundred), { x: 20, y: 20, width: 70 }, colourPalette, {
      uncertain: { from: 13, to: 18 },
    });
    expect(drawing.outlined).toBe(5);
    // d: set the line dash pattern (ISO 32000-1 §8.4.3.6), once in the ring's form, placed five times after the figures.
    const pdf = doc.output();
    expect(pdf.match(/^\[[\d.]+ [\d.]+\] 0\.? d$/gm)).toHaveLength(1);
    const ring = [...formStreams(pdf)].find(([, stream]) => /^\[[\d.]+ [\d.]+\] 0\.? d$/m.test(stream))?.[0];
    expect(formPlacements(pdf).map((placement) => placement.form === ring)).toEqual([
      ...Array<boolean>(100).fill(false),
      ...Array<boolean>(5).fill(true),
    ]);
  });

  it('gives the same bytes for the same drawing', () => {
    const make = () => {
      const doc = newDocument();
      drawIconArrayPdf(doc, iconArrayLayout(100, hundred), { x: 20, y: 20, width: 70 }, colourPalette);
      return doc.output();
    };
    expect(make()).toBe(make());
  });
});

describe('drawChartPdf', () => {
  it('draws the whole chart: arrays, titles and labels, on one valid page', () => {
    const doc = newDocument();
    const model = outcomeChart(topicFixture(), 'stroke');
    const drawing = drawChartPdf(doc, model, { x: 15, y: 15, width: 180 }, colourPalette, { showRange: true });
    expect(drawing.arrays.map((array) => array.drawn)).toEqual([
      { event: 19, prevented: 0, caused: 0, free: 81 },
      { event: 15, prevented: 4, caused: 0, free: 81 },
    ]);
    expect(drawing.arrays[1]!.outlined).toBe(6);
    expect(drawing.height).toBeGreaterThan(60);
    expect(drawing.height).toBeLessThan(267);
    const pdf = doc.output();
    for (const text of ['19 have a stroke', '4 avoid a stroke because of option A', 'With option A: 100 people over 10 years']) {
      expect(pdf).toContain(`(${text}) Tj`);
    }

    if (!existsSync(PDFINFO)) {
      console.info(`${PDFINFO} is not installed: skipping the pdfinfo check of the PDF`);
      return;
    }
    const folder = mkdtempSync(join(tmpdir(), 'chart-pdf-'));
    try {
      const file = join(folder, 'chart.pdf');
      writeFileSync(file, Buffer.from(doc.output('arraybuffer')));
      const info = execFileSync(PDFINFO, [file], { encoding: 'utf8' });
      expect(info).toMatch(/^Pages:\s+1$/m);
      expect(info).toMatch(/^Page size:\s+595\.2\d? x 841\.8\d? pts \(A4\)$/m);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});

describe('drawChartPdf of a wanted event and with the range outline', () => {
  // Invented counts per 100: 25 without and 45 with option A, range 35 to 58.
  const model = () =>
    outcomeChart(
      topicFixture(100, { comparison: 25, intervention: 45, range: { lower: 35, upper: 58 }, wanted: true, name: 'a response' }),
      'stroke',
    );

  it('draws the people who gain a wanted event in the helped look, and none harmed', () => {
    const drawing = drawChartPdf(newDocument(), model(), { x: 15, y: 15, width: 180 }, colourPalette);
    expect(drawing.arrays[1]!.drawn).toEqual({ event: 25, prevented: 0, caused: 20, free: 55 });
    expect(drawing.arrays[1]!.looks).toEqual({ event: 25, helped: 20, harmed: 0, free: 55 });
  });

  it('rings the uncertain people and still draws every figure in its own look, so the totals stay', () => {
    const plain = newDocument();
    const ringed = newDocument();
    const without = drawChartPdf(plain, model(), { x: 15, y: 15, width: 180 }, colourPalette);
    const withRange = drawChartPdf(ringed, model(), { x: 15, y: 15, width: 180 }, colourPalette, { showRange: true });
    expect(withRange.arrays.map((array) => array.looks)).toEqual(without.arrays.map((array) => array.looks));
    // Ranks 35–57: 23 people ringed, and the same fills painted as without the outline, but
    // for the legend's ringed sample figure (drawn in the look of people without the event).
    expect(withRange.arrays[1]!.outlined).toBe(23);
    const before = figuresByGroup(plain.output());
    expect(figuresByGroup(ringed.output())).toEqual({ ...before, free: before.free + 1 });
    // One dashed stroke in the ring's form, placed per ringed person, and one for the legend's sample (ISO 32000-1 §8.4.3.6).
    const pdf = ringed.output();
    expect(pdf.match(/^\[[\d.]+ [\d.]+\] 0\.? d$/gm)).toHaveLength(2);
    const ring = [...formStreams(pdf)].find(([, stream]) => /^\[[\d.]+ [\d.]+\] 0\.? d$/m.test(stream))?.[0];
    expect(formPlacements(pdf).filter((placement) => placement.form === ring)).toHaveLength(23);
  });
});
