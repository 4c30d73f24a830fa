import { describe, expect, it } from 'vitest';
import { svgForExport } from '../../../src/render/export/svg-for-export.ts';

describe('svgForExport', () => {
  // SVG 1.1 §7.10 (units): width and height may be given in millimetres; the viewBox keeps the drawing.
  it('sets the printed size in millimetres, keeping the aspect of the viewBox', () => {
    expect(svgForExport('<svg viewBox="0 0 720 360" width="720" height="360"></svg>')).toBe(
      '<?xml version="1.0" encoding="UTF-8"?>\n<svg viewBox="0 0 720 360" width="180mm" height="90mm"></svg>\n',
    );
    expect(svgForExport('<svg viewBox="0 0 600 400" width="600" height="400"/>', { widthMm: 120 })).toContain(
      'width="120mm" height="80mm"',
    );
  });

  it('changes only the root’s size, leaving attributes that merely end in width alone', () => {
    const text = svgForExport(
      '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 720 360" width="720" height="360"><rect stroke-width="2" width="5" height="5"/></svg>',
    );
    expect(text).toContain('<rect stroke-width="2" width="5" height="5"/>');
    expect(text).toContain('viewBox="0 0 720 360" width="180mm" height="90mm"');
  });

  it('rejects text without an svg root and viewBox', () => {
    expect(() => svgForExport('<div></div>')).toThrow(RangeError);
  });
});
