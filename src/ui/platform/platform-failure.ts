/**
 * What a platform can fail at in a way the person can put right, as a value: the message is
 * written from it in the interface's words where it is shown (`AppMessages.fail`), so nothing
 * below the app writes a sentence. Its `message` is the English, for logs and plain errors.
 */
import { noticeMessagesEn } from '../messages/notices-en.ts';
import type { PlatformFailureMessages } from '../messages/notice-messages.ts';

export type PlatformFailureKind =
  /** The browser refused the new tab the handout is printed from (pop-ups blocked). */
  | { readonly kind: 'tab-blocked' }
  /** A picked file is over the size a Chancewise file can be, so it was not read. */
  | { readonly kind: 'file-too-large'; readonly fileName: string; readonly bytes: number; readonly limitBytes: number };

/** The sentence for a failure, in `words`. */
export function describePlatformFailure(failure: PlatformFailureKind, words: PlatformFailureMessages): string {
  if (failure.kind === 'tab-blocked') return words.tabBlocked;
  return words.fileTooLarge(failure.fileName, failure.bytes / 1_000_000, failure.limitBytes / 1_000_000);
}

export class PlatformFailure extends Error {
  constructor(readonly failure: PlatformFailureKind) {
    super(describePlatformFailure(failure, noticeMessagesEn.platform));
    this.name = 'PlatformFailure';
  }
}
