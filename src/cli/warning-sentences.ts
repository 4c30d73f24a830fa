import { noticeSentences } from '../core/messages/describe.ts';
import type { Notice } from '../core/types.ts';

/**
 * The sentences of a result's warnings, in order, each once: two notices whose values
 * differ only in what the sentence does not show would otherwise print the same line twice.
 */
export function warningSentences(notices: readonly Notice[]): string[] {
  return noticeSentences(notices);
}
