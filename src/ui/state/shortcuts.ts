/**
 * The keyboard shortcuts of the editor: Ctrl+Z undo, Ctrl+Shift+Z or Ctrl+Y redo,
 * Ctrl+S save, Ctrl+O open (Cmd in place of Ctrl on a Mac).
 */

export type ShortcutAction = 'undo' | 'redo' | 'save' | 'open';

/** The parts of a key event a shortcut depends on. */
export interface KeyPress {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

/** The action a key press asks for, or null. */
export function shortcutFor(press: KeyPress): ShortcutAction | null {
  if (!(press.ctrlKey || press.metaKey) || press.altKey) return null;
  const key = press.key.toLowerCase();
  if (key === 'z') return press.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !press.shiftKey) return 'redo';
  if (key === 's' && !press.shiftKey) return 'save';
  if (key === 'o' && !press.shiftKey) return 'open';
  return null;
}
