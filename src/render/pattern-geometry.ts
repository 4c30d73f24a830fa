/**
 * The geometry of the dot and hatch patterns, in one tile, shared by the SVG
 * pattern fills and the PDF overlays so both print the same texture.
 */

/** Radius of a dot, as a share of the tile. */
export const DOT_RADIUS = 0.17;

/** Centres of the dots of one tile (a staggered grid, so the dots read as a texture), in tiles. */
export const DOT_CENTRES: readonly (readonly [number, number])[] = [
  [0.25, 0.25],
  [0.75, 0.75],
];

/** Width of a hatch line, as a share of the tile. */
export const HATCH_WIDTH = 0.2;

/** A straight line from (x1, y1) to (x2, y2), in tiles. */
export type Segment = readonly [number, number, number, number];

/**
 * Lines rising at 45° (x + y = 0, 1, 2 tiles), drawn a little past the tile so that
 * they join from tile to tile.
 */
export const HATCH_SEGMENTS: readonly Segment[] = [
  [-0.5, 0.5, 0.5, -0.5],
  [0, 1, 1, 0],
  [0.5, 1.5, 1.5, 0.5],
];
