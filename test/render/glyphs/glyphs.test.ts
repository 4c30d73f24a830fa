import { describe, expect, it } from 'vitest';
import { compactPersonGlyph } from '../../../src/render/glyphs/compact-person.ts';
import { glyphFor } from '../../../src/render/glyphs/glyph-for.ts';
import { personGlyph } from '../../../src/render/glyphs/person.ts';
import { recordingContext } from './recording-context.ts';

describe.each([
  ['personGlyph', personGlyph],
  ['compactPersonGlyph', compactPersonGlyph],
])('%s', (_, glyph) => {
  it('draws a round head (a full-turn arc) and a closed body', () => {
    const context = recordingContext();
    glyph.draw(context, 10);
    const arcs = context.calls.filter((call) => call.name === 'arc');
    expect(arcs).toHaveLength(1);
    const [, , radius, start, end] = arcs[0]!.values;
    expect(radius).toBeGreaterThan(1);
    expect(end! - start!).toBeCloseTo(Math.PI * 2, 12);
    expect(context.calls.filter((call) => call.name === 'closePath')).toHaveLength(2);
    expect(context.calls.filter((call) => call.name === 'moveTo')).toHaveLength(2);
  });

  it('stays inside its box', () => {
    const context = recordingContext();
    glyph.draw(context, 8);
    for (const call of context.calls) {
      if (call.name === 'arc') {
        const [x, y, radius] = call.values as [number, number, number];
        expect(x - radius).toBeGreaterThanOrEqual(0);
        expect(y - radius).toBeGreaterThanOrEqual(0);
        expect(x + radius).toBeLessThanOrEqual(8);
      } else {
        for (const value of call.values) {
          expect(value).toBeGreaterThanOrEqual(0);
          expect(value).toBeLessThanOrEqual(8 + 1e-9);
        }
      }
    }
  });

  it('puts the head above the body, with a gap between them', () => {
    const context = recordingContext();
    glyph.draw(context, 1);
    const [, headY, radius] = context.calls.find((call) => call.name === 'arc')!.values as [number, number, number];
    const bodyTop = Math.min(
      ...context.calls
        .filter((call) => call.name === 'bezierCurveTo' || call.name === 'lineTo')
        .flatMap((call) => call.values.filter((_, index) => index % 2 === 1)),
    );
    expect(bodyTop).toBeGreaterThan(headY + radius);
  });

  it('scales with the size', () => {
    const small = recordingContext();
    const large = recordingContext();
    glyph.draw(small, 1);
    glyph.draw(large, 3);
    small.calls.forEach((call, index) => {
      const other = large.calls[index]!;
      expect(other.name).toBe(call.name);
      call.values.forEach((value, position) => {
        // Angles (arc arguments 4 and 5) do not scale.
        const expected = call.name === 'arc' && position >= 3 ? value : value * 3;
        expect(other.values[position]).toBeCloseTo(expected, 12);
      });
    });
  });
});

describe('glyphFor', () => {
  it('names the compact figure for 1000 and the full figure otherwise', () => {
    expect(glyphFor('compact-person')).toBe(compactPersonGlyph);
    expect(glyphFor('person')).toBe(personGlyph);
  });
});
