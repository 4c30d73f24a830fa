/**
 * The dashed ring drawn around a person whose group depends on where in the interval the
 * truth lies. It sits in the gap around the figure, so it marks the person without
 * changing how they are drawn: the picture keeps the counts its legend gives.
 * Plain numbers, shared by the SVG and PDF renderers.
 */
import type { ChartPalette } from './palette.ts';

/** A ring around a glyph box: a rounded square, its line width and dash, in the layout's units. */
export interface RangeRing {
  readonly x: number;
  readonly y: number;
  readonly side: number;
  readonly radius: number;
  readonly lineWidth: number;
  readonly dash: readonly [number, number];
}

/**
 * The ring around the glyph box at (`x`, `y`) of side `iconSize` in a grid of `cellSize`:
 * centred in the gap between that box and the cell's edge, its line a twentieth of the cell
 * wide (no wider than that gap), so it stays clear of the figure and shows at 1000 people too.
 *
 * @example rangeRing(0.06, 0.06, 0.88, 1, colourPalette) // => { x: 0.03, y: 0.03, side: 0.94, …, lineWidth: 0.05, … }
 */
export function rangeRing(x: number, y: number, iconSize: number, cellSize: number, palette: ChartPalette): RangeRing {
  const inset = (cellSize - iconSize) / 2;
  const offset = inset / 2;
  const [dash, gap] = palette.uncertainDash;
  return {
    x: x - offset,
    y: y - offset,
    side: iconSize + 2 * offset,
    radius: cellSize * 0.12,
    lineWidth: Math.min(cellSize * 0.05, inset),
    dash: [dash * cellSize, gap * cellSize],
  };
}

/** Share of a legend swatch the ringed figure takes; the ring goes in the margin left around it. */
const SWATCH_FIGURE = 0.8;

/**
 * The legend's sample of the range outline in a swatch box: a figure in the look of people
 * without the event, smaller than the box, and its ring around it.
 */
export function ringedSwatch(
  x: number,
  y: number,
  size: number,
  palette: ChartPalette,
): { readonly figure: { readonly x: number; readonly y: number; readonly size: number }; readonly ring: RangeRing } {
  const figureSize = size * SWATCH_FIGURE;
  const inset = (size - figureSize) / 2;
  return {
    figure: { x: x + inset, y: y + inset, size: figureSize },
    ring: rangeRing(x + inset, y + inset, figureSize, size, palette),
  };
}
