/**
 * Saving the current slide for a slide deck: SVG text, or a 1920 × 1080 PNG drawn
 * from that SVG on a canvas in the browser.
 */
import { plainFileStem } from '../files/plain-file-stem.ts';
import { SLIDE_HEIGHT, SLIDE_WIDTH, slideSvgText } from './slide-svg.ts';
import type { Slide } from './slide-model.ts';
import type { StepKind } from './teaching-steps.ts';

/** A file name for a slide: the presentation's title in plain letters, the slide number and step. */
export function slideFileName(title: string, number: number, kind: StepKind, extension: string): string {
  const base = `${plainFileStem(title, 6, 'teaching')}-${String(number).padStart(2, '0')}-${kind}`;
  return extension === '' ? base : `${base}.${extension}`;
}

/** The slide as an SVG file's text. */
export function slideSvgFile(slide: Slide, document: Document, footer: string, illustrative: string): string {
  return slideSvgText(slide, document, footer, illustrative);
}

function loadImage(url: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const image = new Image();
    image.onload = () => resolve(image);
    image.onerror = () => reject(new Error('the slide could not be drawn as an image'));
    image.src = url;
  });
}

/** The slide as PNG bytes, 1920 × 1080 pixels. */
export async function slidePngFile(slide: Slide, document: Document, footer: string, illustrative: string): Promise<Uint8Array> {
  const url = URL.createObjectURL(new Blob([slideSvgText(slide, document, footer, illustrative)], { type: 'image/svg+xml' }));
  try {
    const image = await loadImage(url);
    const canvas = document.createElement('canvas');
    canvas.width = SLIDE_WIDTH;
    canvas.height = SLIDE_HEIGHT;
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('this browser cannot draw images');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, SLIDE_WIDTH, SLIDE_HEIGHT);
    context.drawImage(image, 0, 0, SLIDE_WIDTH, SLIDE_HEIGHT);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (blob === null) throw new Error('the image could not be made');
    return new Uint8Array(await blob.arrayBuffer());
  } finally {
    URL.revokeObjectURL(url);
  }
}
