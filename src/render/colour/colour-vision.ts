/**
 * Simulated colour-vision deficiency and greyscale, to check that the chart's
 * groups stay apart for readers who lose a hue and on a greyscale print.
 */
import { encodedChannel, hexChannels, linearChannel, relativeLuminance } from './contrast.ts';

export type VisionDeficiency = 'protanopia' | 'deuteranopia' | 'tritanopia';

type Matrix = readonly [readonly [number, number, number], readonly [number, number, number], readonly [number, number, number]];

/**
 * Machado, Oliveira & Fernandes (2009), "A physiologically-based model for simulation
 * of color vision deficiency", IEEE TVCG 15(6):1291–1298, matrices at severity 1.0,
 * applied to linear sRGB. Values from memory; they match the copies commonly used
 * in browser developer tools. Each row sums to 1, so white and greys are kept.
 */
export const MACHADO_2009: Readonly<Record<VisionDeficiency, Matrix>> = {
  protanopia: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deuteranopia: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritanopia: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

/** A colour as `#rrggbb` from three channels in 0–1, clamped and rounded. */
export function hexFromChannels(channels: readonly [number, number, number]): string {
  return `#${channels
    .map((channel) =>
      Math.round(Math.min(1, Math.max(0, channel)) * 255)
        .toString(16)
        .padStart(2, '0'),
    )
    .join('')}`;
}

/**
 * How a colour looks with a full (severity 1.0) colour-vision deficiency, after
 * Machado et al. (2009).
 *
 * @example simulateVision('#FFFFFF', 'deuteranopia') // => '#ffffff'
 */
export function simulateVision(hex: string, deficiency: VisionDeficiency): string {
  const linear = hexChannels(hex).map((channel) => linearChannel(channel / 255));
  const simulated = MACHADO_2009[deficiency].map((row) =>
    encodedChannel(Math.min(1, Math.max(0, row[0] * (linear[0] ?? 0) + row[1] * (linear[1] ?? 0) + row[2] * (linear[2] ?? 0)))),
  );
  return hexFromChannels(simulated as [number, number, number]);
}

/**
 * The grey a colour prints as: the same relative luminance (WCAG weights), so
 * lightness order and contrast are kept.
 *
 * @example greyscale('#0072B2') // => '#6d6d6d'
 */
export function greyscale(hex: string): string {
  const level = encodedChannel(relativeLuminance(hex));
  return hexFromChannels([level, level, level]);
}

/** CIE 1976 L*a*b* of an sRGB colour (D65 white; sRGB-to-XYZ matrix of IEC 61966-2-1 to 7 digits). */
export function cielab(hex: string): [number, number, number] {
  const [red, green, blue] = hexChannels(hex).map((channel) => linearChannel(channel / 255)) as [number, number, number];
  const x = (0.4124564 * red + 0.3575761 * green + 0.1804375 * blue) / 0.95047;
  const y = 0.2126729 * red + 0.7151522 * green + 0.072175 * blue;
  const z = (0.0193339 * red + 0.119192 * green + 0.9503041 * blue) / 1.08883;
  const bend = (value: number) => (value > 216 / 24389 ? Math.cbrt(value) : ((24389 / 27) * value + 16) / 116);
  const [fx, fy, fz] = [bend(x), bend(y), bend(z)];
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

/** The CIE 1976 colour difference ΔE*ab between two colours. */
export function colourDifference(hexA: string, hexB: string): number {
  const first = cielab(hexA);
  const second = cielab(hexB);
  return Math.hypot(first[0] - second[0], first[1] - second[1], first[2] - second[2]);
}
