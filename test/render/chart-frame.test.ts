import { describe, expect, it } from 'vitest';
import { chartFrame } from '../../src/render/chart-frame.ts';
import { outcomeChart } from '../../src/render/chart-model.ts';
import { measureDejaVuSans } from '../../src/render/text/measure-text.ts';
import { topicFixture } from './topic-fixture.ts';

describe('chartFrame', () => {
  const model = outcomeChart(topicFixture(), 'stroke');

  // Zikmund-Fisher, Fagerlin & Ubel (2008, Cancer 113:3382; 2010, Med Decis Making 30:661): options side by side with the
  // same icon size, the same grid and aligned rows.
  it('puts the arrays side by side at the same size, with their grids on one row', () => {
    const frame = chartFrame(model, { width: 720 });
    const [left, right] = frame.arrays;
    expect(left!.grid.y).toBe(right!.grid.y);
    expect(left!.grid.layout.geometry.cellSize).toBe(right!.grid.layout.geometry.cellSize);
    expect(left!.width).toBeCloseTo(right!.width, 12);
    expect(right!.x).toBeGreaterThanOrEqual(left!.x + left!.grid.layout.geometry.width);
  });

  it('keeps every line of text inside the chart width', () => {
    const frame = chartFrame(model, { width: 480, fontSize: 14 });
    const blocks = [frame.heading, ...frame.arrays.flatMap((array) => [array.title, ...array.legend.map((row) => row.text)])];
    for (const block of blocks) {
      for (const line of block.lines) {
        expect(line.x + measureDejaVuSans(line.text, block.fontSize, block.bold)).toBeLessThanOrEqual(480);
      }
    }
  });

  it('lists one legend row per labelled group, below the grid, then the range', () => {
    const frame = chartFrame(model);
    const right = frame.arrays[1]!;
    const gridBottom = right.grid.y + right.grid.layout.geometry.height;
    expect(right.legend.map((row) => row.swatch?.look ?? null)).toEqual(['event', 'helped', 'free', null]);
    for (const row of right.legend) expect(row.text.lines[0]!.y).toBeGreaterThan(gridBottom);
    expect(frame.height).toBeGreaterThan(right.legend.at(-1)!.text.lines.at(-1)!.y);
  });

  it('adds a legend row for outlined people only when the range is shown', () => {
    expect(chartFrame(model, { showRange: true }).arrays[1]!.legend.at(-1)!.swatch?.look).toBe('uncertain');
    expect(chartFrame(model).arrays[1]!.legend.some((row) => row.swatch?.look === 'uncertain')).toBe(false);
  });
});
