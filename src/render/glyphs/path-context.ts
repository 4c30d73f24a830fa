/**
 * The minimal path interface glyphs draw into: a subset of the Canvas 2D path API,
 * so one glyph definition serves an SVG path string and the PDF's drawing calls.
 */

/** A path sink with Canvas semantics (angles in radians, y downwards). */
export interface PathContext {
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  /** A circular arc; like Canvas, it first draws a line from the current point to the arc's start. */
  arc(x: number, y: number, radius: number, startAngle: number, endAngle: number, anticlockwise?: boolean): void;
  bezierCurveTo(control1X: number, control1Y: number, control2X: number, control2Y: number, x: number, y: number): void;
  closePath(): void;
}

/** A shape drawn into a square box of side `size` whose top-left corner is the origin. */
export interface Glyph {
  draw(context: PathContext, size: number): void;
}
