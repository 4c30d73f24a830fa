/**
 * The colours of a teaching slide, one set for the live view and the exported SVG:
 * dark ink on the charts' white background, so a projected slide and a saved one
 * look alike. People are painted from the chart palette (`render/palette.ts`), whose
 * background the slide shares; the text colours keep at least 7:1 on that white
 * (WCAG 2.2, 1.4.6), the line 2:1 as a decorative rule.
 */
import { colourPalette } from '../render/palette.ts';

export interface SlideColours {
  /** Headings and body text. */
  readonly ink: string;
  /** Labels, notes and the footer. */
  readonly muted: string;
  /** The slide, and the cards on it. */
  readonly surface: string;
  /** Card borders and the footer rule. */
  readonly line: string;
  /** Card figures and their left bar. */
  readonly accent: string;
  /** Evidence, notices and the illustrative mark. */
  readonly notice: string;
  /** The evidence box behind the notice colour. */
  readonly noticeSoft: string;
  /** Error messages of the live view. */
  readonly problem: string;
}

export const slideColours: SlideColours = {
  ink: '#111820',
  muted: '#3d4853',
  surface: colourPalette.background,
  line: '#aeb8c2',
  accent: '#0b4f8a',
  notice: '#5c3f00',
  noticeSoft: '#fff4d6',
  problem: '#8f1c17',
};
