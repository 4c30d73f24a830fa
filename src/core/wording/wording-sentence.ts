/**
 * A sentence of wording as data: what kind it is, who it is for, the text, and
 * every number written in the text by role, so a test or a layout can check that
 * the words say what the picture shows.
 */

/** The kinds of sentence the wording produces. */
export type SentenceKind =
  | 'population'
  | 'event-frame'
  | 'free-frame'
  | 'change'
  | 'range'
  | 'range-unknown'
  | 'certainty'
  | 'band'
  | 'nnt'
  | 'nnt-none'
  | 'relative'
  /** The short forms, for pictures whose captions carry the frames: change with range, certainty, NNT. */
  | 'short-effect'
  | 'short-effect-unknown'
  | 'short-certainty'
  | 'short-nnt';

/** Who a sentence is written for: the patient handout, or the clinician view only unless asked. */
export type Audience = 'patient' | 'clinician';

export interface WordingSentence {
  readonly kind: SentenceKind;
  readonly audience: Audience;
  /** The outcome the sentence is about; null for sentences about the whole topic. */
  readonly outcomeId: string | null;
  /** The option the sentence is about; null for sentences about the whole topic. */
  readonly optionId: string | null;
  readonly text: string;
  /** Every number that appears in `text`, keyed by its role (count, denominator, years...). */
  readonly numbers: Readonly<Record<string, number>>;
}
