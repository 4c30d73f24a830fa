/**
 * Writing an attribute only when its value changes. A browser treats every write as a
 * change: a `viewBox` or `transform` written again with the same value still makes it
 * lay out everything under that element, and a live update would pay for that.
 */

/** Set `name` to `value` on `element` unless it already has exactly that value. */
export function setChangedAttribute(element: Element, name: string, value: string): void {
  if (element.getAttribute(name) !== value) element.setAttribute(name, value);
}
