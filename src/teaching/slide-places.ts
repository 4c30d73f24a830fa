/**
 * The places of a presentation: every slide of every topic as one place in a single
 * sequence, so stepping forward from a topic's last step goes to the next topic's first.
 */
import { slideCount } from './build-slide.ts';
import type { PresentationItem } from './presentation-item.ts';
import type { StepKind } from './teaching-steps.ts';

/** One place in the sequence: which topic, which of its steps, the step's kind, and which of the step's slides. */
export interface SlidePlace {
  readonly item: number;
  readonly step: number;
  readonly kind: StepKind;
  /** From 0; above 0 only on a step with several slides (one per harm). */
  readonly part: number;
}

/** Every slide of every item, in order. */
export function slidePlaces(items: readonly PresentationItem[]): SlidePlace[] {
  return items.flatMap((item, itemIndex) =>
    item.steps.flatMap((kind, step) =>
      Array.from({ length: slideCount(item, kind) }, (_, part) => ({ item: itemIndex, step, kind, part })),
    ),
  );
}
