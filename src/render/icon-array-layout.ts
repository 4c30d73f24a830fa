/**
 * The icon-array layout as plain data: where each of 100 or 1000 people sits, which
 * group they are in, and the geometry of the grid. Both renderers (SVG on screen,
 * jsPDF on paper) draw this same data, so screen and paper match by construction.
 */
import type { Denominator, PeopleGroups, PersonGroup } from '../core/types.ts';
import { fillSequence } from './fill-sequence.ts';
import { seededPermutation } from './seeded-random.ts';

/** Grouped fill (the default) or a seeded scattered arrangement for teaching only. */
export type Arrangement = 'grouped' | 'scattered';

/** Which glyph suits the cell size: the full person, or the compact one for 1000. */
export type GlyphName = 'person' | 'compact-person';

/** Grid geometry, in the layout's units (one cell is `cellSize`). */
export interface IconArrayGeometry {
  /** Distance from one person to the next, across and down. */
  readonly cellSize: number;
  /** Side of the square box the glyph is drawn in; smaller than the cell to leave a gap. */
  readonly iconSize: number;
  /** Space between 10 × 10 blocks (1000 only; 0 for 100). */
  readonly blockGutter: number;
  /** Extra space after the 5th row and column inside a block, to help counting (100 only). */
  readonly midGap: number;
  /** Blocks across and down: 1 × 1 for 100, 5 × 2 for 1000. */
  readonly blockColumns: number;
  readonly blockRows: number;
  /** Side of one tile of the dot or hatch pattern; divides the cell, gutters and gaps exactly. */
  readonly patternTile: number;
  readonly glyph: GlyphName;
  readonly width: number;
  readonly height: number;
}

/** One person: where they sit and which group they are in. */
export interface PersonPlacement {
  /** Place in the fill order of the grid (0 = bottom-left of block 0). */
  readonly index: number;
  /** Position in the grouped sequence of people; equals `index` unless scattered. */
  readonly rank: number;
  /** 10 × 10 block, numbered from the bottom-left, along the bottom row first. */
  readonly block: number;
  /** Row inside the block, counted from the top (0–9). */
  readonly row: number;
  /** Column inside the block, counted from the left (0–9). */
  readonly column: number;
  /** Top-left corner of the glyph box. */
  readonly x: number;
  readonly y: number;
  readonly group: PersonGroup;
}

export interface IconArrayLayout {
  readonly denominator: Denominator;
  readonly arrangement: Arrangement;
  readonly seed: number | null;
  readonly groups: PeopleGroups;
  readonly geometry: IconArrayGeometry;
  /** Every person, in `index` order. */
  readonly people: readonly PersonPlacement[];
}

export interface IconArrayLayoutOptions {
  /** Cell size in the caller's units (default 1). */
  readonly cellSize?: number;
  readonly arrangement?: Arrangement;
  /** Seed of the scattered arrangement (default {@link DEFAULT_SCATTER_SEED}). */
  readonly seed?: number;
}

/** The fixed seed of the scattered arrangement, so it never changes between screen and paper. */
export const DEFAULT_SCATTER_SEED = 20_110_909;

const BLOCK_SIDE = 10;

/** Grid geometry for a denominator at a given cell size. */
export function iconArrayGeometry(denominator: Denominator, cellSize = 1): IconArrayGeometry {
  if (!(cellSize > 0) || !Number.isFinite(cellSize)) {
    throw new RangeError(`iconArrayGeometry requires a positive cell size (got ${cellSize})`);
  }
  const thousand = denominator === 1000;
  const blockColumns = thousand ? 5 : 1;
  const blockRows = thousand ? 2 : 1;
  const blockGutter = thousand ? cellSize : 0;
  const midGap = thousand ? 0 : cellSize / 4;
  const blockSide = BLOCK_SIDE * cellSize + midGap;
  return {
    cellSize,
    iconSize: cellSize * (thousand ? 0.9 : 0.88),
    blockGutter,
    midGap,
    blockColumns,
    blockRows,
    patternTile: cellSize / (thousand ? 2 : 4),
    glyph: thousand ? 'compact-person' : 'person',
    width: blockColumns * blockSide + (blockColumns - 1) * blockGutter,
    height: blockRows * blockSide + (blockRows - 1) * blockGutter,
  };
}

