/**
 * The sheet's disclosures: the "About this sheet" line (who prepared the topic, its funding,
 * the interests of those who prepared it, and the date it is to be reviewed by), and the
 * source of every effect, for the evidence beside the caution. Pure: words from the catalogue.
 */
import { EMPTY_DISCLOSURES } from '../core/topic/topic.ts';
import type { Topic } from '../core/topic/topic.ts';
import type { AboutSheetMessages, EffectSourceGroup } from './messages/handout-messages.ts';

/** The "About this sheet" line; a disclosure not given reads "not stated", never blank. */
export function aboutSheetLine(topic: Topic, messages: AboutSheetMessages, formatDate: (text: string) => string): string {
  const about = topic.about ?? EMPTY_DISCLOSURES;
  const given = (text: string): string | null => (text.trim() === '' ? null : text.trim());
  const reviewBy = given(about.reviewBy);
  return messages.line({
    preparedBy: given(about.preparedBy),
    funding: given(about.funding),
    interests: given(about.interests),
    reviewBy: reviewBy === null ? null : formatDate(reviewBy),
  });
}

/**
 * The source of every effect of the topic, one group per distinct source (in the order first
 * met), each saying what it is the source of: an option all of whose effects have this source
 * by the option's name (nothing at all when the topic compares one option and this is the
 * source of all its effects), any other effect by its outcome, led by the option's name when
 * the topic compares more than one. Effects with no source form a group with an empty source.
 */
export function effectSourceGroups(topic: Topic): EffectSourceGroup[] {
  const compared = topic.options.filter((option) => !option.isComparison);
  const several = compared.length > 1;
  const effects = topic.outcomes.flatMap((outcome) =>
    outcome.effects.flatMap((entry) => {
      const option = compared.find((candidate) => candidate.id === entry.optionId);
      const source = entry.source.trim().replace(/[.!?]+$/, '');
      return option === undefined ? [] : [{ option, outcome: outcome.name.trim(), source }];
    }),
  );
  const sources = [...new Set(effects.map((effect) => effect.source))];
  // One source for every effect: nothing to say it is the source of.
  if (sources.length === 1) return [{ source: sources[0] ?? '', of: [] }];
  return sources.map((source) => {
    const mine = effects.filter((effect) => effect.source === source);
    const whole = compared.filter(
      (option) =>
        mine.some((effect) => effect.option === option) &&
        effects.every((effect) => effect.option !== option || effect.source === source),
    );
    const parts = mine.filter((effect) => !whole.includes(effect.option));
    const named = several ? whole.map((option) => option.name.trim()) : [];
    return {
      source,
      of: [...named, ...parts.map((effect) => (several ? `${effect.option.name.trim()}, ${effect.outcome}` : effect.outcome))],
    };
  });
}
