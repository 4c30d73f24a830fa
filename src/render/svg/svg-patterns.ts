/**
 * The dot (benefit) and hatch (harm) pattern fills, in `<defs>`. Tiles are sized
 * to divide the icon grid's cells, gaps and gutters, so every figure shows the
 * same pattern phase.
 */
import type { Selection } from 'd3-selection';
import type { ChartPalette } from '../palette.ts';
import { DOT_CENTRES, DOT_RADIUS, HATCH_SEGMENTS, HATCH_WIDTH } from '../pattern-geometry.ts';
import type { PatternIds } from './person-paint.ts';
import { svgNumber } from './svg-number.ts';

/** Append `<defs>` with the chart's pattern fills for tiles of side `tile`. */
export function appendPatterns(
  svg: Selection<SVGSVGElement, unknown, null, undefined>,
  palette: ChartPalette,
  ids: PatternIds,
  tile: number,
): void {
  const defs = svg.append('defs');
  const size = svgNumber(tile, 3);
  const dots = defs
    .append('pattern')
    .attr('id', ids.dots)
    .attr('patternUnits', 'userSpaceOnUse')
    .attr('width', size)
    .attr('height', size);
  dots.append('rect').attr('width', size).attr('height', size).attr('fill', palette.groups.helped.fill);
  for (const [x, y] of DOT_CENTRES) {
    dots
      .append('circle')
      .attr('cx', svgNumber(tile * x, 3))
      .attr('cy', svgNumber(tile * y, 3))
      .attr('r', svgNumber(tile * DOT_RADIUS, 3))
      .attr('fill', palette.groups.helped.patternInk);
  }

  const hatch = defs
    .append('pattern')
    .attr('id', ids.hatch)
    .attr('patternUnits', 'userSpaceOnUse')
    .attr('width', size)
    .attr('height', size);
  hatch.append('rect').attr('width', size).attr('height', size).attr('fill', palette.groups.harmed.fill);
  hatch
    .append('path')
    .attr('d', hatchPath(tile))
    .attr('stroke', palette.groups.harmed.patternInk)
    .attr('stroke-width', svgNumber(tile * HATCH_WIDTH, 3));
}

/** The hatch lines of one tile as an SVG path. */
function hatchPath(tile: number): string {
  const at = (share: number) => svgNumber(tile * share, 3);
  return HATCH_SEGMENTS.map(([x1, y1, x2, y2]) => `M${at(x1)},${at(y1)}L${at(x2)},${at(y2)}`).join('');
}