/**
 * Lay out an icon array: 100 people as one 10 × 10 grid, or 1000 as ten 10 × 10
 * blocks in 2 rows of 5 with gutters. People fill row by row from the bottom-left
 * corner, block by block, in the order event, prevented or caused, free.
 *
 * @throws RangeError when the groups do not match the denominator
 * @example iconArrayLayout(100, { denominator: 100, event: 13, prevented: 0, caused: 0, free: 87 }).people[12]
 * // => { index: 12, rank: 12, block: 0, row: 8, column: 2, …, group: 'event' }
 */
export function iconArrayLayout(
  denominator: Denominator,
  groups: PeopleGroups,
  options: IconArrayLayoutOptions = {},
): IconArrayLayout {
  if (denominator !== 100 && denominator !== 1000) {
    throw new RangeError(`iconArrayLayout requires a denominator of 100 or 1000 (got ${denominator})`);
  }
  if (groups.denominator !== denominator) {
    throw new RangeError(`iconArrayLayout requires groups per ${denominator} (got per ${groups.denominator})`);
  }
  const geometry = iconArrayGeometry(denominator, options.cellSize ?? 1);
  const arrangement = options.arrangement ?? 'grouped';
  const seed = arrangement === 'scattered' ? (options.seed ?? DEFAULT_SCATTER_SEED) : null;
  const sequence = fillSequence(groups);
  const ranks = seed === null ? null : seededPermutation(denominator, seed);
  const people: PersonPlacement[] = [];
  for (let index = 0; index < denominator; index += 1) {
    const rank = ranks === null ? index : (ranks[index] as number);
    people.push(placePerson(index, rank, sequence[rank] as PersonGroup, geometry));
  }
  return { denominator, arrangement, seed, groups, geometry, people };
}

/**
 * The person at `index`: block, row, column and top-left corner of the glyph box.
 * Built as one object literal with a fixed key order (no spread), so all people share
 * one shape and copying 2 × 1000 of them per drawing stays cheap.
 */
function placePerson(index: number, rank: number, group: PersonGroup, geometry: IconArrayGeometry): PersonPlacement {
  const { cellSize, iconSize, midGap, blockGutter, blockColumns, blockRows } = geometry;
  const block = Math.floor(index / 100);
  const within = index % 100;
  // Bottom-left, row-wise: row from the top = 9 − floor(i / 10), column = i mod 10.
  const row = BLOCK_SIDE - 1 - Math.floor(within / BLOCK_SIDE);
  const column = within % BLOCK_SIDE;
  const blockColumn = block % blockColumns;
  const blockRowFromTop = blockRows - 1 - Math.floor(block / blockColumns);
  const blockSide = BLOCK_SIDE * cellSize + midGap;
  const inset = (cellSize - iconSize) / 2;
  const x = blockColumn * (blockSide + blockGutter) + column * cellSize + (column >= 5 ? midGap : 0) + inset;
  const y = blockRowFromTop * (blockSide + blockGutter) + row * cellSize + (row >= 5 ? midGap : 0) + inset;
  return { block, row, column, x, y, index, rank, group };
}

/** The same layout at another size: every length multiplied by `factor`. */
export function scaleLayout(layout: IconArrayLayout, factor: number): IconArrayLayout {
  const geometry = layout.geometry;
  return {
    ...layout,
    geometry: {
      ...geometry,
      cellSize: geometry.cellSize * factor,
      iconSize: geometry.iconSize * factor,
      blockGutter: geometry.blockGutter * factor,
      midGap: geometry.midGap * factor,
      patternTile: geometry.patternTile * factor,
      width: geometry.width * factor,
      height: geometry.height * factor,
    },
    // Same key order as placePerson, so the copies keep the people's one shape.
    people: layout.people.map((person) => ({
      block: person.block,
      row: person.row,
      column: person.column,
      x: person.x * factor,
      y: person.y * factor,
      index: person.index,
      rank: person.rank,
      group: person.group,
    })),
  };
}
