import { describe, expect, test } from 'vitest';
import { overlapArea, toastBox, toastPlace } from '../../../src/ui/state/toast-place.ts';
import type { ScreenBox } from '../../../src/ui/state/toast-place.ts';

// A message must never hide the element that has focus (WCAG 2.2, success criterion 2.4.11
// Focus Not Obscured (Minimum)); the layout is a 1440 × 900 window with a 64 px header.
const layout = { viewportHeight: 900, height: 80, left: 336, right: 1104, headerBottom: 64, gap: 24 };
const box = (top: number, bottom: number, left = 400, right = 800): ScreenBox => ({ top, bottom, left, right });

describe('where the app’s message sits', () => {
  test('at the foot: 24 px above the window’s edge; at the top: 24 px below the header', () => {
    expect(toastBox('foot', layout)).toEqual({ top: 796, bottom: 876, left: 336, right: 1104 });
    expect(toastBox('top', layout)).toEqual({ top: 88, bottom: 168, left: 336, right: 1104 });
  });

  test('stays at the foot when nothing is focused or the focused field is elsewhere', () => {
    expect(toastPlace(null, layout)).toBe('foot');
    expect(toastPlace(box(300, 340), layout)).toBe('foot');
    // Beside the message, not under it.
    expect(toastPlace(box(800, 840, 1110, 1300), layout)).toBe('foot');
  });

  test('moves to the top when the focused field is under the foot place', () => {
    expect(toastPlace(box(780, 820), layout)).toBe('top');
    expect(toastPlace(box(870, 910), layout)).toBe('top');
  });

  test('a focused element taller than the window gets the place it overlaps less', () => {
    expect(toastPlace(box(120, 1200), layout)).toBe('top');
    expect(toastPlace(box(0, 880), layout)).toBe('foot');
  });

  test('boxes that only touch share no area', () => {
    expect(overlapArea(box(0, 10), box(10, 20))).toBe(0);
    expect(overlapArea(box(0, 10, 0, 10), box(5, 15, 5, 15))).toBe(25);
  });
});
