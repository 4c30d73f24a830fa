import { describe, expect, it } from 'vitest';
import { lookOf } from '../../../src/core/direction.ts';
import { compactPersonGlyph } from '../../../src/render/glyphs/compact-person.ts';
import { glyphPath, placeGlyphPath } from '../../../src/render/glyphs/svg-path-context.ts';
import { iconArrayLayout } from '../../../src/render/icon-array-layout.ts';
import { peopleShapes } from '../../../src/render/svg/people-shapes.ts';
import { pathRuns } from './path-subpaths.ts';

const LOOKS = ['event', 'helped', 'harmed', 'free'] as const;
// Invented counts per 1000: 125 with the event, 31 helped, 844 without it.
const layout = iconArrayLayout(1000, { denominator: 1000, event: 125, prevented: 31, caused: 0, free: 844 }, { cellSize: 7 });
const path = glyphPath(compactPersonGlyph, layout.geometry.iconSize);
const looks = layout.people.map((person) => lookOf(person.group, false));

describe('peopleShapes', () => {
  it('joins every person of a group into one shape, in group order, one run per person at their place', () => {
    const shapes = peopleShapes(layout, path, looks, LOOKS);
    expect(shapes.map((shape) => [shape.group, shape.look, shape.count])).toEqual([
      ['event', 'event', 125],
      ['prevented', 'helped', 31],
      ['free', 'free', 844],
    ]);
    for (const shape of shapes) {
      const members = layout.people.filter((person) => person.group === shape.group);
      const runs = pathRuns(shape.d);
      expect(runs).toHaveLength(members.length);
      // Each run starts where the glyph's first point falls in that person's box (two decimals).
      runs.forEach((run, index) => {
        const person = members[index]!;
        expect(run.start[0]).toBeCloseTo(person.x + path.startX, 2);
        expect(run.start[1]).toBeCloseTo(person.y + path.startY, 2);
      });
      expect(shape.d).toBe(members.map((person) => placeGlyphPath(path, person.x, person.y)).join(''));
    }
  });

  it('keeps a group drawn in two looks as two shapes, in the order of the looks, and builds only the groups asked for', () => {
    const mixed = looks.map((look, index) => (index < 10 ? 'harmed' : look));
    expect(peopleShapes(layout, path, mixed, LOOKS).map((shape) => [shape.group, shape.look, shape.count])).toEqual([
      ['event', 'event', 115],
      ['event', 'harmed', 10],
      ['prevented', 'helped', 31],
      ['free', 'free', 844],
    ]);
    expect(peopleShapes(layout, path, looks, LOOKS, new Set(['prevented'])).map((shape) => shape.group)).toEqual(['prevented']);
  });

  it('refuses a person without a look it can draw', () => {
    expect(() => peopleShapes(layout, path, looks.slice(1), LOOKS)).toThrow(/person 999 has no look/);
  });
});
