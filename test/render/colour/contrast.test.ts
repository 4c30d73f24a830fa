import { describe, expect, it } from 'vitest';
import {
  WCAG_THRESHOLDS,
  contrastRatio,
  hexChannels,
  linearChannel,
  relativeLuminance,
} from '../../../src/render/colour/contrast.ts';

// W3C, Web Content Accessibility Guidelines (WCAG) 2.2, definitions of "relative luminance" and
// "contrast ratio"; SC 1.4.3 Contrast (Minimum) and SC 1.4.11 Non-text Contrast. The ratios in
// the table are computed from those formulas.
const TABLE: readonly [string, string, number][] = [
  ['#000000', '#FFFFFF', 21],
  ['#FFFFFF', '#FFFFFF', 1],
  ['#767676', '#FFFFFF', 4.542],
  ['#777777', '#FFFFFF', 4.478],
  ['#949494', '#FFFFFF', 3.0335],
  ['#959595', '#FFFFFF', 2.995],
  ['#0072B2', '#FFFFFF', 5.185],
  ['#D55E00', '#FFFFFF', 3.867],
  ['#009E73', '#FFFFFF', 3.421],
  ['#CC79A7', '#FFFFFF', 3.061],
  ['#E69F00', '#FFFFFF', 2.252],
  ['#56B4E9', '#FFFFFF', 2.307],
  ['#F0E442', '#FFFFFF', 1.322],
  ['#999999', '#FFFFFF', 2.849],
  ['#0072B2', '#D55E00', 1.341],
  ['#0072B2', '#DDDDDD', 3.818],
];

describe('contrastRatio', () => {
  it.each(TABLE)('gives %s on %s a ratio of %d (WCAG 2.2 formula)', (foreground, background, expected) => {
    expect(contrastRatio(foreground, background)).toBeCloseTo(expected, expected === 3.0335 ? 4 : 3);
  });

  it('is the same whichever colour comes first', () => {
    expect(contrastRatio('#FFFFFF', '#0072B2')).toBe(contrastRatio('#0072B2', '#FFFFFF'));
  });

  // WCAG 2.2 Understanding SC 1.4.3: computed values are not rounded, so 4.499:1 does not meet 4.5:1.
  it('compares unrounded: 4.499 fails 4.5, and #777777 (4.478, "4.5" at one decimal) fails text', () => {
    expect(4.499 >= WCAG_THRESHOLDS.text).toBe(false);
    expect(contrastRatio('#777777', '#FFFFFF') >= WCAG_THRESHOLDS.text).toBe(false);
    expect(contrastRatio('#767676', '#FFFFFF') >= WCAG_THRESHOLDS.text).toBe(true);
  });

  it('passes #949494 and fails #959595 on white for graphics at 3:1 (SC 1.4.11)', () => {
    expect(contrastRatio('#949494', '#FFFFFF') >= WCAG_THRESHOLDS.graphics).toBe(true);
    expect(contrastRatio('#959595', '#FFFFFF') >= WCAG_THRESHOLDS.graphics).toBe(false);
  });
});

describe('relativeLuminance', () => {
  // WCAG 2.2 relative luminance of Okabe–Ito blue, vermillion, bluish green, orange and #DDDDDD
  // (computed from the formula).
  it.each([
    ['#0072B2', 0.1525],
    ['#D55E00', 0.2215],
    ['#009E73', 0.2569],
    ['#E69F00', 0.4162],
    ['#DDDDDD', 0.7231],
  ] as const)('gives %s a luminance of %d', (hex, expected) => {
    expect(relativeLuminance(hex)).toBeCloseTo(expected, 4);
  });

  it('is 0 for black and 1 for white', () => {
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#FFFFFF')).toBeCloseTo(1, 12);
  });

  // WCAG 2.2 note on relative luminance: the former threshold 0.03928 "has no practical effect";
  // Checked here over every 8-bit value: 10/255 is below both thresholds and 11/255 above both.
  it('gives the same result with the older 0.03928 threshold for all 256 channel values', () => {
    const older = (channel: number) => (channel <= 0.03928 ? channel / 12.92 : ((channel + 0.055) / 1.055) ** 2.4);
    let differences = 0;
    for (let value = 0; value < 256; value += 1) {
      if (older(value / 255) !== linearChannel(value / 255)) differences += 1;
    }
    expect(differences).toBe(0);
  });
});

describe('hexChannels', () => {
  it('reads six- and three-digit colours', () => {
    expect(hexChannels('#0072B2')).toEqual([0, 114, 178]);
    expect(hexChannels('#fff')).toEqual([255, 255, 255]);
  });

  it('rejects text that is not a colour', () => {
    expect(() => hexChannels('blue')).toThrow(RangeError);
  });
});
