/**
 * Typed problems: what is wrong with an input, as a stable code, the field it
 * belongs to and the values involved. The sentence a person reads comes from the
 * message catalogue (`messages/`), never from here.
 */

export type ProblemCode =
  // reading numbers and risks
  | 'number-unparsable'
  | 'number-out-of-reach'
  | 'number-missing'
  | 'risk-empty'
  | 'risk-unparsable'
  | 'risk-ambiguous'
  | 'risk-denominator-zero'
  | 'risk-out-of-range'
  | 'baseline-out-of-range'
  | 'baseline-missing'
  | 'trial-baseline-unusable'
  | 'percent-unparsable'
  | 'level-out-of-range'
  // effects
  | 'ratio-not-positive'
  | 'rrr-out-of-range'
  | 'arr-out-of-range'
  | 'interval-incomplete'
  | 'interval-excludes-estimate'
  | 'interval-reversed'
  | 'risk-certain'
  | 'rr-risk-above-one'
  | 'limit-risk-outside'
  | 'risk-outside'
  // periods
  | 'period-not-positive'
  | 'period-pair-incomplete'
  | 'period-too-long'
  // trial counts
  | 'counts-not-whole'
  | 'counts-too-large'
  | 'counts-negative'
  | 'counts-total-zero'
  | 'counts-events-above-total'
  | 'counts-unparsable'
  // topics
  | 'topic-text-missing'
  | 'topic-text-too-long'
  | 'topic-too-few-options'
  | 'topic-too-many-options'
  | 'topic-comparison-count'
  | 'topic-too-few-outcomes'
  | 'topic-too-many-outcomes'
  | 'topic-headline-count'
  | 'topic-duplicate-id'
  | 'topic-duplicate-name'
  | 'topic-effect-missing'
  | 'topic-effect-unknown-option'
  | 'topic-effect-on-comparison'
  | 'date-not-written'
  | 'date-not-real'
  // files
  | 'file-not-json'
  | 'file-format-unknown'
  | 'file-version-unsupported'
  | 'file-field-invalid'
  | 'topic-language-unsupported'
  // command line
  | 'cli-usage';

export type ProblemValues = Readonly<Record<string, string | number>>;

/** One problem with one field. `field` is a dotted path ("outcomes.0.baseline.risk") or a flag ("--rr"). */
export interface Problem {
  readonly code: ProblemCode;
  readonly field: string;
  readonly values: ProblemValues;
}

/** Build a problem value. */
export function problem(code: ProblemCode, field: string, values: ProblemValues = {}): Problem {
  return { code, field, values };
}

/**
 * The exception thrown by core functions for invalid input. It carries the typed
 * problem; callers at the edge turn it into a sentence with the message catalogue.
 */
export class InputError extends Error {
  readonly problem: Problem;
  constructor(found: Problem) {
    super(`${found.code} at ${found.field}`);
    this.name = 'InputError';
    this.problem = found;
  }
}

/** Throw an InputError for the given code, field and values. */
export function fail(code: ProblemCode, field: string, values: ProblemValues = {}): never {
  throw new InputError(problem(code, field, values));
}
