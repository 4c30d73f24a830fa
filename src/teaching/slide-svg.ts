/**
 * A slide as a standalone 1920 × 1080 SVG, for slide decks: the same heading,
 * people, call-outs, cards, lines and evidence as on screen, placed by the same
 * proportions (one unit is 1 px of a 1280 × 720 screen) and wrapped with the DejaVu
 * Sans metrics the charts use.
 */
import { svgNumber } from '../render/svg/svg-number.ts';
import { measureDejaVuSans, wrapText } from '../render/text/measure-text.ts';
import { drawPeopleGroup, drawSwatch, drawingSize } from './draw-slide-people.ts';
import { slideColours } from './slide-colours.ts';
import type { Callout, FramingCard, PeoplePanel, Slide, SlideLine } from './slide-model.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';
export const SLIDE_WIDTH = 1920;
export const SLIDE_HEIGHT = 1080;
/** Pixels of the exported slide per unit of the 1280 × 720 design. */
const U = SLIDE_WIDTH / 1280;
/** Where the footer rule sits; everything of the slide stays above it. */
export const FOOTER_TOP = SLIDE_HEIGHT - 58 * U;
const LEFT = 32 * U;
const GAP = 28 * U;
const FONT = "'DejaVu Sans', Verdana, Arial, sans-serif";
const LINE = 1.3;

const {
  ink: INK,
  muted: MUTED,
  accent: ACCENT,
  notice: NOTICE,
  noticeSoft: NOTICE_SOFT,
  line: LINE_COLOUR,
  surface: SURFACE,
} = slideColours;

interface Writer {
  readonly document: Document;
  readonly root: SVGSVGElement;
  readonly defs: SVGDefsElement;
  readonly prefix: string;
  swatches: number;
  /** The lowest point drawn so far. */
  bottom: number;
}

interface TextSettings {
  readonly bold?: boolean;
  readonly colour?: string;
  /** Never wrap (a short figure such as "4 in 100"). */
  readonly oneLine?: boolean;
}

function element<K extends keyof SVGElementTagNameMap>(
  writer: Writer,
  name: K,
  attributes: Record<string, string | number>,
): SVGElementTagNameMap[K] {
  const made = writer.document.createElementNS(SVG_NAMESPACE, name);
  for (const [key, value] of Object.entries(attributes))
    made.setAttribute(key, typeof value === 'number' ? svgNumber(value) : value);
  return made;
}

/** Write wrapped text from `top`; returns the bottom of the block. */
function text(
  writer: Writer,
  parent: Element,
  content: string,
  x: number,
  top: number,
  width: number,
  size: number,
  settings: TextSettings = {},
): number {
  const bold = settings.bold === true;
  const lines = settings.oneLine === true ? [content] : wrapText(content, width, size, bold, measureDejaVuSans);
  const block = element(writer, 'text', {
    'font-size': size,
    fill: settings.colour ?? INK,
    ...(bold ? { 'font-weight': 'bold' } : {}),
  });
  lines.forEach((line, index) => {
    const span = element(writer, 'tspan', { x, y: top + size * 0.8 + index * size * LINE });
    span.textContent = line;
    block.appendChild(span);
  });
  parent.appendChild(block);
  const bottom = top + lines.length * size * LINE;
  writer.bottom = Math.max(writer.bottom, bottom);
  return bottom;
}

/** A legend figure of a look, as a nested `<svg>` at (x, y). */
function swatch(writer: Writer, look: Callout['look'], x: number, y: number, size: number): void {
  if (look === null) return;
  const nested = element(writer, 'svg', { x, y, width: size, height: size });
  drawSwatch(nested, look, `${writer.prefix}-swatch-${writer.swatches}`);
  writer.swatches += 1;
  writer.root.appendChild(nested);
}

/** The width a panel's people are drawn at, as on screen. */
function panelWidth(slide: Slide, panel: PeoplePanel): number {
  if (panel.layout.denominator === 100) return 410 * U;
  if (slide.layout === 'pair') return 580 * U;
  if (slide.layout === 'wide-pair') return 700 * U;
  if (slide.layout === 'cards') return 440 * U;
  return 640 * U;
}

/** A panel: title, people, counts. Returns its bottom. */
function panel(writer: Writer, slide: Slide, found: PeoplePanel, x: number, top: number, titleHeight: number): number {
  const width = panelWidth(slide, found);
  text(writer, writer.root, found.title, x, top, width, 28 * U, { bold: true });
  let y = top + titleHeight + 8 * U;
  const size = drawingSize(found.layout);
  const scale = width / size.width;
  const group = element(writer, 'g', { transform: `translate(${svgNumber(x)},${svgNumber(y)}) scale(${svgNumber(scale, 5)})` });
  const title = element(writer, 'title', {});
  title.textContent = found.description;
  group.appendChild(title);
  drawPeopleGroup(group, writer.defs, found.layout, found.looks, `${writer.prefix}-${found.id}`);
  writer.root.appendChild(group);
  y += size.height * scale + 16 * U;
  let chipX = x;
  for (const chip of found.chips) {
    swatch(writer, chip.look, chipX, y, 36 * U);
    const count = String(chip.count);
    text(writer, writer.root, count, chipX + 44 * U, y + 2 * U, width, 30 * U, { bold: true, oneLine: true });
    chipX += 44 * U + measureDejaVuSans(count, 30 * U, true) + 24 * U;
  }
  return y + 40 * U;
}

