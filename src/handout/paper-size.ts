/**
 * The paper sizes a handout is printed on and its margins, in millimetres
 * (ISO 216 for A4; ANSI/ASME Y14.1 for US Letter, 8.5 × 11 in).
 */

/** The papers a handout can be printed on. */
export type Paper = 'a4' | 'letter';

export interface PaperSize {
  readonly width: number;
  readonly height: number;
}

/** Page sizes in millimetres: A4 210 × 297; US Letter 215.9 × 279.4 (8.5 × 11 inches). */
export const PAPER_SIZES: Readonly<Record<Paper, PaperSize>> = {
  a4: { width: 210, height: 297 },
  letter: { width: 215.9, height: 279.4 },
};

/** The margin on every side, in millimetres: clear of what office printers cannot reach. */
export const HANDOUT_MARGIN = 15;

/** The box text and pictures may use: the page less its margins. */
export function contentBox(paper: Paper): {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
} {
  const size = PAPER_SIZES[paper];
  return {
    x: HANDOUT_MARGIN,
    y: HANDOUT_MARGIN,
    width: size.width - 2 * HANDOUT_MARGIN,
    height: size.height - 2 * HANDOUT_MARGIN,
  };
}
