import { describe, expect, it } from 'vitest';
import type { PeopleGroups, PersonGroup } from '../../src/core/types.ts';
import { DEFAULT_SCATTER_SEED, iconArrayGeometry, iconArrayLayout, scaleLayout } from '../../src/render/icon-array-layout.ts';

const groups = (denominator: 100 | 1000, event: number, prevented = 0, caused = 0): PeopleGroups => ({
  denominator,
  event,
  prevented,
  caused,
  free: denominator - event - prevented - caused,
});

const countOf = (people: readonly { group: PersonGroup }[], group: PersonGroup) =>
  people.filter((person) => person.group === group).length;

describe('iconArrayLayout for 100 people', () => {
  it('places 100 people on one 10 × 10 grid', () => {
    const layout = iconArrayLayout(100, groups(100, 13));
    expect(layout.people).toHaveLength(100);
    expect(new Set(layout.people.map((person) => `${person.row},${person.column}`)).size).toBe(100);
    expect(layout.people.every((person) => person.block === 0)).toBe(true);
    expect(layout.geometry.blockColumns * layout.geometry.blockRows).toBe(1);
  });

  it('has as many people in each group as the counts say', () => {
    const layout = iconArrayLayout(100, groups(100, 15, 4));
    expect(countOf(layout.people, 'event')).toBe(15);
    expect(countOf(layout.people, 'prevented')).toBe(4);
    expect(countOf(layout.people, 'caused')).toBe(0);
    expect(countOf(layout.people, 'free')).toBe(81);
  });

  // Grouped fill from one corner (Ancker et al. 2011, Med Decis Making 31:143; bottom-left and
  // row-wise is a design choice, common practice): row from
  // top = 9 − floor(i/10), column = i mod 10. For n = 13 the bottom row is full and the second
  // row from the bottom has columns 0–2.
  it('fills 13 events as the full bottom row and columns 0–2 of the row above', () => {
    const layout = iconArrayLayout(100, groups(100, 13));
    const events = layout.people.filter((person) => person.group === 'event');
    const bottomRow = events.filter((person) => person.row === 9).map((person) => person.column);
    const secondRow = events.filter((person) => person.row === 8).map((person) => person.column);
    expect(bottomRow).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(secondRow).toEqual([0, 1, 2]);
    expect(events).toHaveLength(13);
  });

  it('maps index i to row 9 − floor(i / 10) and column i mod 10', () => {
    const layout = iconArrayLayout(100, groups(100, 0));
    for (const person of layout.people) {
      expect(person.row).toBe(9 - Math.floor(person.index / 10));
      expect(person.column).toBe(person.index % 10);
    }
  });

  it('fills event, then the changed group, then free (event first, prevented next)', () => {
    const layout = iconArrayLayout(100, groups(100, 15, 5));
    const byIndex = layout.people.map((person) => person.group);
    expect(byIndex.slice(0, 15)).toEqual(Array(15).fill('event'));
    expect(byIndex.slice(15, 20)).toEqual(Array(5).fill('prevented'));
    expect(byIndex.slice(20)).toEqual(Array(80).fill('free'));
  });

  it('puts row 0 at the top and moves right along a row', () => {
    const layout = iconArrayLayout(100, groups(100, 0));
    const [first, second] = [layout.people[0], layout.people[1]];
    const top = layout.people.find((person) => person.row === 0 && person.column === 0);
    expect(second!.x).toBeGreaterThan(first!.x);
    expect(top!.y).toBeLessThan(first!.y);
  });

  it('leaves a gap after the 5th column and the 5th row to help counting', () => {
    const { cellSize, midGap } = iconArrayGeometry(100);
    const layout = iconArrayLayout(100, groups(100, 0));
    const at = (row: number, column: number) => layout.people.find((person) => person.row === row && person.column === column)!;
    expect(at(9, 5).x - at(9, 4).x).toBeCloseTo(cellSize + midGap, 12);
    expect(at(9, 4).x - at(9, 3).x).toBeCloseTo(cellSize, 12);
    expect(at(5, 0).y - at(4, 0).y).toBeCloseTo(cellSize + midGap, 12);
  });
});

