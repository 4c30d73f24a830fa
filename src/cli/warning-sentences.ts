import type { Catalogue } from '../core/messages/describe.ts';
import { noticeSentences } from '../core/messages/describe.ts';
import type { Notice } from '../core/types.ts';

/**
 * The sentences of a result's warnings, in order, each once: two notices whose values
 * differ only in what the sentence does not show would otherwise print the same line twice.
 * Written from `catalogue`, or the core's default catalogue when none is given.
 */
export function warningSentences(notices: readonly Notice[], catalogue?: Catalogue): string[] {
  return noticeSentences(notices, catalogue);
}
