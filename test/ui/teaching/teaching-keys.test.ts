import { describe, expect, it } from 'vitest';
import { teachingKeyAction } from '../../../src/ui/teaching/teaching-keys.ts';

// Key names are the UI Events KeyboardEvent `key` values (W3C, UI Events KeyboardEvent key Values).
// Presentation clickers send Page Down / Page Up (some send the arrow keys): common practice.
describe('teachingKeyAction', () => {
  it.each(['ArrowRight', 'ArrowDown', 'PageDown', ' '])('steps forward on %j', (key) => {
    expect(teachingKeyAction({ key })).toBe('next');
  });

  it.each(['ArrowLeft', 'ArrowUp', 'PageUp'])('steps back on %j', (key) => {
    expect(teachingKeyAction({ key })).toBe('previous');
  });

  it('steps back on Shift+Space, as slide software does', () => {
    expect(teachingKeyAction({ key: ' ', shiftKey: true })).toBe('previous');
  });

  it('goes to the first slide on Home, the last on End, and leaves on Escape', () => {
    expect(teachingKeyAction({ key: 'Home' })).toBe('first');
    expect(teachingKeyAction({ key: 'End' })).toBe('last');
    expect(teachingKeyAction({ key: 'Escape' })).toBe('leave');
  });

  it('leaves Space to a focused button, which Space presses', () => {
    expect(teachingKeyAction({ key: ' ', onControl: true })).toBeNull();
    expect(teachingKeyAction({ key: 'ArrowRight', onControl: true })).toBe('next');
  });

  it('ignores keys held with Ctrl, Alt or Meta, so browser and app shortcuts keep working', () => {
    expect(teachingKeyAction({ key: 'ArrowRight', ctrlKey: true })).toBeNull();
    expect(teachingKeyAction({ key: 'ArrowLeft', altKey: true })).toBeNull();
    expect(teachingKeyAction({ key: 'Home', metaKey: true })).toBeNull();
  });

  it('has no action for other keys', () => {
    for (const key of ['Enter', 'Tab', 'a', 'z', 'F5', 'Backspace']) expect(teachingKeyAction({ key })).toBeNull();
  });
});
