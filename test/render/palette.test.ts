import { describe, expect, it } from 'vitest';
import type { PersonLook } from '../../src/core/direction.ts';
import { colourDifference, greyscale, simulateVision } from '../../src/render/colour/colour-vision.ts';
import { WCAG_THRESHOLDS, contrastRatio, relativeLuminance } from '../../src/render/colour/contrast.ts';
import { OKABE_ITO, blackAndWhitePalette, colourPalette } from '../../src/render/palette.ts';

const GROUPS: readonly PersonLook[] = ['event', 'helped', 'harmed', 'free'];
const PAIRS = GROUPS.flatMap((first, index) => GROUPS.slice(index + 1).map((second) => [first, second] as const));

describe('colourPalette', () => {
  // Okabe & Ito (2008), Color Universal Design: the palette's hex values.
  it('uses the Okabe–Ito blue, bluish green and vermillion for events, benefit and harm', () => {
    expect(OKABE_ITO).toMatchObject({ blue: '#0072B2', bluishGreen: '#009E73', vermillion: '#D55E00' });
    expect(colourPalette.groups.event.fill).toBe(OKABE_ITO.blue);
    expect(colourPalette.groups.helped.fill).toBe(OKABE_ITO.bluishGreen);
    expect(colourPalette.groups.harmed.fill).toBe(OKABE_ITO.vermillion);
  });

  it('puts dots on the benefit and hatching on the harm, solid fills elsewhere', () => {
    expect(colourPalette.groups.helped.pattern).toBe('dots');
    expect(colourPalette.groups.harmed.pattern).toBe('hatch');
    expect(colourPalette.groups.event.pattern).toBe('solid');
    expect(colourPalette.groups.free.pattern).toBe('solid');
  });
});

describe.each([colourPalette, blackAndWhitePalette])('the $name palette', (palette) => {
  // WCAG 2.2 SC 1.4.3: text at least 4.5:1.
  it('sets text and muted text at 4.5:1 or more on the background (SC 1.4.3)', () => {
    expect(contrastRatio(palette.text, palette.background)).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.text);
    expect(contrastRatio(palette.mutedText, palette.background)).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.text);
  });

  // WCAG 2.2 SC 1.4.11: graphics needed to understand the content at least 3:1; a light figure
  // passes through its outline.
  it.each(GROUPS)('draws %s figures with a fill or outline of 3:1 or more (SC 1.4.11)', (group) => {
    const style = palette.groups[group];
    const best = Math.max(contrastRatio(style.fill, palette.background), contrastRatio(style.outline, palette.background));
    expect(best).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.graphics);
  });

  it('draws the outline of uncertain people at 3:1 or more (SC 1.4.11)', () => {
    expect(contrastRatio(palette.uncertainOutline, palette.background)).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.graphics);
  });

  it('sets the dots and hatching at 3:1 or more against the fill they sit on', () => {
    for (const group of ['helped', 'harmed'] as const) {
      const style = palette.groups[group];
      expect(contrastRatio(style.patternInk, style.fill)).toBeGreaterThanOrEqual(WCAG_THRESHOLDS.graphics);
    }
  });

  // WCAG 2.2 SC 1.4.1 (colour not the only means) and a greyscale print: every pair of groups
  // differs in pattern, or in lightness by at least 1.5:1 (design threshold, common practice).
  it.each(PAIRS)('tells %s from %s in greyscale by pattern or lightness (SC 1.4.1)', (first, second) => {
    const [a, b] = [palette.groups[first], palette.groups[second]];
    const lightness = contrastRatio(greyscale(a.fill), greyscale(b.fill));
    expect(a.pattern !== b.pattern || lightness >= 1.5).toBe(true);
  });
});

describe('colourPalette under simulated colour-vision deficiency', () => {
  // Machado, Oliveira & Fernandes (2009) at severity 1.0. Two cues everywhere (WCAG 2.2 SC 1.4.1;
  // Okabe & Ito 2008, redundant coding): each pair differs by pattern or by ΔE*ab ≥ 20 after simulation, and event, benefit and
  // harm stay apart from no event by colour alone (ΔE*ab ≥ 20; threshold a design choice,
  // common practice for "clearly different" colours).
  it.each(['protanopia', 'deuteranopia', 'tritanopia'] as const)('keeps every pair of groups apart under %s', (deficiency) => {
    for (const [first, second] of PAIRS) {
      const [a, b] = [colourPalette.groups[first], colourPalette.groups[second]];
      const distance = colourDifference(simulateVision(a.fill, deficiency), simulateVision(b.fill, deficiency));
      expect(a.pattern !== b.pattern || distance >= 20, `${first} vs ${second}: ΔE ${distance.toFixed(1)}`).toBe(true);
      if (second === 'free') expect(distance, `${first} vs free`).toBeGreaterThanOrEqual(20);
    }
  });

  it('keeps benefit and harm far apart in hue for readers with normal vision', () => {
    expect(colourDifference(colourPalette.groups.helped.fill, colourPalette.groups.harmed.fill)).toBeGreaterThan(50);
  });

  it('makes events the darkest group, so the total stands out in any print', () => {
    const events = relativeLuminance(colourPalette.groups.event.fill);
    for (const group of ['helped', 'harmed', 'free'] as const) {
      expect(events).toBeLessThan(relativeLuminance(colourPalette.groups[group].fill));
    }
  });
});
