/**
 * The one message the app shows at a time, at the foot of the window: information fades
 * after a while, an error stays until dismissed.
 */
import type { PlatformFailureMessages } from '../messages/notice-messages.ts';
import { noticeMessagesEn } from '../messages/notices-en.ts';
import { PlatformFailure, describePlatformFailure } from '../platform/platform-failure.ts';

export interface AppMessage {
  readonly tone: 'error' | 'info';
  readonly text: string;
}

/**
 * How long information stays, in milliseconds: a few seconds, long enough to read two short
 * sentences (common practice); errors stay until dismissed.
 */
export const INFO_MILLISECONDS = 6000;

/** Runs a task after a delay. */
export type Later = (task: () => void, delay: number) => void;

export class AppMessages {
  message = $state.raw<AppMessage | null>(null);
  readonly #later: Later;
  readonly #platformWords: PlatformFailureMessages;

  /** `platformWords` say what a platform failure was, in the interface's language (English when absent). */
  constructor(
    later: Later = (task, delay) => void setTimeout(task, delay),
    platformWords: PlatformFailureMessages = noticeMessagesEn.platform,
  ) {
    this.#later = later;
    this.#platformWords = platformWords;
  }

  show(next: AppMessage): void {
    this.message = next;
    if (next.tone === 'info') {
      this.#later(() => {
        if (this.message === next) this.message = null;
      }, INFO_MILLISECONDS);
    }
  }

  /** Say that something went wrong, with the error's own words put in a sentence that says what still holds. */
  fail(error: unknown, sentence: (reason: string) => string = (reason) => reason): void {
    const reason =
      error instanceof PlatformFailure
        ? describePlatformFailure(error.failure, this.#platformWords)
        : error instanceof Error
          ? error.message
          : String(error);
    this.show({ tone: 'error', text: sentence(reason) });
  }

  dismiss(): void {
    this.message = null;
  }
}
