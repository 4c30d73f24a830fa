import type { GlyphName } from '../icon-array-layout.ts';
import { compactPersonGlyph } from './compact-person.ts';
import type { Glyph } from './path-context.ts';
import { personGlyph } from './person.ts';

/** The glyph a layout names. */
export function glyphFor(name: GlyphName): Glyph {
  return name === 'compact-person' ? compactPersonGlyph : personGlyph;
}
