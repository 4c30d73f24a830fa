/**
 * Circular arcs as cubic Bézier curves, for path sinks without arcs (PDF).
 */

/** One cubic segment: two control points and the end point. */
export type CubicSegment = readonly [number, number, number, number, number, number];

/**
 * Cubic Bézier segments approximating a circular arc, split into pieces of at most
 * a quarter turn, each with control distance (4/3)·tan(θ/4)·r (the standard
 * approximation; error under 0.03% of r for a quarter turn — common practice).
 */
export function arcToBezier(
  centreX: number,
  centreY: number,
  radius: number,
  startAngle: number,
  endAngle: number,
  anticlockwise = false,
): CubicSegment[] {
  const sweep = arcSweep(startAngle, endAngle, anticlockwise);
  const pieces = Math.max(1, Math.ceil(Math.abs(sweep) / (Math.PI / 2) - 1e-9));
  const step = sweep / pieces;
  const handle = (4 / 3) * Math.tan(step / 4) * radius;
  const segments: CubicSegment[] = [];
  for (let piece = 0; piece < pieces; piece += 1) {
    const from = startAngle + piece * step;
    const to = from + step;
    const [fromX, fromY] = [centreX + radius * Math.cos(from), centreY + radius * Math.sin(from)];
    const [toX, toY] = [centreX + radius * Math.cos(to), centreY + radius * Math.sin(to)];
    segments.push([
      fromX - handle * Math.sin(from),
      fromY + handle * Math.cos(from),
      toX + handle * Math.sin(to),
      toY - handle * Math.cos(to),
      toX,
      toY,
    ]);
  }
  return segments;
}

/** The signed angle an arc turns through, with Canvas rules: a full turn at most. */
export function arcSweep(startAngle: number, endAngle: number, anticlockwise = false): number {
  const fullTurn = Math.PI * 2;
  const raw = endAngle - startAngle;
  if (!anticlockwise) {
    if (raw >= fullTurn) return fullTurn;
    return raw < 0 ? (raw % fullTurn) + fullTurn : raw;
  }
  if (-raw >= fullTurn) return -fullTurn;
  return raw > 0 ? (raw % fullTurn) - fullTurn : raw;
}