function callout(writer: Writer, found: Callout, x: number, top: number, width: number): number {
  swatch(writer, found.look, x, top, 48 * U);
  const indent = found.look === null ? 0 : 62 * U;
  const valueBottom = text(writer, writer.root, found.value, x + indent, top, width - indent, 48 * U, {
    bold: true,
    oneLine: true,
  });
  return text(writer, writer.root, found.text, x + indent, valueBottom, width - indent, 28 * U);
}

/**
 * A card as on screen: its label in a column of its own, the figure and its working beside it
 * (under the figure, or after it on the same line when `oneRow`).
 */
function card(writer: Writer, found: FramingCard, x: number, top: number, width: number, oneRow = false): number {
  const group = element(writer, 'g', {});
  writer.root.appendChild(group);
  const labelX = x + 28 * U;
  const bodyX = labelX + 166 * U;
  const bodyWidth = x + width - 18 * U - bodyX;
  text(writer, group, found.label, labelX, top + 18 * U, 150 * U, 28 * U, { bold: true, colour: MUTED });
  let y = text(writer, group, found.value, bodyX, top + 8 * U, bodyWidth, 40 * U, {
    bold: true,
    colour: ACCENT,
    oneLine: oneRow,
  });
  if (found.detail !== null && oneRow) {
    const after = bodyX + measureDejaVuSans(found.value, 40 * U, true) + 24 * U;
    text(writer, group, found.detail, after, top + 18 * U, x + width - 18 * U - after, 28 * U, { oneLine: true });
  } else if (found.detail !== null) {
    y = text(writer, group, found.detail, bodyX, y, bodyWidth, 28 * U);
  }
  const bottom = y + 8 * U;
  group.insertBefore(
    element(writer, 'rect', {
      x,
      y: top,
      width,
      height: bottom - top,
      rx: 8 * U,
      fill: SURFACE,
      stroke: LINE_COLOUR,
      'stroke-width': 2 * U,
    }),
    group.firstChild,
  );
  group.insertBefore(
    element(writer, 'rect', { x, y: top, width: 10 * U, height: bottom - top, fill: ACCENT }),
    group.childNodes[1] ?? null,
  );
  return bottom;
}

function line(writer: Writer, found: SlideLine, x: number, top: number, width: number): number {
  if (found.tone === 'subheading') return text(writer, writer.root, found.text, x, top + 4 * U, width, 32 * U, { bold: true });
  swatch(writer, found.look, x, top, 36 * U);
  const indent = found.look === null ? 0 : 48 * U;
  return text(writer, writer.root, found.text, x + indent, top, width - indent, 28 * U, {
    colour: found.tone === 'note' ? MUTED : found.tone === 'notice' ? NOTICE : INK,
    bold: found.tone === 'notice',
  });
}

function evidence(writer: Writer, slide: Slide, x: number, top: number, width: number): number {
  if (slide.evidence === null) return top;
  const group = element(writer, 'g', {});
  writer.root.appendChild(group);
  let y = text(writer, group, slide.evidence.finding, x + 28 * U, top + 12 * U, width - 46 * U, 28 * U);
  y =
    text(writer, group, slide.evidence.source, x + 28 * U, y + 6 * U, width - 46 * U, 28 * U, { bold: true, colour: NOTICE }) +
    12 * U;
  writer.bottom = Math.max(writer.bottom, y);
  group.insertBefore(element(writer, 'rect', { x, y: top, width, height: y - top, fill: NOTICE_SOFT }), group.firstChild);
  group.insertBefore(
    element(writer, 'rect', { x, y: top, width: 10 * U, height: y - top, fill: NOTICE }),
    group.childNodes[1] ?? null,
  );
  return y;
}

/** The side column: call-outs, cards, lines and evidence, one under another. */
function side(writer: Writer, slide: Slide, x: number, top: number, width: number): void {
  let y = top;
  for (const found of slide.callouts) y = callout(writer, found, x, y, width) + 16 * U;
  for (const found of slide.cards) y = card(writer, found, x, y, width) + 14 * U;
  for (const found of slide.lines) y = line(writer, found, x, y, width) + 14 * U;
  evidence(writer, slide, x, y, width);
}

