/**
 * Text blocks and legend swatches of a chart frame as SVG.
 */
import type { Selection } from 'd3-selection';
import type { FrameSwatch, FrameText } from '../chart-frame.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { glyphPath, placeGlyphPath } from '../glyphs/svg-path-context.ts';
import type { GlyphName } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
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

/** Append a legend swatch: the array's glyph in a group's look (never with `data-outcome`). */
export function appendSwatch(
  parent: Parent,
  swatch: FrameSwatch,
  glyph: GlyphName,
  palette: ChartPalette,
  patternIds: PatternIds,
): void {
  const paint = personPaint(palette, swatch.look, patternIds, swatch.size);
  const element = parent
    .append('path')
    .attr('class', 'swatch')
    .attr('data-look', swatch.look)
    .attr('d', placeGlyphPath(glyphPath(glyphFor(glyph), swatch.size), swatch.x, swatch.y))
    .attr('fill', paint.fill)
    .attr('stroke', paint.stroke)
    .attr('stroke-width', svgNumber(swatch.size * palette.outlineWidth * (paint.dash === null ? 1 : 1.6), 3));
  if (paint.dash !== null) element.attr('stroke-dasharray', paint.dash);
}
