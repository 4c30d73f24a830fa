import { describe, expect, it } from 'vitest';
import { outcomeChart } from '../../../src/render/chart-model.ts';
import { svgForExport } from '../../../src/render/export/svg-for-export.ts';
import { renderChartSvg } from '../../../src/render/svg/render-chart-svg.ts';
import { topicFixture } from '../topic-fixture.ts';
import { parseSvg, testDocument } from '../svg/parse-svg.ts';

describe('svgForExport', () => {
  // SVG 1.1 §7.10 (units): width and height may be given in millimetres; the viewBox keeps the drawing.
  it('sets the printed size in millimetres, keeping the aspect of the viewBox', () => {
    expect(svgForExport('<svg viewBox="0 0 720 360" width="720" height="360"></svg>')).toBe(
      '<?xml version="1.0" encoding="UTF-8"?>\n<svg viewBox="0 0 720 360" width="180mm" height="90mm"></svg>\n',
    );
    expect(svgForExport('<svg viewBox="0 0 600 400" width="600" height="400"/>', { widthMm: 120 })).toContain('width="120mm" height="80mm"');
  });

  it('turns a rendered chart into a file that still parses as SVG', () => {
    const text = svgForExport(renderChartSvg(outcomeChart(topicFixture(), 'stroke'), { document: testDocument }));
    const svg = parseSvg(text);
    expect(svg.getAttribute('width')).toBe('180mm');
    expect(svg.querySelectorAll('[data-outcome]')).toHaveLength(200);
  });

  it('rejects text without an svg root and viewBox', () => {
    expect(() => svgForExport('<div></div>')).toThrow(RangeError);
  });
});
