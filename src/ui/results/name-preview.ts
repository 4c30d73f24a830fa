/**
 * The patient sentences that carry the typed names, for the editor's preview: for each outcome,
 * the first option (after the comparison) said as people with the outcome, and the change it
 * makes. These are the sentences where a name must fit the pattern around it (its article,
 * its gender, whether it starts with a verb), so the clinician sees them while typing.
 */
import type { SentenceKind } from '../../core/wording/wording-sentence.ts';
import type { TopicWording } from '../../core/wording/topic-wording.ts';

/** One outcome's preview lines, in the patient's language. */
export interface NamePreview {
  readonly outcomeId: string;
  readonly outcomeName: string;
  readonly lines: readonly string[];
}

const SHOWN: readonly SentenceKind[] = ['event-frame', 'change'];

/**
 * The preview of every outcome: the comparison's event frame, then the first other option's
 * event frame and change. An outcome with no sentence yet is left out.
 */
export function namePreviews(wording: TopicWording): NamePreview[] {
  return wording.outcomes
    .map((outcome) => {
      const comparison = outcome.options.find((option) => option.isComparison);
      const treated = outcome.options.find((option) => !option.isComparison);
      const lines = [
        ...(comparison?.sentences.filter((sentence) => sentence.kind === 'event-frame') ?? []),
        ...(treated?.sentences.filter((sentence) => SHOWN.includes(sentence.kind)) ?? []),
      ].map((sentence) => sentence.text);
      return { outcomeId: outcome.outcomeId, outcomeName: outcome.name, lines };
    })
    .filter((preview) => preview.lines.length > 0);
}
