/**
 * A path context that forwards glyph drawing to jsPDF's own path operators
 * (m, l, c, h), turning arcs into cubic Bézier curves and shifting by an offset.
 */
import type { jsPDF } from 'jspdf';
import { arcToBezier } from '../glyphs/arc-to-bezier.ts';
import type { PathContext } from '../glyphs/path-context.ts';

export class PdfPathContext implements PathContext {
  #current: [number, number] | null = null;
  #subpathStart: [number, number] | null = null;

  constructor(
    private readonly doc: jsPDF,
    private readonly offsetX: number,
    private readonly offsetY: number,
  ) {}

  moveTo(x: number, y: number): void {
    this.doc.moveTo(x + this.offsetX, y + this.offsetY);
    this.#current = [x, y];
    this.#subpathStart = [x, y];
  }

  lineTo(x: number, y: number): void {
    if (this.#current === null) return this.moveTo(x, y);
    this.doc.lineTo(x + this.offsetX, y + this.offsetY);
    this.#current = [x, y];
  }

  bezierCurveTo(control1X: number, control1Y: number, control2X: number, control2Y: number, x: number, y: number): void {
    if (this.#current === null) this.moveTo(control1X, control1Y);
    const { offsetX, offsetY } = this;
    this.doc.curveTo(
      control1X + offsetX,
      control1Y + offsetY,
      control2X + offsetX,
      control2Y + offsetY,
      x + offsetX,
      y + offsetY,
    );
    this.#current = [x, y];
  }

  arc(x: number, y: number, radius: number, startAngle: number, endAngle: number, anticlockwise = false): void {
    const startX = x + radius * Math.cos(startAngle);
    const startY = y + radius * Math.sin(startAngle);
    const current = this.#current;
    if (current === null) this.moveTo(startX, startY);
    else if (Math.abs(current[0] - startX) > 1e-9 || Math.abs(current[1] - startY) > 1e-9) this.lineTo(startX, startY);
    for (const segment of arcToBezier(x, y, radius, startAngle, endAngle, anticlockwise)) {
      this.bezierCurveTo(...segment);
    }
  }

  closePath(): void {
    if (this.#current === null) return;
    this.doc.close();
    this.#current = this.#subpathStart;
  }
}
