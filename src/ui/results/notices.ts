/**
 * The warnings shown with the results: the core's notices about the numbers, then the
 * reading warnings on the typed texts (`reading-notices.ts`).
 */
import { type Catalogue, noticeSentences } from '../../core/messages/describe.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { Notice } from '../../core/types.ts';

/** Every warning as a sentence, the numbers' first, then those on the typed texts, without repeats. */
export function resultWarnings(result: TopicResult, reading: readonly Notice[], catalogue?: Catalogue): string[] {
  return noticeSentences([...result.notices, ...reading], catalogue);
}
