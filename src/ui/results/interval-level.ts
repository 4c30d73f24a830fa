/**
 * The level of an interval in words: "90%", and the levels a computed topic's ranges carry,
 * so that a 90% or 99% interval never reads like a 95% one.
 */
import { DEFAULT_LEVEL } from '../../core/check-effect.ts';
import { formatSignificant } from '../../core/messages/format-number.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
import { uiMessagesEn } from '../messages/en.ts';
import type { IntervalMessages } from '../messages/ui-messages.ts';

/** A level as a percentage: 0.9 → "90%", 0.999 → "99.9%"; null (none given) is the default level. */
export function levelText(level: number | null): string {
  return `${formatSignificant((level ?? DEFAULT_LEVEL) * 100, 1)}%`;
}

/** The distinct levels of the options' intervals in a topic, lowest first: [0.9, 0.95]. */
export function topicLevels(result: TopicResult): number[] {
  const levels = new Set<number>();
  for (const outcome of result.outcomes) {
    for (const option of outcome.options) {
      if (option.level !== null && option.interventionRisk.lower !== null) levels.add(option.level);
    }
  }
  return [...levels].sort((first, second) => first - second);
}

/**
 * What the ranges of a topic's results are, for the note beneath them: "Ranges are 90%
 * intervals for the effect", or each effect's own level when they differ (English unless given
 * the interface's words).
 */
export function rangesNote(result: TopicResult, words: IntervalMessages = uiMessagesEn.intervals): string {
  const levels = topicLevels(result);
  if (levels.length <= 1) return words.oneLevel(levelText(levels[0] ?? null));
  return words.severalLevels(levels.map(levelText));
}
