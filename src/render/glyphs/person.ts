import type { Glyph } from './path-context.ts';

/**
 * A gender-neutral person: a round head over rounded shoulders, no face. Drawn in
 * a unit box (x, y from 0 to 1) scaled to `size`.
 */
export const personGlyph: Glyph = {
  draw(context, size) {
    const at = (value: number) => value * size;
    context.moveTo(at(0.675), at(0.2));
    context.arc(at(0.5), at(0.2), at(0.175), 0, Math.PI * 2);
    context.closePath();
    context.moveTo(at(0.15), at(0.68));
    context.bezierCurveTo(at(0.15), at(0.52), at(0.29), at(0.43), at(0.44), at(0.43));
    context.lineTo(at(0.56), at(0.43));
    context.bezierCurveTo(at(0.71), at(0.43), at(0.85), at(0.52), at(0.85), at(0.68));
    context.lineTo(at(0.85), at(0.92));
    context.bezierCurveTo(at(0.85), at(0.95), at(0.83), at(0.97), at(0.8), at(0.97));
    context.lineTo(at(0.2), at(0.97));
    context.bezierCurveTo(at(0.17), at(0.97), at(0.15), at(0.95), at(0.15), at(0.92));
    context.closePath();
  },
};
