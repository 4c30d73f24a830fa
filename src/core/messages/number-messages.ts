/**
 * The shape of a language's words for number summaries: the NNT's interval in Altman's form
 * ("NNTB 4 to ∞ to NNTH 20") and the phrase for no difference. English is `en/numbers.ts`.
 */
export interface NumberMessages {
  /** The sign of an NNT at no effect: "∞". */
  readonly infinity: string;
  /** The word between the limits: "to". */
  readonly to: string;
  /** No difference between the options, without an interval. */
  readonly noDifference: string;
  /** No difference between the options, with the interval as written. */
  readonly noDifferenceWithin: (interval: string) => string;
}
