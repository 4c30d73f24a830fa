/**
 * Text blocks and legend swatches of a chart frame as SVG.
 */
import type { Selection } from 'd3-selection';
import type { PersonLook } from '../../core/direction.ts';
import type { FrameSwatch, FrameText } from '../chart-frame.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { glyphPath, placeGlyphPath } from '../glyphs/svg-path-context.ts';
import type { GlyphName } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { ringedSwatch } from '../range-ring.ts';
import { type PatternIds, personPaint } from './person-paint.ts';
import { svgNumber } from './svg-number.ts';

type Parent = Selection<SVGGElement, unknown, null, undefined>;

/** Append one `<text>` with a `<tspan>` per line. */
export function appendText(parent: Parent, block: FrameText, palette: ChartPalette, className: string): void {
  if (block.lines.length === 0) return;
  const text = parent
    .append('text')
    .attr('class', className)
    .attr('font-size', svgNumber(block.fontSize))
    .attr('fill', block.tone === 'muted' ? palette.mutedText : palette.text);
  if (block.bold) text.attr('font-weight', 'bold');
  for (const line of block.lines) {
    text.append('tspan').attr('x', svgNumber(line.x)).attr('y', svgNumber(line.y)).text(line.text);
  }
}

/**
 * Append a legend swatch: the array's glyph in a look (never with `data-outcome`), or for
 * the range outline a figure with its dashed ring.
 */
export function appendSwatch(
  parent: Parent,
  swatch: FrameSwatch,
  glyph: GlyphName,
  palette: ChartPalette,
  patternIds: PatternIds,
): void {
  if (swatch.look !== 'uncertain') {
    appendFigure(parent, swatch.look, swatch, swatch.size, glyph, palette, patternIds);
    return;
  }
  const { figure, ring } = ringedSwatch(swatch.x, swatch.y, swatch.size, palette);
  appendFigure(parent, 'free', figure, swatch.size, glyph, palette, patternIds).attr('data-look', 'uncertain');
  parent
    .append('rect')
    .attr('class', 'swatch-ring')
    .attr('x', svgNumber(ring.x))
    .attr('y', svgNumber(ring.y))
    .attr('width', svgNumber(ring.side))
    .attr('height', svgNumber(ring.side))
    .attr('rx', svgNumber(ring.radius))
    .attr('fill', 'none')
    .attr('stroke', palette.uncertainOutline)
    .attr('stroke-width', svgNumber(ring.lineWidth, 3))
    .attr('stroke-dasharray', `${svgNumber(ring.dash[0])} ${svgNumber(ring.dash[1])}`);
}

function appendFigure(
  parent: Parent,
  look: PersonLook,
  box: { readonly x: number; readonly y: number; readonly size: number },
  cellSize: number,
  glyph: GlyphName,
  palette: ChartPalette,
  patternIds: PatternIds,
) {
  const paint = personPaint(palette, look, patternIds, cellSize);
  return parent
    .append('path')
    .attr('class', 'swatch')
    .attr('data-look', look)
    .attr('d', placeGlyphPath(glyphPath(glyphFor(glyph), box.size), box.x, box.y))
    .attr('fill', paint.fill)
    .attr('stroke', paint.stroke)
    .attr('stroke-width', svgNumber(cellSize * palette.outlineWidth, 3));
}
