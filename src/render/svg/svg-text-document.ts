/**
 * A document that draws a chart straight into SVG text, for Node (the command line) where
 * there is no browser. It is a plain tree of elements with just the part of the DOM's
 * interface the chart drawer uses (create, attributes, append, replace, clone, compare, text)
 * and no parser, style or layout, so it loads in no time. Its text is what an XMLSerializer
 * writes for the same tree (DOM Parsing and Serialization, W3C, §3.2 "XML serialization"):
 * the root names its namespace, empty elements close with "/>", and text and attribute values
 * are escaped the same way, so `chartSvgString` gives the same bytes here as in the app.
 */

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

type Child = TextElement | TextNode;

/** Escape character data (text) as the XML serialisation does. */
function escapeText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/** Escape an attribute value as the XML serialisation does. */
function escapeAttribute(value: string): string {
  return escapeText(value).replace(/"/g, '&quot;').replace(/\t/g, '&#x9;').replace(/\n/g, '&#xA;').replace(/\r/g, '&#xD;');
}

class TextNode {
  parentNode: TextElement | null = null;
  constructor(readonly data: string) {}

  get textContent(): string {
    return this.data;
  }

  cloneNode(): TextNode {
    return new TextNode(this.data);
  }

  isEqualNode(other: unknown): boolean {
    return other instanceof TextNode && other.data === this.data;
  }

  serialise(): string {
    return escapeText(this.data);
  }
}

class TextElement {
  parentNode: TextElement | null = null;
  readonly #attributes = new Map<string, string>();
  #childNodes: Child[] = [];

  constructor(
    readonly ownerDocument: SvgTextDocument,
    readonly namespaceURI: string,
    readonly localName: string,
  ) {}

  get tagName(): string {
    return this.localName;
  }

  get childNodes(): readonly Child[] {
    return this.#childNodes;
  }

  get children(): readonly TextElement[] {
    return this.#childNodes.filter((child): child is TextElement => child instanceof TextElement);
  }

  setAttribute(name: string, value: unknown): void {
    this.#attributes.set(name, String(value));
  }

  getAttribute(name: string): string | null {
    return this.#attributes.get(name) ?? null;
  }

  hasAttribute(name: string): boolean {
    return this.#attributes.has(name);
  }

  removeAttribute(name: string): void {
    this.#attributes.delete(name);
  }

  appendChild<T extends Child>(child: T): T {
    const parent = child.parentNode;
    if (parent !== null) parent.#remove(child);
    child.parentNode = this;
    this.#childNodes.push(child);
    return child;
  }

  replaceChildren(...nodes: Child[]): void {
    for (const child of this.#childNodes) child.parentNode = null;
    this.#childNodes = [];
    for (const node of nodes) this.appendChild(node);
  }

  #remove(child: Child): void {
    this.#childNodes = this.#childNodes.filter((node) => node !== child);
    child.parentNode = null;
  }

  get textContent(): string {
    return this.#childNodes.map((child) => child.textContent).join('');
  }

  set textContent(value: string | null) {
    const text = value ?? '';
    this.replaceChildren(...(text === '' ? [] : [new TextNode(text)]));
  }

  cloneNode(deep = false): TextElement {
    const copy = new TextElement(this.ownerDocument, this.namespaceURI, this.localName);
    for (const [name, value] of this.#attributes) copy.setAttribute(name, value);
    if (deep) for (const child of this.#childNodes) copy.appendChild(child.cloneNode(true));
    return copy;
  }

  isEqualNode(other: unknown): boolean {
    if (!(other instanceof TextElement) || other.namespaceURI !== this.namespaceURI || other.localName !== this.localName)
      return false;
    if (other.#attributes.size !== this.#attributes.size) return false;
    for (const [name, value] of this.#attributes) if (other.#attributes.get(name) !== value) return false;
    const theirs = other.#childNodes;
    return (
      theirs.length === this.#childNodes.length && this.#childNodes.every((child, index) => child.isEqualNode(theirs[index]))
    );
  }

  /** The element as XML text; `inherited` is the namespace its parent's text declared. */
  serialise(inherited: string | null = null): string {
    const declaration = this.namespaceURI === inherited ? '' : ` xmlns="${escapeAttribute(this.namespaceURI)}"`;
    let markup = `<${this.localName}${declaration}`;
    for (const [name, value] of this.#attributes) markup += ` ${name}="${escapeAttribute(value)}"`;
    if (this.#childNodes.length === 0) return `${markup}/>`;
    const inner = this.#childNodes
      .map((child) => (child instanceof TextElement ? child.serialise(this.namespaceURI) : child.serialise()))
      .join('');
    return `${markup}>${inner}</${this.localName}>`;
  }

  get outerHTML(): string {
    return this.serialise();
  }
}

/** Writes a tree of this document as text, in the shape of the DOM's XMLSerializer. */
class TextSerializer {
  serializeToString(node: TextElement): string {
    return node.serialise();
  }
}

class SvgTextDocument {
  readonly documentElement = null;
  readonly defaultView = { XMLSerializer: TextSerializer };

  createElementNS(namespace: string | null, name: string): TextElement {
    return new TextElement(this, namespace ?? SVG_NAMESPACE, name);
  }

  createTextNode(data: string): TextNode {
    return new TextNode(data);
  }
}

/**
 * A fresh document for `chartSvgString` or `drawChart`. It stands in for a DOM `Document`
 * only as far as the chart drawer goes: draw a chart in it, then read the text.
 *
 * @example chartSvgString(model, svgTextDocument()).startsWith('<svg xmlns="http://www.w3.org/2000/svg"') // => true
 */
export function svgTextDocument(): Document {
  return new SvgTextDocument() as unknown as Document;
}
