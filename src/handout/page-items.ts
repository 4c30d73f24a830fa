/**
 * A laid-out page as plain data: text blocks, rules, boxes and charts at
 * positions in millimetres. Layout produces blocks of items; drawing paints them.
 */
import type { PersonLook } from '../core/direction.ts';
import type { ChartModel } from '../render/chart-model.ts';
import type { GlyphName, IconArrayLayout } from '../render/icon-array-layout.ts';
import type { TextBlock } from './text-layout.ts';

export type PageItem =
  | { readonly kind: 'text'; readonly x: number; readonly y: number; readonly block: TextBlock }
  | {
      readonly kind: 'rule';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly colour: string;
      readonly thickness: number;
    }
  | {
      readonly kind: 'box';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly height: number;
      readonly fill: string;
      readonly radius: number;
    }
  | {
      /** One person figure, as in the pictures, for the key. */
      readonly kind: 'figure';
      readonly x: number;
      readonly y: number;
      readonly size: number;
      readonly glyph: GlyphName;
      readonly look: PersonLook;
    }
  | {
      /** A rectangle's outline: the block of a picture that is shown enlarged, and the enlargement. */
      readonly kind: 'outline';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly height: number;
      readonly colour: string;
      readonly thickness: number;
    }
  | {
      /** People laid out by the render module, drawn without a chart's text: the enlarged block of 100. */
      readonly kind: 'people';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly layout: IconArrayLayout;
      /** The event is one people want (see `lookOf`). */
      readonly wanted: boolean;
    }
  | {
      readonly kind: 'chart';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly height: number;
      readonly model: ChartModel;
      /** Chart text size, in millimetres (the document's unit). */
      readonly fontSize: number;
    };

/** Items laid out from a top-left corner of (0, 0), with the height they take. */
export interface Block {
  readonly items: readonly PageItem[];
  readonly height: number;
}

/** An empty block. */
export const EMPTY_BLOCK: Block = { items: [], height: 0 };

/** The same item moved by (`dx`, `dy`). */
export function moveItem(item: PageItem, dx: number, dy: number): PageItem {
  return { ...item, x: item.x + dx, y: item.y + dy };
}

/** A block's items moved by (`dx`, `dy`). */
export function placeBlock(block: Block, dx: number, dy: number): readonly PageItem[] {
  return block.items.map((item) => moveItem(item, dx, dy));
}

/** Blocks one under another, `gap` apart. */
export function stack(blocks: readonly Block[], gap: number): Block {
  const items: PageItem[] = [];
  let top = 0;
  blocks
    .filter((block) => block.height > 0)
    .forEach((block, index) => {
      if (index > 0) top += gap;
      items.push(...placeBlock(block, 0, top));
      top += block.height;
    });
  return { items, height: top };
}

/** A text block as a block. */
export function textItem(block: TextBlock, x = 0, y = 0): Block {
  return { items: [{ kind: 'text', x, y, block }], height: block.height };
}
