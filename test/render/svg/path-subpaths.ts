/**
 * A small reader of SVG path data for tests: splits a `d` at each absolute move-to into the
 * subpath runs a renderer joined, and gives the absolute points each run passes through
 * (end points and control points), following SVG 1.1 (Second Edition, W3C 2011), §8.3
 * "Path data": lower-case commands are relative to the current point, `z` returns to the
 * start of the subpath.
 */

/** One run from an absolute `M` to the next: its start and every point it touches. */
export interface PathRun {
  readonly start: readonly [number, number];
  readonly points: readonly (readonly [number, number])[];
}

const ARGUMENTS: Readonly<Record<string, number>> = { m: 2, l: 2, h: 1, v: 1, c: 6, a: 7, z: 0 };

/** The runs of `d`, one per absolute `M`. */
export function pathRuns(d: string): PathRun[] {
  const runs: { start: [number, number]; points: [number, number][] }[] = [];
  const tokens = d.match(/[A-Za-z]|-?(?:\d+\.?\d*|\.\d+)(?:e-?\d+)?/g) ?? [];
  let current: [number, number] = [0, 0];
  let subpathStart: [number, number] = [0, 0];
  let index = 0;
  while (index < tokens.length) {
    const command = tokens[index] as string;
    index += 1;
    const lower = command.toLowerCase();
    const count = ARGUMENTS[lower];
    if (count === undefined) throw new Error(`unexpected path command ${command} in ${d.slice(0, 40)}…`);
    const values = tokens.slice(index, index + count).map(Number);
    index += count;
    const relative = command === lower;
    const at = (x: number, y: number): [number, number] => (relative ? [current[0] + x, current[1] + y] : [x, y]);
    const [a = 0, b = 0, c = 0, e = 0, f = 0, g = 0, h = 0] = values;
    const run = runs[runs.length - 1];
    if (command === 'M') {
      current = [a, b];
      subpathStart = current;
      runs.push({ start: current, points: [current] });
      continue;
    }
    if (run === undefined) throw new Error('path data must begin with an absolute M');
    if (lower === 'm') {
      current = at(a, b);
      subpathStart = current;
    } else if (lower === 'l') current = at(a, b);
    else if (lower === 'h') current = [relative ? current[0] + a : a, current[1]];
    else if (lower === 'v') current = [current[0], relative ? current[1] + a : a];
    else if (lower === 'c') {
      run.points.push(at(a, b), at(c, e));
      current = at(f, g);
    } else if (lower === 'a') current = at(g, h);
    else current = subpathStart;
    run.points.push(current);
  }
  return runs;
}

/** The smallest box holding every point of a run. */
export function runBox(run: PathRun): { left: number; top: number; right: number; bottom: number } {
  const xs = run.points.map(([x]) => x);
  const ys = run.points.map(([, y]) => y);
  return { left: Math.min(...xs), top: Math.min(...ys), right: Math.max(...xs), bottom: Math.max(...ys) };
}
