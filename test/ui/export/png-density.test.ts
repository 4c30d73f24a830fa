import { describe, expect, test } from 'vitest';
import { crc32, pixelsPerMetre, withPrintResolution } from '../../../src/ui/export/png-density.ts';

const ascii = (text: string) => new TextEncoder().encode(text);

/** A minimal PNG: signature, IHDR for 1×1 greyscale, an IDAT, and IEND (W3C PNG 2nd ed., §5). */
function minimalPng(): Uint8Array {
  const chunk = (type: string, data: number[]) => {
    const body = new Uint8Array([...ascii(type), ...data]);
    const length = [0, 0, 0, data.length];
    const crc = crc32(body);
    return [...length, ...body, (crc >>> 24) & 255, (crc >>> 16) & 255, (crc >>> 8) & 255, crc & 255];
  };
  return new Uint8Array([
    0x89,
    0x50,
    0x4e,
    0x47,
    0x0d,
    0x0a,
    0x1a,
    0x0a,
    ...chunk('IHDR', [0, 0, 0, 1, 0, 0, 0, 1, 8, 0, 0, 0, 0]),
    ...chunk('IDAT', [0x78, 0x9c, 0x63, 0x00, 0x00, 0x00, 0x01, 0x00, 0x01]),
    ...chunk('IEND', []),
  ]);
}

function chunks(png: Uint8Array): { type: string; data: Uint8Array }[] {
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  const found: { type: string; data: Uint8Array }[] = [];
  for (let offset = 8; offset < png.length;) {
    const length = view.getUint32(offset);
    found.push({
      type: String.fromCharCode(...png.subarray(offset + 4, offset + 8)),
      data: png.subarray(offset + 8, offset + 8 + length),
    });
    offset += 12 + length;
  }
  return found;
}

describe('crc32', () => {
  test('gives the standard check value for "123456789"', () => {
    // CRC-32 (ISO 3309 / ITU-T V.42) check value 0xCBF43926: Williams 1993,
    // "A painless guide to CRC error detection algorithms", the CRC-32 parameter model.
    expect(crc32(ascii('123456789'))).toBe(0xcbf43926);
  });

  test('gives the CRC every PNG ends with for its IEND chunk', () => {
    // Every PNG file ends in 00 00 00 00 49 45 4E 44 AE 42 60 82 (W3C PNG 2nd ed., §11.2.5, IEND with no data).
    expect(crc32(ascii('IEND'))).toBe(0xae426082);
  });
});

describe('withPrintResolution', () => {
  test('300 dpi is stored as 11811 pixels per metre (300 / 0.0254, rounded)', () => {
    expect(pixelsPerMetre(300)).toBe(11811);
    expect(pixelsPerMetre(72)).toBe(2835);
  });

  test('adds one pHYs chunk right after IHDR with the resolution in metres (PNG §11.3.5.3)', () => {
    const marked = withPrintResolution(minimalPng(), 300);
    const found = chunks(marked);
    expect(found.map((item) => item.type)).toEqual(['IHDR', 'pHYs', 'IDAT', 'IEND']);
    const density = found[1]?.data ?? new Uint8Array();
    const view = new DataView(density.buffer, density.byteOffset, density.byteLength);
    expect([view.getUint32(0), view.getUint32(4), density[8]]).toEqual([11811, 11811, 1]);
    const marker = marked.indexOf(0x70); // the "p" of pHYs
    const stored = new DataView(marked.buffer).getUint32(marker + 4 + 9);
    expect(stored).toBe(crc32(marked.subarray(marker, marker + 4 + 9)));
  });

  test('replaces an earlier pHYs instead of adding a second', () => {
    const twice = withPrintResolution(withPrintResolution(minimalPng(), 96), 300);
    expect(chunks(twice).filter((item) => item.type === 'pHYs')).toHaveLength(1);
  });

  test('refuses bytes that are not a PNG', () => {
    expect(() => withPrintResolution(ascii('GIF89a and more bytes than a header'), 300)).toThrow(RangeError);
  });
});
