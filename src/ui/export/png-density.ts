/**
 * Mark a PNG with its print resolution, by adding a `pHYs` chunk (W3C, Portable Network
 * Graphics Specification, 2nd edition, 2003, §11.3.5.3) right after the header chunk.
 * A browser canvas writes PNGs without one, so they would open at 72 or 96 dpi.
 */

const SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const METRES_PER_INCH = 0.0254;

let crcTable: Uint32Array | null = null;

/** CRC-32 as PNG uses it (ISO 3309 / ITU-T V.42 polynomial, PNG spec §5.5 and Annex D). */
export function crc32(bytes: Uint8Array): number {
  if (crcTable === null) {
    crcTable = new Uint32Array(256);
    for (let index = 0; index < 256; index += 1) {
      let value = index;
      for (let bit = 0; bit < 8; bit += 1) value = value & 1 ? 0xedb88320 ^ (value >>> 1) : value >>> 1;
      crcTable[index] = value >>> 0;
    }
  }
  let crc = 0xffffffff;
  for (const byte of bytes) crc = (crcTable[(crc ^ byte) & 0xff] ?? 0) ^ (crc >>> 8);
  return (crc ^ 0xffffffff) >>> 0;
}

/** Pixels per metre for a resolution in dots per inch, rounded as PNG stores it: 300 → 11811. */
export function pixelsPerMetre(dpi: number): number {
  return Math.round(dpi / METRES_PER_INCH);
}

function chunk(type: string, data: Uint8Array): Uint8Array {
  const out = new Uint8Array(12 + data.length);
  const view = new DataView(out.buffer);
  view.setUint32(0, data.length);
  for (let index = 0; index < 4; index += 1) out[4 + index] = type.charCodeAt(index);
  out.set(data, 8);
  view.setUint32(8 + data.length, crc32(out.subarray(4, 8 + data.length)));
  return out;
}

/**
 * The same PNG with a `pHYs` chunk saying `dpi` in both directions (any earlier pHYs is
 * replaced).
 *
 * @throws RangeError when `png` is not a PNG file
 */
export function withPrintResolution(png: Uint8Array, dpi: number): Uint8Array {
  if (png.length < 33 || SIGNATURE.some((byte, index) => png[index] !== byte)) {
    throw new RangeError('withPrintResolution requires a PNG file');
  }
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  const headerEnd = 8 + 12 + view.getUint32(8);
  const parts: Uint8Array[] = [png.subarray(0, headerEnd)];
  const density = new Uint8Array(9);
  const densityView = new DataView(density.buffer);
  densityView.setUint32(0, pixelsPerMetre(dpi));
  densityView.setUint32(4, pixelsPerMetre(dpi));
  density[8] = 1; // unit: the metre
  parts.push(chunk('pHYs', density));
  let offset = headerEnd;
  while (offset + 12 <= png.length) {
    const length = view.getUint32(offset);
    const type = String.fromCharCode(...png.subarray(offset + 4, offset + 8));
    const end = offset + 12 + length;
    if (type !== 'pHYs') parts.push(png.subarray(offset, end));
    offset = end;
  }
  const total = parts.reduce((sum, part) => sum + part.length, 0);
  const out = new Uint8Array(total);
  let position = 0;
  for (const part of parts) {
    out.set(part, position);
    position += part.length;
  }
  return out;
}