describe('iconArrayLayout for 1000 people', () => {
  it('places ten 10 × 10 blocks in 2 rows of 5', () => {
    const layout = iconArrayLayout(1000, groups(1000, 125));
    expect(layout.people).toHaveLength(1000);
    expect(layout.geometry.blockColumns).toBe(5);
    expect(layout.geometry.blockRows).toBe(2);
    for (let block = 0; block < 10; block += 1) {
      expect(layout.people.filter((person) => person.block === block)).toHaveLength(100);
    }
  });

  // Blocks of 100 so people count in hundreds (common practice in published pictographs):
  // block b = floor(i / 100), with the same rule inside each block.
  it('numbers blocks as floor(i / 100) and applies the 100-grid rule inside each block', () => {
    const layout = iconArrayLayout(1000, groups(1000, 0));
    for (const person of layout.people) {
      expect(person.block).toBe(Math.floor(person.index / 100));
      expect(person.row).toBe(9 - Math.floor((person.index % 100) / 10));
      expect(person.column).toBe(person.index % 10);
    }
  });

  it('fills block by block: 125 events are block 0 full and 25 in block 1', () => {
    const layout = iconArrayLayout(1000, groups(1000, 125, 31));
    const events = layout.people.filter((person) => person.group === 'event');
    expect(events.filter((person) => person.block === 0)).toHaveLength(100);
    expect(events.filter((person) => person.block === 1)).toHaveLength(25);
    expect(countOf(layout.people, 'prevented')).toBe(31);
  });

  it('starts at the bottom-left block and runs along the bottom row of blocks first', () => {
    const layout = iconArrayLayout(1000, groups(1000, 0));
    const corner = (block: number) => layout.people.find((person) => person.index === block * 100)!;
    expect(corner(0).x).toBeLessThan(corner(1).x);
    expect(corner(4).y).toBe(corner(0).y);
    expect(corner(5).y).toBeLessThan(corner(0).y);
    expect(corner(5).x).toBe(corner(0).x);
  });

  it('keeps a visible gutter of one cell between blocks', () => {
    const { cellSize, blockGutter } = iconArrayGeometry(1000);
    expect(blockGutter).toBe(cellSize);
    const layout = iconArrayLayout(1000, groups(1000, 0));
    const find = (block: number, row: number, column: number) =>
      layout.people.find((person) => person.block === block && person.row === row && person.column === column)!;
    // Across: the last column of block 0 to the first of block 1.
    expect(find(1, 9, 0).x - find(0, 9, 9).x).toBeCloseTo(cellSize + blockGutter, 12);
    // Down: the bottom row of block 5 (upper) to the top row of block 0 (lower).
    expect(find(0, 0, 0).y - find(5, 9, 0).y).toBeCloseTo(cellSize + blockGutter, 12);
  });

  it('measures 50 cells and 4 gutters across, 20 cells and 1 gutter down', () => {
    const geometry = iconArrayGeometry(1000, 2);
    expect(geometry.width).toBe(2 * 50 + 4 * 2);
    expect(geometry.height).toBe(2 * 20 + 2);
  });
});

describe('iconArrayLayout options', () => {
  it('gives every person a box inside the layout', () => {
    for (const denominator of [100, 1000] as const) {
      const layout = iconArrayLayout(denominator, groups(denominator, 7), { cellSize: 3 });
      const { width, height, iconSize } = layout.geometry;
      for (const person of layout.people) {
        expect(person.x).toBeGreaterThanOrEqual(0);
        expect(person.y).toBeGreaterThanOrEqual(0);
        expect(person.x + iconSize).toBeLessThanOrEqual(width + 1e-9);
        expect(person.y + iconSize).toBeLessThanOrEqual(height + 1e-9);
      }
    }
  });

  it('scatters people with a fixed seed, keeping the counts and the same picture every time', () => {
    const first = iconArrayLayout(100, groups(100, 15, 5), { arrangement: 'scattered' });
    const again = iconArrayLayout(100, groups(100, 15, 5), { arrangement: 'scattered' });
    expect(first.seed).toBe(DEFAULT_SCATTER_SEED);
    expect(first.people).toEqual(again.people);
    expect(countOf(first.people, 'event')).toBe(15);
    expect(countOf(first.people, 'prevented')).toBe(5);
    const grouped = iconArrayLayout(100, groups(100, 15, 5));
    expect(first.people.map((person) => person.group)).not.toEqual(grouped.people.map((person) => person.group));
  });

  it('keeps a scattered option’s events among the comparison’s events (same seed, same order)', () => {
    const comparison = iconArrayLayout(100, groups(100, 20), { arrangement: 'scattered' });
    const option = iconArrayLayout(100, groups(100, 15, 5), { arrangement: 'scattered' });
    option.people.forEach((person, index) => {
      if (person.group !== 'free') expect(comparison.people[index]?.group).toBe('event');
    });
  });

  it('rejects groups of another denominator', () => {
    expect(() => iconArrayLayout(1000, groups(100, 5))).toThrow(RangeError);
  });

  it('scales every length by the same factor', () => {
    const layout = iconArrayLayout(100, groups(100, 3));
    const scaled = scaleLayout(layout, 2.5);
    expect(scaled.geometry.width).toBeCloseTo(layout.geometry.width * 2.5, 12);
    expect(scaled.geometry.patternTile).toBeCloseTo(layout.geometry.patternTile * 2.5, 12);
    expect(scaled.people[37]!.x).toBeCloseTo(layout.people[37]!.x * 2.5, 12);
    expect(scaled.people[37]!.group).toBe(layout.people[37]!.group);
  });

  it('sizes pattern tiles to divide the cell, the mid gap and the gutter exactly', () => {
    for (const denominator of [100, 1000] as const) {
      const { cellSize, midGap, blockGutter, patternTile } = iconArrayGeometry(denominator, 1);
      for (const length of [cellSize, midGap, blockGutter]) {
        const tiles = length / patternTile;
        expect(Math.abs(tiles - Math.round(tiles))).toBeLessThan(1e-9);
      }
    }
  });
});
