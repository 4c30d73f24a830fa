/** Read what a jsPDF document painted, from its uncompressed content stream (PDF 1.7, ISO 32000-1 §8). */

/** A painting operator and the fill colour current when it ran. */
export interface Painting {
  readonly operator: string;
  readonly fill: string;
}

/** Colour operands as jsPDF writes them (two decimals), for matching. */
export function pdfColour(hex: string): string {
  const channel = (start: number) => Number.parseInt(hex.slice(start, start + 2), 16) / 255;
  return [channel(1), channel(3), channel(5)].map((value) => value.toFixed(2)).join(' ');
}

/**
 * Every fill-painting operator (f, F, f*, B, B*, b, b*) in the page content, with the fill
 * colour set by the last `rg` (RGB) or `g` (grey, which jsPDF writes when r = g = b).
 */
export function paintings(pdf: string): Painting[] {
  const found: Painting[] = [];
  let fill = '0.00 0.00 0.00';
  const streams = pdf.match(/stream\r?\n([\s\S]*?)endstream/g) ?? [];
  for (const stream of streams) {
    for (const line of stream.split(/\r?\n/)) {
      const colour = /^([\d.]+) ([\d.]+) ([\d.]+) rg$/.exec(line.trim());
      if (colour !== null) {
        fill = [colour[1], colour[2], colour[3]].map((value) => Number(value).toFixed(2)).join(' ');
        continue;
      }
      const grey = /^([\d.]+) g$/.exec(line.trim());
      if (grey !== null) {
        const level = Number(grey[1]).toFixed(2);
        fill = [level, level, level].join(' ');
        continue;
      }
      const operator = line.trim();
      if (['f', 'F', 'f*', 'B', 'B*', 'b', 'b*'].includes(operator)) found.push({ operator, fill });
    }
  }
  return found;
}
