/**
 * Building SVG one element at a time, chained: `select(svg).append('g').attr('class', 'x')`.
 * The charts once took these few steps from d3-selection; this module takes them with the
 * same DOM calls (a child is made in its parent's namespace, an attribute given null is
 * removed), so any document that d3 could drive, such as `svg-text-document.ts`, still works,
 * and the start-up script carries no library for it.
 */

/** What an attribute can be set to: null (or undefined) removes it, anything else is written as text. */
export type AttributeValue = string | number | boolean | null | undefined;

/** One element to chain appends and attributes on. */
export class SvgSelection<Node extends Element> {
  readonly #node: Node;

  constructor(node: Node) {
    this.#node = node;
  }

  /** The element itself. */
  node(): Node {
    return this.#node;
  }

  /** Append a new child named `name`, in this element's namespace, and select it. */
  append<Name extends keyof SVGElementTagNameMap>(name: Name): SvgSelection<SVGElementTagNameMap[Name]> {
    const child = this.#node.ownerDocument.createElementNS(this.#node.namespaceURI, name) as SVGElementTagNameMap[Name];
    this.#node.appendChild(child);
    return new SvgSelection(child);
  }

  /** Set the attribute `name` to `value`, or remove it when `value` is null or undefined. */
  attr(name: string, value: AttributeValue): this {
    if (value === null || value === undefined) this.#node.removeAttribute(name);
    else this.#node.setAttribute(name, String(value));
    return this;
  }

  /** Replace the element's content with the text `value`. */
  text(value: string): this {
    this.#node.textContent = value;
    return this;
  }

  /** The element's children that match the CSS `selector`, in document order. */
  childrenMatching<Child extends Element>(selector: string): Child[] {
    return [...this.#node.children].filter((child): child is Child => child.matches(selector));
  }
}

/** Select `node` to build on. */
export function select<Node extends Element>(node: Node): SvgSelection<Node> {
  return new SvgSelection(node);
}
