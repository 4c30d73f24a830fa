/** A path context that records its calls, for glyph tests. */
import type { PathContext } from '../../../src/render/glyphs/path-context.ts';

export interface RecordedCall {
  readonly name: keyof PathContext;
  readonly values: readonly number[];
}

export function recordingContext(): PathContext & { readonly calls: RecordedCall[] } {
  const calls: RecordedCall[] = [];
  const record =
    (name: keyof PathContext) =>
    (...values: (number | boolean | undefined)[]) => {
      calls.push({ name, values: values.filter((value): value is number => typeof value === 'number') });
    };
  return {
    calls,
    moveTo: record('moveTo'),
    lineTo: record('lineTo'),
    arc: record('arc'),
    bezierCurveTo: record('bezierCurveTo'),
    closePath: record('closePath'),
  };
}
