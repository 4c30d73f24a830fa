/**
 * The interval of a number needed to treat as parts, in Altman's form (Altman DG 1998,
 * "Confidence intervals for the number needed to treat", BMJ 317:1309–1312): the core decides
 * which case an interval is and its whole limits; a language's words only join them.
 */

/** An NNT interval's case and its limits, each a whole number of people, benefit end first. */
export type NntInterval =
  /** Both limits on one side of no effect: "NNTB 13 to 100", the smaller number first. */
  | { readonly kind: 'one-side'; readonly label: 'NNTB' | 'NNTH'; readonly from: number; readonly to: number }
  /** One limit exactly at no effect: "NNTB 4 to ∞". */
  | { readonly kind: 'to-infinity'; readonly label: 'NNTB' | 'NNTH'; readonly from: number }
  /** The interval crosses no effect, so it passes through infinity: "NNTB 4 to ∞ to NNTH 20". */
  | { readonly kind: 'through-infinity'; readonly benefit: number; readonly harm: number }
  /** Both limits exactly at no effect: "∞". */
  | { readonly kind: 'infinity' };

/** The words that join an interval's parts: "∞" and "to". */
export interface IntervalWords {
  readonly infinity: string;
  readonly to: string;
}

/**
 * An NNT interval in words: "NNTB 4 to ∞ to NNTH 20" in English, "NNTB 4 a ∞ a NNTH 20" with
 * the Spanish "a".
 *
 * @example writeNntInterval({ kind: 'through-infinity', benefit: 4, harm: 20 }, { infinity: '∞', to: 'to' }) // => "NNTB 4 to ∞ to NNTH 20"
 */
export function writeNntInterval(interval: NntInterval, words: IntervalWords): string {
  const { infinity, to } = words;
  switch (interval.kind) {
    case 'one-side':
      return `${interval.label} ${interval.from} ${to} ${interval.to}`;
    case 'to-infinity':
      return `${interval.label} ${interval.from} ${to} ${infinity}`;
    case 'through-infinity':
      return `NNTB ${interval.benefit} ${to} ${infinity} ${to} NNTH ${interval.harm}`;
    case 'infinity':
      return infinity;
  }
}

/**
 * The whole numbers an interval writes, in the order it writes them.
 *
 * @example nntIntervalLimits({ kind: 'one-side', label: 'NNTB', from: 13, to: 100 }) // => [13, 100]
 */
export function nntIntervalLimits(interval: NntInterval): readonly number[] {
  switch (interval.kind) {
    case 'one-side':
      return [interval.from, interval.to];
    case 'to-infinity':
      return [interval.from];
    case 'through-infinity':
      return [interval.benefit, interval.harm];
    case 'infinity':
      return [];
  }
}
