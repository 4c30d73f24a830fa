/**
 * A slide as a standalone 1920 × 1080 SVG, for slide decks: the same heading,
 * people, call-outs, cards, lines and evidence as on screen, placed by the same
 * proportions (one unit is 1 px of a 1280 × 720 screen) and wrapped with the DejaVu
 * Sans metrics the charts use.
 */
import { measureDejaVuSans, wrapText } from '../../render/text/measure-text.ts';
import { svgNumber } from '../../render/svg/svg-number.ts';
import { drawPeopleGroup, drawSwatch, drawingSize } from './draw-slide-people.ts';
import type { Callout, FramingCard, PeoplePanel, Slide, SlideLine } from './slide-model.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';
export const SLIDE_WIDTH = 1920;
export const SLIDE_HEIGHT = 1080;
/** Pixels of the exported slide per unit of the 1280 × 720 design. */
const U = SLIDE_WIDTH / 1280;
const FONT = "'DejaVu Sans', Verdana, Arial, sans-serif";
const LINE = 1.3;

const INK = '#111820';
const MUTED = '#3d4853';
const ACCENT = '#0b4f8a';
const NOTICE = '#5c3f00';
const NOTICE_SOFT = '#fff4d6';
const LINE_COLOUR = '#aeb8c2';

interface Writer {
  readonly document: Document;
  readonly root: SVGSVGElement;
  readonly defs: SVGDefsElement;
  readonly prefix: string;
  swatches: number;
}

function element<K extends keyof SVGElementTagNameMap>(writer: Writer, name: K, attributes: Record<string, string | number>): SVGElementTagNameMap[K] {
  const made = writer.document.createElementNS(SVG_NAMESPACE, name);
  for (const [key, value] of Object.entries(attributes)) made.setAttribute(key, typeof value === 'number' ? svgNumber(value) : value);
  return made;
}

/** Write wrapped text from `top`; returns the bottom of the block. */
function text(writer: Writer, parent: Element, content: string, x: number, top: number, width: number, size: number, settings: { bold?: boolean; colour?: string } = {}): number {
  const bold = settings.bold === true;
  const lines = wrapText(content, width, size, bold, measureDejaVuSans);
  const block = element(writer, 'text', { 'font-size': size, fill: settings.colour ?? INK, ...(bold ? { 'font-weight': 'bold' } : {}) });
  lines.forEach((line, index) => {
    const span = element(writer, 'tspan', { x, y: top + size * 0.8 + index * size * LINE });
    span.textContent = line;
    block.appendChild(span);
  });
  parent.appendChild(block);
  return top + lines.length * size * LINE;
}

/** A legend figure of a look, as a nested `<svg>` at (x, y). */
function swatch(writer: Writer, parent: Element, look: Callout['look'], x: number, y: number, size: number): void {
  if (look === null) return;
  const nested = element(writer, 'svg', { x, y, width: size, height: size });
  drawSwatch(nested, look, `${writer.prefix}-swatch-${writer.swatches}`);
  writer.swatches += 1;
  parent.appendChild(nested);
}

/** The width a panel's people are drawn at, as on screen. */
function panelWidth(slide: Slide, panel: PeoplePanel): number {
  if (panel.layout.denominator === 100) return 430 * U;
  if (slide.layout === 'pair') return 580 * U;
  if (slide.layout === 'wide-pair') return 740 * U;
  return 640 * U;
}

/** A panel: title, people, counts. Returns its bottom. */
function panel(writer: Writer, slide: Slide, found: PeoplePanel, x: number, top: number): number {
  const width = panelWidth(slide, found);
  let y = text(writer, writer.root, found.title, x, top, width, 28 * U, { bold: true }) + 8 * U;
  const size = drawingSize(found.layout);
  const scale = width / size.width;
  const group = element(writer, 'g', { transform: `translate(${svgNumber(x)},${svgNumber(y)}) scale(${svgNumber(scale, 5)})` });
  drawPeopleGroup(group, writer.defs, found.layout, found.looks, `${writer.prefix}-${found.id}`);
  const title = element(writer, 'title', {});
  title.textContent = found.description;
  group.insertBefore(title, group.firstChild);
  writer.root.appendChild(group);
  y += size.height * scale + 8 * U;
  let chipX = x;
  for (const chip of found.chips) {
    swatch(writer, writer.root, chip.look, chipX, y, 36 * U);
    const count = String(chip.count);
    text(writer, writer.root, count, chipX + 44 * U, y + 2 * U, 200 * U, 30 * U, { bold: true });
    chipX += 44 * U + measureDejaVuSans(count, 30 * U, true) + 24 * U;
  }
  return y + 40 * U;
}

function callout(writer: Writer, found: Callout, x: number, top: number, width: number): number {
  swatch(writer, writer.root, found.look, x, top, 48 * U);
  const indent = found.look === null ? 0 : 62 * U;
  const valueBottom = text(writer, writer.root, found.value, x + indent, top, width - indent, 48 * U, { bold: true });
  return text(writer, writer.root, found.text, x + indent, valueBottom, width - indent, 28 * U);
}

