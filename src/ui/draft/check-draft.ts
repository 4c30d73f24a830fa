/**
 * Checking a draft in one call: read its numbers, let the core check and compute the
 * topic, and give every problem at once, each tied to the editor field it belongs to.
 */
import type { Problem } from '../../core/problems.ts';
import { evaluateTopic } from '../../core/topic/compute-topic.ts';
import type { Topic } from '../../core/topic/topic.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { WordsDenominator } from '../../core/types.ts';
import { fieldKeyForPath, fieldOrder } from './field-keys.ts';
import { fieldMessage } from './field-messages.ts';
import { topicFromDraft } from './topic-from-draft.ts';
import type { TopicDraft } from './topic-draft.ts';

/** One problem, the field it belongs to (null: the topic as a whole) and its sentence. */
export interface FieldProblem {
  readonly key: string | null;
  readonly problem: Problem;
  readonly message: string;
  /**
   * True for something not yet filled in, in a field the person has not touched: shown as
   * still needed, calmly, rather than as a mistake. Set by the editor; false from here.
   */
  readonly needed: boolean;
}

/** Codes that mean "nothing entered yet" rather than "what was entered is wrong". */
const MISSING_CODES: ReadonlySet<Problem['code']> = new Set([
  'number-missing',
  'topic-text-missing',
  'risk-empty',
  'baseline-missing',
  'topic-effect-missing',
]);

/** Whether a problem only says that something has not been entered yet. */
export function isMissing(found: Problem): boolean {
  return MISSING_CODES.has(found.code);
}

export interface DraftCheck {
  readonly topic: Topic;
  /** True when every number could be read, so the topic can be written to a file. */
  readonly savable: boolean;
  readonly problems: readonly FieldProblem[];
  /** The computed topic; null while any problem remains. */
  readonly result: TopicResult | null;
}

/** Core fields without the effect's position: the trial arms, which the draft reading checks already. */
const UNPLACED_ARM_FIELDS: ReadonlySet<string> = new Set(['intervention', 'comparison', 'arm']);

function merged(own: readonly Problem[], core: readonly Problem[]): Problem[] {
  const ownFields = new Set(own.map((found) => found.field));
  const all = [...own, ...core.filter((found) => !ownFields.has(found.field) && !UNPLACED_ARM_FIELDS.has(found.field))];
  const seen = new Set<string>();
  return all.filter((found) => {
    const signature = `${found.code}|${found.field}|${JSON.stringify(found.values)}`;
    if (seen.has(signature)) return false;
    seen.add(signature);
    return true;
  });
}

/**
 * Check a draft and compute its topic. A draft whose numbers cannot all be read is still
 * checked by the core, so the person sees every problem at once.
 *
 * @param settings - `per`: a fixed words denominator (100 up to 1,000,000), or null to let the core choose
 */
export function checkDraft(draft: TopicDraft, settings: { readonly per?: WordsDenominator | null } = {}): DraftCheck {
  const reading = topicFromDraft(draft);
  const evaluation = evaluateTopic(reading.topic, { per: settings.per ?? null });
  const problems = merged(reading.problems, evaluation.ok ? [] : evaluation.problems);
  const order = new Map(fieldOrder(draft).map((key, index) => [key, index]));
  const placed = problems.map((found) => ({
    key: fieldKeyForPath(found.field, draft, reading.questionPlaces),
    problem: found,
    message: fieldMessage(found, draft),
    needed: false,
  }));
  // In the order the fields appear on screen; problems of the topic as a whole last. The sort is stable.
  const rank = (key: string | null) => (key === null ? Number.MAX_SAFE_INTEGER : (order.get(key) ?? Number.MAX_SAFE_INTEGER - 1));
  placed.sort((first, second) => rank(first.key) - rank(second.key));
  return {
    topic: reading.topic,
    savable: reading.problems.length === 0,
    problems: placed,
    result: problems.length === 0 && evaluation.ok ? evaluation.result : null,
  };
}
