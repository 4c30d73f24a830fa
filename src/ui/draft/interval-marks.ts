/**
 * Which of an interval's two boxes a problem of the interval as a whole marks: a missing
 * limit marks the empty box; limits in the wrong order, or limits that leave out the
 * estimate, mark both, since either could be the one mistyped.
 */
import type { FieldProblem } from './check-draft.ts';
import type { EffectDraft } from './topic-draft.ts';

export interface IntervalMarks {
  readonly lower: boolean;
  readonly upper: boolean;
}

/** The boxes to mark for the problems of an effect's interval (those still only needed mark none). */
export function intervalMarks(problems: readonly FieldProblem[], effect: Pick<EffectDraft, 'lower' | 'upper'>): IntervalMarks {
  let lower = false;
  let upper = false;
  for (const found of problems) {
    if (found.needed) continue;
    if (found.problem.code === 'interval-incomplete') {
      lower ||= effect.lower.trim() === '';
      upper ||= effect.upper.trim() === '';
    } else {
      lower = true;
      upper = true;
    }
  }
  return { lower, upper };
}
