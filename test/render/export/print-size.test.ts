import { describe, expect, it } from 'vitest';
import { pngDimensionsForPrint, pngSizeForPrint } from '../../../src/render/export/print-size.ts';

describe('pngSizeForPrint', () => {
  // 1 inch = 25.4 mm exactly (international yard and pound agreement, 1959): 180 mm at 300 dpi
  // is 180 / 25.4 × 300 = 2125.98 → 2126 px.
  it('gives 2126 px for 180 mm at 300 dpi by default', () => {
    expect(pngSizeForPrint()).toBe(2126);
    expect(pngSizeForPrint(180, 300)).toBe(2126);
  });

  // A4 (ISO 216, 210 × 297 mm) at 300 dpi is 2480 × 3508 px (computed from 25.4 mm per inch; common practice).
  it('gives 2480 px for the width of A4 at 300 dpi', () => {
    expect(pngSizeForPrint(210, 300)).toBe(2480);
    expect(pngSizeForPrint(297, 300)).toBe(3508);
  });

  it('rejects a width or resolution that is not positive', () => {
    expect(() => pngSizeForPrint(0, 300)).toThrow(RangeError);
    expect(() => pngSizeForPrint(180, -1)).toThrow(RangeError);
  });
});

describe('pngDimensionsForPrint', () => {
  it('keeps the chart’s aspect ratio', () => {
    expect(pngDimensionsForPrint({ width: 720, height: 360 })).toEqual({ width: 2126, height: 1063 });
  });
});
