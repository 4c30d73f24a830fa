/**
 * The people of one icon array as SVG: one `<path>` per group that has people, its `d`
 * joining every person of the group (`people-shapes.ts`), carrying `data-outcome` with the
 * group (its event meaning), `data-count` with how many people it draws, and the paint of
 * the group's look (`lookOf`: helped or harmed depending on whether the event is wanted).
 * A live update rewrites only the shapes whose people or paint changed.
 *
 * One element per group instead of one per person: a browser's cost of creating, styling
 * and laying out 2 × 1000 elements is far above a frame's budget, while a few long paths
 * cost almost nothing to lay out.
 */
import { type PersonLook, lookOf } from '../../core/direction.ts';
import type { PersonGroup } from '../../core/types.ts';
import { glyphFor } from '../glyphs/glyph-for.ts';
import { glyphPath } from '../glyphs/svg-path-context.ts';
import type { IconArrayLayout } from '../icon-array-layout.ts';
import type { ChartPalette } from '../palette.ts';
import { GROUP_ORDER, type PeopleShape, peopleShapes } from './people-shapes.ts';
import { type PatternIds, personPaint } from './person-paint.ts';
import { setChangedAttribute } from './set-changed-attribute.ts';
import { svgNumber } from './svg-number.ts';

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/** The looks of the charts, in the order a group's shapes would be drawn. */
const LOOK_ORDER: readonly PersonLook[] = ['event', 'helped', 'harmed', 'free'];

/** Every person's look, in layout order: their group as `lookOf` draws it for the event's direction. */
export function personLooks(layout: IconArrayLayout, wanted: boolean): PersonLook[] {
  return layout.people.map((person) => lookOf(person.group, wanted));
}

/** What a people's group shows, person by person, as last drawn or updated here. */
interface DrawnPeople {
  readonly groups: PersonGroup[];
  readonly looks: PersonLook[];
}

/**
 * The drawn state of each people's group this module drew, so an update can say how many
 * people changed. Held weakly: it goes with the element. A group drawn elsewhere (an SVG
 * read from text) has no entry, and then the people of every rewritten shape count.
 */
const drawnPeople = new WeakMap<Element, DrawnPeople>();

function shapesOf(
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  only: ReadonlySet<PersonGroup> | null = null,
): PeopleShape<PersonLook>[] {
  const path = glyphPath(glyphFor(layout.geometry.glyph), layout.geometry.iconSize);
  return peopleShapes(layout, path, looks, LOOK_ORDER, only);
}

/** The attributes of a group's shape, in the order a fresh drawing writes them. */
function shapeAttributes(
  shape: PeopleShape<PersonLook>,
  palette: ChartPalette,
  patternIds: PatternIds,
  cellSize: number,
): readonly (readonly [string, string])[] {
  const paint = personPaint(palette, shape.look, patternIds, cellSize);
  return [
    ['data-outcome', shape.group],
    ['data-count', String(shape.count)],
    ['fill', paint.fill],
    ['stroke', paint.stroke],
    ['d', shape.d],
  ];
}

function newShape(document: Document, attributes: readonly (readonly [string, string])[]): Element {
  const element = document.createElementNS(SVG_NAMESPACE, 'path');
  for (const [name, value] of attributes) element.setAttribute(name, value);
  return element;
}

function setGroupAttributes(group: SVGGElement, layout: IconArrayLayout, palette: ChartPalette): void {
  setChangedAttribute(group, 'stroke-width', svgNumber(layout.geometry.cellSize * palette.outlineWidth, 3));
  setChangedAttribute(group, 'stroke-linejoin', 'round');
}

/**
 * Draw the people of a layout into `group` (best detached, attached once after),
 * replacing what was there.
 */
export function drawPeople(
  group: SVGGElement,
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  palette: ChartPalette,
  patternIds: PatternIds,
): void {
  const cellSize = layout.geometry.cellSize;
  group.replaceChildren();
  setGroupAttributes(group, layout, palette);
  for (const shape of shapesOf(layout, looks)) {
    group.appendChild(newShape(group.ownerDocument, shapeAttributes(shape, palette, patternIds, cellSize)));
  }
  drawnPeople.set(group, { groups: layout.people.map((person) => person.group), looks: [...looks] });
}

/**
 * Bring the drawn people of `group` to new looks. A group's shape is rewritten only when
 * its people or paint changed (attributes with the same value are not written again), a
 * group that gains its first person gets a new shape in its place, and one left with no
 * one loses its shape; the others stay untouched, and when this module drew the group
 * their paths are not even built again. Returns how many people changed group or look.
 */
export function updatePeople(
  group: SVGGElement,
  layout: IconArrayLayout,
  looks: readonly PersonLook[],
  palette: ChartPalette,
  patternIds: PatternIds,
): number {
  const cellSize = layout.geometry.cellSize;
  setGroupAttributes(group, layout, palette);
  const groups = layout.people.map((person) => person.group);
  const changes = changedGroups(drawnPeople.get(group), groups, looks);
  drawnPeople.set(group, { groups, looks: [...looks] });
  if (changes?.people === 0) return 0;
  const dirty = changes?.groups ?? null;
  const known = new Map<string, Element>();
  for (const child of [...group.children]) {
    const name = child.getAttribute('data-outcome');
    if (name !== null && !known.has(name)) known.set(name, child);
    else child.remove();
  }
  const built = new Map(shapesOf(layout, looks, dirty).map((shape) => [shape.group, shape]));
  let rewritten = 0;
  let previous: Element | null = null;
  for (const name of GROUP_ORDER) {
    const element = known.get(name);
    const shape = built.get(name);
    if (dirty !== null && !dirty.has(name)) {
      // The same people in the same look: the shape stays as it is.
    } else if (shape === undefined) {
      if (element !== undefined) {
        rewritten += Number(element.getAttribute('data-count') ?? 0);
        element.remove();
      }
      continue;
    } else {
      const attributes = shapeAttributes(shape, palette, patternIds, cellSize);
      if (element === undefined) {
        const made = newShape(group.ownerDocument, attributes);
        group.insertBefore(made, previous === null ? group.firstChild : previous.nextSibling);
        previous = made;
        rewritten += shape.count;
        continue;
      }
      if (attributes.some(([attribute, value]) => element.getAttribute(attribute) !== value)) {
        for (const [attribute, value] of attributes) setChangedAttribute(element, attribute, value);
        rewritten += shape.count;
      }
    }
    if (element !== undefined) previous = element;
  }
  return changes?.people ?? rewritten;
}

/**
 * Which groups gained or lost people or changed look since `drawn`, and how many people
 * changed; null when there is no drawing to compare with.
 */
function changedGroups(
  drawn: DrawnPeople | undefined,
  groups: readonly PersonGroup[],
  looks: readonly PersonLook[],
): { readonly groups: ReadonlySet<PersonGroup>; readonly people: number } | null {
  if (drawn === undefined || drawn.groups.length !== groups.length) return null;
  const dirty = new Set<PersonGroup>();
  let people = 0;
  for (let index = 0; index < groups.length; index += 1) {
    const before = drawn.groups[index] as PersonGroup;
    const after = groups[index] as PersonGroup;
    if (before === after && drawn.looks[index] === looks[index]) continue;
    dirty.add(before);
    dirty.add(after);
    people += 1;
  }
  return { groups: dirty, people };
}
