import { describe, expect, test } from 'vitest';
import { shortcutFor } from '../../../src/ui/state/shortcuts.ts';

const press = (
  key: string,
  modifiers: Partial<{ ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }> = {},
) => ({
  key,
  ctrlKey: false,
  metaKey: false,
  shiftKey: false,
  altKey: false,
  ...modifiers,
});

describe('shortcutFor', () => {
  test.each([
    [press('z', { ctrlKey: true }), 'undo'],
    [press('Z', { ctrlKey: true, shiftKey: true }), 'redo'],
    [press('y', { ctrlKey: true }), 'redo'],
    [press('z', { metaKey: true }), 'undo'],
    [press('s', { ctrlKey: true }), 'save'],
    [press('o', { ctrlKey: true }), 'open'],
  ] as const)('maps %o to %s', (event, action) => {
    expect(shortcutFor(event)).toBe(action);
  });

  test('ignores keys without Ctrl or Cmd, and with Alt', () => {
    expect(shortcutFor(press('z'))).toBeNull();
    expect(shortcutFor(press('z', { ctrlKey: true, altKey: true }))).toBeNull();
    expect(shortcutFor(press('a', { ctrlKey: true }))).toBeNull();
  });
});