/** The height of the tallest panel title, so that side-by-side grids line up as on screen. */
function titleHeight(slide: Slide): number {
  const lines = slide.panels.map(
    (found) => wrapText(found.title, panelWidth(slide, found), 28 * U, true, measureDejaVuSans).length,
  );
  return Math.max(1, ...lines) * 28 * U * LINE;
}

/** Draw `slide` in a detached 1920 × 1080 `<svg>` of `document`, with `footer` at its foot. */
export function slideSvgElement(slide: Slide, document: Document, footer: string, illustrative: string): SVGSVGElement {
  const root = document.createElementNS(SVG_NAMESPACE, 'svg');
  const attributes = {
    viewBox: `0 0 ${SLIDE_WIDTH} ${SLIDE_HEIGHT}`,
    width: SLIDE_WIDTH,
    height: SLIDE_HEIGHT,
    'font-family': FONT,
    role: 'img',
  };
  for (const [key, value] of Object.entries(attributes)) root.setAttribute(key, String(value));
  const defs = document.createElementNS(SVG_NAMESPACE, 'defs');
  root.appendChild(defs);
  const writer: Writer = { document, root, defs, prefix: `slide-${slide.kind}`, swatches: 0, bottom: 0 };
  const title = element(writer, 'title', {});
  title.textContent = slide.heading;
  root.appendChild(title);
  root.appendChild(element(writer, 'rect', { width: SLIDE_WIDTH, height: SLIDE_HEIGHT, fill: SURFACE }));

  const inner = SLIDE_WIDTH - 2 * LEFT;
  const top = text(writer, root, slide.heading, LEFT, 16 * U, inner, 44 * U, { bold: true }) + 14 * U;
  const titles = titleHeight(slide);
  const panels = slide.panels;
  let x = LEFT;
  const thousand = panels.some((found) => found.layout.denominator === 1000);
  if (slide.layout === 'cards' && thousand && panels[0] !== undefined) {
    let y = top;
    for (const found of slide.cards) y = card(writer, found, LEFT, y, inner, true) + 14 * U;
    panel(writer, slide, panels[0], LEFT, y, titles);
    x += panelWidth(slide, panels[0]) + GAP;
    side(writer, { ...slide, cards: [] }, x, y, SLIDE_WIDTH - LEFT - x);
  } else if (slide.layout === 'cards' && panels[0] !== undefined) {
    panel(writer, slide, panels[0], LEFT, top, titles);
    x += panelWidth(slide, panels[0]) + GAP;
    side(writer, slide, x, top, SLIDE_WIDTH - LEFT - x);
  } else if (slide.layout === 'wide-pair' && panels.length === 2) {
    const [small, large] = panels as [PeoplePanel, PeoplePanel];
    panel(writer, slide, small, x, top, titles);
    x += panelWidth(slide, small) + GAP;
    const under = panel(writer, slide, large, x, top, titles) + 12 * U;
    side(writer, slide, x, under, SLIDE_WIDTH - LEFT - x);
  } else {
    let bottom = top;
    for (const found of panels) {
      bottom = Math.max(bottom, panel(writer, slide, found, x, top, titles));
      x += panelWidth(slide, found) + GAP;
    }
    const below = slide.layout === 'words' || (slide.layout === 'pair' && thousand);
    if (below) side(writer, slide, LEFT, panels.length === 0 ? top : bottom + 8 * U, inner);
    else side(writer, slide, x, top, SLIDE_WIDTH - LEFT - x);
  }
  root.setAttribute('data-content-bottom', svgNumber(writer.bottom));

  root.appendChild(element(writer, 'rect', { x: LEFT, y: FOOTER_TOP, width: inner, height: 2 * U, fill: LINE_COLOUR }));
  const footerTop = FOOTER_TOP + 12 * U;
  const footerText = element(writer, 'text', { 'font-size': 24 * U, fill: MUTED, x: LEFT, y: footerTop + 24 * U * 0.8 });
  footerText.textContent = footer;
  root.appendChild(footerText);
  if (slide.illustrative) {
    const mark = element(writer, 'text', {
      'font-size': 24 * U,
      'font-weight': 'bold',
      fill: NOTICE,
      x: SLIDE_WIDTH - LEFT,
      y: footerTop + 24 * U * 0.8,
      'text-anchor': 'end',
    });
    mark.textContent = illustrative;
    root.appendChild(mark);
  }
  return root;
}

/** The slide as standalone SVG file text. */
export function slideSvgText(slide: Slide, document: Document, footer: string, illustrative: string): string {
  const svg = slideSvgElement(slide, document, footer, illustrative);
  const Serializer = document.defaultView?.XMLSerializer ?? globalThis.XMLSerializer;
  const body =
    Serializer === undefined
      ? svg.outerHTML.replace('<svg', `<svg xmlns="${SVG_NAMESPACE}"`)
      : new Serializer().serializeToString(svg);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${body}\n`;
}
