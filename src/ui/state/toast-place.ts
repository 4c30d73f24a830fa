/**
 * Where the app's message sits so that it never covers what has focus: at the foot of the
 * window, or, when the focused element is there, at the top just below the header. A focused
 * element that reaches both places (taller than the window) gets the place it overlaps less.
 */

/** A box on screen, in CSS pixels from the top left of the viewport. */
export interface ScreenBox {
  readonly top: number;
  readonly bottom: number;
  readonly left: number;
  readonly right: number;
}

export type ToastPlace = 'foot' | 'top';

export interface ToastLayout {
  readonly viewportHeight: number;
  /** The height of the message itself. */
  readonly height: number;
  /** The left and right edges of the message. */
  readonly left: number;
  readonly right: number;
  /** Where the sticky header ends. */
  readonly headerBottom: number;
  /** The gap between the message and the window's edge or the header. */
  readonly gap: number;
}

/** The box the message takes in one place. */
export function toastBox(place: ToastPlace, layout: ToastLayout): ScreenBox {
  const { viewportHeight, height, left, right, headerBottom, gap } = layout;
  const top = place === 'foot' ? viewportHeight - gap - height : headerBottom + gap;
  return { top, bottom: top + height, left, right };
}

/** The area two boxes share (0 when they do not meet). */
export function overlapArea(first: ScreenBox, second: ScreenBox): number {
  const width = Math.min(first.right, second.right) - Math.max(first.left, second.left);
  const height = Math.min(first.bottom, second.bottom) - Math.max(first.top, second.top);
  return width > 0 && height > 0 ? width * height : 0;
}

/** The place for the message given the focused element's box (null: nothing focused on the page). */
export function toastPlace(focused: ScreenBox | null, layout: ToastLayout): ToastPlace {
  if (focused === null) return 'foot';
  const atFoot = overlapArea(focused, toastBox('foot', layout));
  if (atFoot === 0) return 'foot';
  return overlapArea(focused, toastBox('top', layout)) < atFoot ? 'top' : 'foot';
}
