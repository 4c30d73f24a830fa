/**
 * Which people's group depends on where in its interval the option's true risk lies.
 */

/** A half-open span of ranks in the grouped sequence: `from` ≤ rank < `to`. */
export interface RankSpan {
  readonly from: number;
  readonly to: number;
}

/**
 * The ranks whose group changes as the option's count of people with the outcome
 * moves from `lower` to `upper`. A person at rank r has the outcome with the option
 * exactly when r < count, so only ranks `lower` ≤ r < `upper` can change; the
 * comparison count is fixed. Returns null when no one's group can change.
 *
 * @example uncertainRanks({ lower: 13, upper: 18 }, 15) // => { from: 13, to: 18 }
 */
export function uncertainRanks(range: { readonly lower: number; readonly upper: number }, estimate: number): RankSpan | null {
  const from = Math.min(range.lower, estimate);
  const to = Math.max(range.upper, estimate);
  return to > from ? { from, to } : null;
}

/** Whether the person at `rank` lies in the span (false when there is none). */
export function isUncertain(rank: number, span: RankSpan | null): boolean {
  return span !== null && rank >= span.from && rank < span.to;
}
