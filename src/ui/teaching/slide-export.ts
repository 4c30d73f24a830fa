/**
 * Saving the current slide for a slide deck: SVG text, or a 1920 × 1080 PNG drawn
 * from that SVG on a canvas in the browser.
 */
import { svgTextToPng } from '../export/svg-to-png.ts';
import { plainFileStem } from '../files/plain-file-stem.ts';
import { SLIDE_HEIGHT, SLIDE_WIDTH, slideSvgText } from '../../teaching/slide-svg.ts';
import type { Slide } from '../../teaching/slide-model.ts';
import type { StepKind } from '../../teaching/teaching-steps.ts';

/** A file name for a slide: the presentation's title in plain letters, the slide number and step. */
export function slideFileName(title: string, number: number, kind: StepKind, extension: string): string {
  const base = `${plainFileStem(title, 6, 'teaching')}-${String(number).padStart(2, '0')}-${kind}`;
  return extension === '' ? base : `${base}.${extension}`;
}

/** The slide as an SVG file's text. */
export function slideSvgFile(slide: Slide, document: Document, footer: string, illustrative: string): string {
  return slideSvgText(slide, document, footer, illustrative);
}

/** The slide as PNG bytes, 1920 × 1080 pixels. */
export function slidePngFile(slide: Slide, document: Document, footer: string, illustrative: string): Promise<Uint8Array> {
  return svgTextToPng(
    slideSvgText(slide, document, footer, illustrative),
    document,
    { width: SLIDE_WIDTH, height: SLIDE_HEIGHT },
    'slide',
  );
}
