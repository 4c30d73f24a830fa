import { describe, expect, it } from 'vitest';
import { slideFileName } from '../../../src/ui/teaching/slide-export.ts';

// Slide file names follow the app's plain file stems (lower case, hyphens, common practice).

describe('a slide file', () => {
  it('names the file after the presentation, the slide number and the step', () => {
    expect(
      slideFileName(
        'Taking a daily tablet to lower the chance of a heart attack (illustrative example)',
        3,
        'with-option',
        'png',
      ),
    ).toBe('taking-a-daily-tablet-to-lower-03-with-option.png');
    expect(slideFileName('¿?', 12, 'framing', 'svg')).toBe('teaching-12-framing.svg');
  });
});
