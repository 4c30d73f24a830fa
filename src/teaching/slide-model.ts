/**
 * A teaching slide as plain data: its heading, the people arrays it shows, the
 * call-outs and lines beside them, framing cards, and the evidence line of a format
 * demonstration. The view and the slide export both draw this same data.
 */
import type { PersonLook as ChangeLook } from '../core/direction.ts';
import type { IconArrayLayout } from '../render/icon-array-layout.ts';
import type { EvidenceWords } from './messages/teaching-messages.ts';
import type { StepKind } from './teaching-steps.ts';

/**
 * How a person is drawn: has the outcome either way, helped or harmed by the option (from
 * their group and whether the event is wanted, see `lookOf`), free of it, or outlined when
 * their group depends on the range.
 */
export type PersonLook = ChangeLook | 'uncertain';

/** A count shown under an array with the look it counts; `label` says it in words. */
export interface PanelChip {
  readonly look: PersonLook;
  readonly count: number;
  readonly label: string;
}

/** One people array on a slide. */
export interface PeoplePanel {
  /** Unique on the slide; names the SVG pattern ids. */
  readonly id: string;
  readonly title: string;
  readonly layout: IconArrayLayout;
  /** Every person's look, in layout order. */
  readonly looks: readonly PersonLook[];
  readonly chips: readonly PanelChip[];
  /** The array in one sentence, for assistive technology. */
  readonly description: string;
}

/** A count in large type and what it means: "4 in 100" / "avoid a stroke because of …". */
export interface Callout {
  readonly look: PersonLook | null;
  readonly value: string;
  readonly text: string;
}

/** A line of text: a body sentence, a quieter note, a caution, or a sub-heading. */
export interface SlideLine {
  readonly text: string;
  readonly tone: 'body' | 'note' | 'notice' | 'subheading';
  readonly look: PersonLook | null;
}

/** One of the framing cards: the same result as a relative, absolute or NNT figure. */
export interface FramingCard {
  readonly id: 'relative' | 'absolute' | 'nnt';
  readonly label: string;
  readonly value: string;
  readonly detail: string | null;
}

/**
 * How the slide is arranged: text only, one array with text beside it, two arrays
 * with text beside them, a 100 and a 1000 array with text under the wider one, or
 * one array beside the framing cards.
 */
export type SlideLayout = 'words' | 'single' | 'pair' | 'wide-pair' | 'cards';

export interface Slide {
  readonly kind: StepKind;
  readonly layout: SlideLayout;
  readonly heading: string;
  readonly panels: readonly PeoplePanel[];
  readonly callouts: readonly Callout[];
  readonly cards: readonly FramingCard[];
  readonly lines: readonly SlideLine[];
  readonly evidence: EvidenceWords | null;
  readonly illustrative: boolean;
}
