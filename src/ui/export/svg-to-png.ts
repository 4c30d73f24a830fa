/**
 * SVG text drawn on a canvas in the browser, on white, and read back as PNG bytes:
 * the one rasterising step behind the chart and slide exports.
 */

/** The size of the PNG, in pixels. */
export interface PixelSize {
  readonly width: number;
  readonly height: number;
}

function loadImage(url: string, what: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const image = new Image();
    image.onload = () => resolve(image);
    image.onerror = () => reject(new Error(`the ${what} could not be drawn as an image`));
    image.src = url;
  });
}

/**
 * Draw `svgText` at `pixels` on a white canvas and return the PNG.
 * `what` names the picture in the error when the browser cannot draw it ("chart", "slide").
 */
export async function svgTextToPng(svgText: string, document: Document, pixels: PixelSize, what: string): Promise<Uint8Array> {
  const url = URL.createObjectURL(new Blob([svgText], { type: 'image/svg+xml' }));
  try {
    const image = await loadImage(url, what);
    const canvas = document.createElement('canvas');
    canvas.width = pixels.width;
    canvas.height = pixels.height;
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('images cannot be drawn here (no 2D canvas)');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, pixels.width, pixels.height);
    context.drawImage(image, 0, 0, pixels.width, pixels.height);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/png'));
    if (blob === null) throw new Error('the image could not be made');
    return new Uint8Array(await blob.arrayBuffer());
  } finally {
    URL.revokeObjectURL(url);
  }
}
