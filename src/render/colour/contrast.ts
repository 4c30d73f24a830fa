/**
 * WCAG 2.2 relative luminance and contrast ratio, from the definitions in the
 * W3C Recommendation (sRGB channel linearisation with the 0.04045 threshold).
 */

/** The three 8-bit channels of a `#RRGGBB` (or `#RGB`) colour. */
export function hexChannels(hex: string): [number, number, number] {
  const match = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(hex.trim());
  if (match === null) throw new RangeError(`hexChannels requires a #RRGGBB colour (got ${hex})`);
  const digits = match[1] as string;
  const full = digits.length === 3 ? [...digits].map((digit) => digit + digit).join('') : digits;
  return [0, 2, 4].map((start) => Number.parseInt(full.slice(start, start + 2), 16)) as [number, number, number];
}

/** An sRGB channel (0–1) on the linear-light scale. */
export function linearChannel(channel: number): number {
  return channel <= 0.04045 ? channel / 12.92 : ((channel + 0.055) / 1.055) ** 2.4;
}

/** A linear-light channel (0–1) back on the sRGB scale. */
export function encodedChannel(linear: number): number {
  return linear <= 0.0031308 ? linear * 12.92 : 1.055 * linear ** (1 / 2.4) - 0.055;
}

/**
 * The relative luminance of a colour: L = 0.2126 R + 0.7152 G + 0.0722 B on
 * linearised channels (WCAG 2.2, definition of relative luminance).
 *
 * @example relativeLuminance('#0072B2') // => 0.1525 (to 4 decimals)
 */
export function relativeLuminance(hex: string): number {
  const [red, green, blue] = hexChannels(hex).map((channel) => linearChannel(channel / 255)) as [number, number, number];
  return 0.2126 * red + 0.7152 * green + 0.0722 * blue;
}

/**
 * The contrast ratio (L1 + 0.05) / (L2 + 0.05), L1 the lighter, from 1 to 21
 * (WCAG 2.2, definition of contrast ratio). Not rounded: 4.499 fails 4.5.
 *
 * @example contrastRatio('#767676', '#FFFFFF') // => 4.542 (to 3 decimals)
 */
export function contrastRatio(hexA: string, hexB: string): number {
  const first = relativeLuminance(hexA);
  const second = relativeLuminance(hexB);
  return (Math.max(first, second) + 0.05) / (Math.min(first, second) + 0.05);
}

/** Thresholds of WCAG 2.2 success criteria 1.4.3 (text) and 1.4.11 (graphics). */
export const WCAG_THRESHOLDS = { text: 4.5, largeText: 3, graphics: 3 } as const;
