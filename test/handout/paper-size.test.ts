import { describe, expect, it } from 'vitest';
import { HANDOUT_MARGIN, PAPER_SIZES, contentBox } from '../../src/handout/paper-size.ts';

describe('paper sizes', () => {
  // ISO 216: A4 is 210 × 297 mm.
  it('gives A4 as 210 by 297 millimetres', () => {
    expect(PAPER_SIZES.a4).toEqual({ width: 210, height: 297 });
  });

  // ANSI/ASME Y14.1: US Letter is 8.5 × 11 inches, 25.4 mm to the inch.
  it('gives US Letter as 8.5 by 11 inches', () => {
    expect(PAPER_SIZES.letter.width).toBeCloseTo(8.5 * 25.4, 10);
    expect(PAPER_SIZES.letter.height).toBeCloseTo(11 * 25.4, 10);
  });

  it('keeps 15 millimetres clear on every side, leaving 180 by 267 on A4 and 185.9 by 249.4 on Letter', () => {
    expect(HANDOUT_MARGIN).toBe(15);
    expect(contentBox('a4')).toEqual({ x: 15, y: 15, width: 180, height: 267 });
    const letter = contentBox('letter');
    expect(letter.width).toBeCloseTo(185.9, 10);
    expect(letter.height).toBeCloseTo(249.4, 10);
  });
});
