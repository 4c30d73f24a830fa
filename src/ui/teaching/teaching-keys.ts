/**
 * Keys of the teaching view. Presentation clickers send Page Down / Page Up (some
 * send the arrow keys), so those step like the arrows; Space steps forward and
 * Shift+Space back, as in slide software (common practice). Keys held with Ctrl,
 * Alt or Meta are left to the browser and the app.
 */

export type TeachingAction = 'next' | 'previous' | 'first' | 'last' | 'leave';

/** The parts of a key press that decide its action. */
export interface KeyPress {
  readonly key: string;
  readonly shiftKey?: boolean;
  readonly ctrlKey?: boolean;
  readonly altKey?: boolean;
  readonly metaKey?: boolean;
  /** True when the key was pressed on a button, link or field, which Space and Enter operate. */
  readonly onControl?: boolean;
}

const FORWARD = new Set(['ArrowRight', 'ArrowDown', 'PageDown']);
const BACK = new Set(['ArrowLeft', 'ArrowUp', 'PageUp']);

/** The action of a key press in the teaching view, or null when the key is not the view's. */
export function teachingKeyAction(press: KeyPress): TeachingAction | null {
  if (press.ctrlKey === true || press.altKey === true || press.metaKey === true) return null;
  if (FORWARD.has(press.key)) return 'next';
  if (BACK.has(press.key)) return 'previous';
  if (press.key === ' ') {
    if (press.onControl === true) return null;
    return press.shiftKey === true ? 'previous' : 'next';
  }
  if (press.key === 'Home') return 'first';
  if (press.key === 'End') return 'last';
  if (press.key === 'Escape') return 'leave';
  return null;
}