function card(writer: Writer, found: FramingCard, x: number, top: number, width: number): number {
  const inner = width - 46 * U;
  const group = element(writer, 'g', {});
  writer.root.appendChild(group);
  let y = top + 10 * U;
  y = text(writer, group, found.label, x + 28 * U, y, inner, 28 * U, { bold: true, colour: MUTED });
  y = text(writer, group, found.value, x + 28 * U, y, inner, 44 * U, { bold: true, colour: ACCENT });
  if (found.detail !== null) y = text(writer, group, found.detail, x + 28 * U, y, inner, 28 * U);
  const bottom = y + 10 * U;
  group.insertBefore(element(writer, 'rect', { x, y: top, width, height: bottom - top, rx: 8 * U, fill: '#ffffff', stroke: LINE_COLOUR, 'stroke-width': 2 * U }), group.firstChild);
  group.insertBefore(element(writer, 'rect', { x, y: top, width: 10 * U, height: bottom - top, fill: ACCENT }), group.childNodes[1] ?? null);
  return bottom;
}

function line(writer: Writer, found: SlideLine, x: number, top: number, width: number): number {
  if (found.tone === 'subheading') return text(writer, writer.root, found.text, x, top + 4 * U, width, 32 * U, { bold: true });
  swatch(writer, writer.root, found.look, x, top, 36 * U);
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
  y = text(writer, group, slide.evidence.source, x + 28 * U, y + 6 * U, width - 46 * U, 28 * U, { bold: true, colour: NOTICE }) + 12 * U;
  group.insertBefore(element(writer, 'rect', { x, y: top, width, height: y - top, fill: NOTICE_SOFT }), group.firstChild);
  group.insertBefore(element(writer, 'rect', { x, y: top, width: 10 * U, height: y - top, fill: NOTICE }), group.childNodes[1] ?? null);
  return y;
}

/** The side column: call-outs, cards, lines and evidence, one under another. */
function side(writer: Writer, slide: Slide, x: number, top: number, width: number): void {
  let y = top;
  const gap = 16 * U;
  for (const found of slide.callouts) y = callout(writer, found, x, y, width) + gap;
  for (const found of slide.cards) y = card(writer, found, x, y, width) + 14 * U;
  for (const found of slide.lines) y = line(writer, found, x, y, width) + gap;
  evidence(writer, slide, x, y, width);
}

/** Draw `slide` in a detached 1920 × 1080 `<svg>` of `document`, with `footer` at its foot. */
export function slideSvgElement(slide: Slide, document: Document, footer: string): SVGSVGElement {
  const root = document.createElementNS(SVG_NAMESPACE, 'svg');
  for (const [key, value] of Object.entries({ viewBox: `0 0 ${SLIDE_WIDTH} ${SLIDE_HEIGHT}`, width: SLIDE_WIDTH, height: SLIDE_HEIGHT, 'font-family': FONT, role: 'img' })) {
    root.setAttribute(key, String(value));
  }
  const defs = document.createElementNS(SVG_NAMESPACE, 'defs');
  root.appendChild(defs);
  const writer: Writer = { document, root, defs, prefix: `slide-${slide.kind}`, swatches: 0 };
  const title = element(writer, 'title', {});
  title.textContent = slide.heading;
  root.appendChild(title);
  root.appendChild(element(writer, 'rect', { width: SLIDE_WIDTH, height: SLIDE_HEIGHT, fill: '#ffffff' }));

  const left = 32 * U;
  const inner = SLIDE_WIDTH - 2 * left;
  const badgeWidth = slide.illustrative ? 300 * U : 0;
  let y = text(writer, root, slide.heading, left, 22 * U, inner - badgeWidth, 44 * U, { bold: true });
  if (slide.illustrative) {
    const label = 'Illustrative: invented numbers';
    const labelWidth = Math.min(measureDejaVuSans(label, 22 * U, true), badgeWidth) + 28 * U;
    const x = SLIDE_WIDTH - left - labelWidth;
    root.appendChild(element(writer, 'rect', { x, y: 24 * U, width: labelWidth, height: 40 * U, rx: 6 * U, fill: NOTICE_SOFT, stroke: NOTICE, 'stroke-width': 2 * U }));
    text(writer, root, label, x + 14 * U, 31 * U, labelWidth, 22 * U, { bold: true, colour: NOTICE });
  }
  y += 14 * U;

  const gap = 40 * U;
  let x = left;
  let bottom = y;
  const panels = slide.panels;
  if (slide.layout === 'wide-pair' && panels.length === 2) {
    const [small, large] = panels as [PeoplePanel, PeoplePanel];
    panel(writer, slide, small, x, y);
    x += panelWidth(slide, small) + gap;
    const under = panel(writer, slide, large, x, y) + 20 * U;
    side(writer, slide, x, under, SLIDE_WIDTH - left - x);
  } else {
    for (const found of panels) {
      bottom = Math.max(bottom, panel(writer, slide, found, x, y));
      x += panelWidth(slide, found) + gap;
    }
    const below = slide.layout === 'words' || (slide.layout === 'pair' && panels.some((found) => found.layout.denominator === 1000));
    if (below) side(writer, slide, left, panels.length === 0 ? y : bottom + 20 * U, inner);
    else side(writer, slide, x, y, SLIDE_WIDTH - left - x);
  }

  root.appendChild(element(writer, 'rect', { x: left, y: SLIDE_HEIGHT - 58 * U, width: inner, height: 2 * U, fill: LINE_COLOUR }));
  text(writer, root, footer, left, SLIDE_HEIGHT - 46 * U, inner, 24 * U, { colour: MUTED });
  return root;
}

/** The slide as standalone SVG file text. */
export function slideSvgText(slide: Slide, document: Document, footer: string): string {
  const svg = slideSvgElement(slide, document, footer);
  const Serializer = document.defaultView?.XMLSerializer ?? globalThis.XMLSerializer;
  const body = Serializer === undefined ? svg.outerHTML.replace('<svg', `<svg xmlns="${SVG_NAMESPACE}"`) : new Serializer().serializeToString(svg);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${body}\n`;
}
