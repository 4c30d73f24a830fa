import { describe, expect, it } from 'vitest';
import { MACHADO_2009, cielab, colourDifference, greyscale, simulateVision } from '../../../src/render/colour/colour-vision.ts';
import { relativeLuminance } from '../../../src/render/colour/contrast.ts';

const DEFICIENCIES = ['protanopia', 'deuteranopia', 'tritanopia'] as const;

describe('simulateVision', () => {
  // Machado, Oliveira & Fernandes (2009), IEEE TVCG 15(6): the severity-1.0 matrices keep the
  // achromatic axis, so each row sums to 1 (matrices from memory).
  it.each(DEFICIENCIES)('keeps white, black and greys under %s (rows of the matrix sum to 1)', (deficiency) => {
    for (const row of MACHADO_2009[deficiency]) expect(row[0] + row[1] + row[2]).toBeCloseTo(1, 5);
    expect(simulateVision('#FFFFFF', deficiency)).toBe('#ffffff');
    expect(simulateVision('#000000', deficiency)).toBe('#000000');
    expect(simulateVision('#777777', deficiency)).toBe('#777777');
  });

  // Red–green deficiencies collapse red and green towards one hue (Machado et al. 2009, fig. of
  // simulated protanopia and deuteranopia): pure red and pure green end up much closer.
  it('brings red and green much closer together under protanopia and deuteranopia', () => {
    const normal = colourDifference('#FF0000', '#00FF00');
    for (const deficiency of ['protanopia', 'deuteranopia'] as const) {
      const simulated = colourDifference(simulateVision('#FF0000', deficiency), simulateVision('#00FF00', deficiency));
      expect(simulated).toBeLessThan(normal / 2);
    }
  });

  it('leaves blue and yellow apart under protanopia and deuteranopia (the axis those readers keep)', () => {
    for (const deficiency of ['protanopia', 'deuteranopia'] as const) {
      expect(colourDifference(simulateVision('#0072B2', deficiency), simulateVision('#F0E442', deficiency))).toBeGreaterThan(50);
    }
  });
});

describe('greyscale', () => {
  it('keeps the relative luminance of the colour (to 8-bit rounding)', () => {
    for (const hex of ['#0072B2', '#D55E00', '#009E73', '#E8E8E8']) {
      expect(relativeLuminance(greyscale(hex))).toBeCloseTo(relativeLuminance(hex), 2);
    }
  });
});

describe('cielab', () => {
  // CIE 1976 L*a*b* with D65 white: white is L* 100, a* b* 0; black is L* 0 (CIE 15:2004).
  it('gives white L* 100 and black L* 0 with no colour', () => {
    const white = cielab('#FFFFFF');
    expect(white[0]).toBeCloseTo(100, 2);
    expect(Math.abs(white[1])).toBeLessThan(0.01);
    expect(Math.abs(white[2])).toBeLessThan(0.01);
    expect(cielab('#000000')[0]).toBeCloseTo(0, 6);
  });

  // sRGB middle grey #777777 is L* ≈ 50 (commonly quoted, from memory).
  it('gives #777777 an L* near 50', () => {
    expect(cielab('#777777')[0]).toBeCloseTo(50.03, 1);
  });
});
