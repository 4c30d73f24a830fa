import type { Glyph } from './path-context.ts';

/**
 * A chunkier person for arrays of 1000, where icons are a millimetre or two wide:
 * a larger head and a plain dome-topped body, with few curves so it prints cleanly.
 */
export const compactPersonGlyph: Glyph = {
  draw(context, size) {
    const at = (value: number) => value * size;
    context.moveTo(at(0.71), at(0.21));
    context.arc(at(0.5), at(0.21), at(0.21), 0, Math.PI * 2);
    context.closePath();
    context.moveTo(at(0.1), at(1));
    context.lineTo(at(0.1), at(0.74));
    context.bezierCurveTo(at(0.1), at(0.58), at(0.28), at(0.5), at(0.5), at(0.5));
    context.bezierCurveTo(at(0.72), at(0.5), at(0.9), at(0.58), at(0.9), at(0.74));
    context.lineTo(at(0.9), at(1));
    context.closePath();
  },
};
