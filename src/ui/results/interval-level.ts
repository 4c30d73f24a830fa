/**
 * The level of an interval in words: "90%", and the levels a computed topic's ranges carry,
 * so that a 90% or 99% interval never reads like a 95% one.
 */
import { DEFAULT_LEVEL } from '../../core/check-effect.ts';
import { formatSignificant } from '../../core/messages/format-number.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';

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
 * intervals for the effect", or each effect's own level when they differ.
 */
export function rangesNote(result: TopicResult): string {
  const levels = topicLevels(result);
  if (levels.length === 0) return `Ranges are ${levelText(null)} intervals for the effect`;
  if (levels.length === 1) return `Ranges are ${levelText(levels[0] ?? null)} intervals for the effect`;
  const named = levels.map(levelText);
  return `Ranges are intervals for the effect at the level each effect gives (${named.slice(0, -1).join(', ')} and ${named.at(-1) ?? ''}: see each table)`;
}
