/**
 * The one message the app shows at a time, at the foot of the window: information fades
 * after a while, an error stays until dismissed. A message may offer to undo what it reports.
 */

export interface AppMessage {
  readonly tone: 'error' | 'info';
  readonly text: string;
  /** Offer an Undo button (the message reports a replaced topic). */
  readonly undo?: boolean;
}

/** How long information stays, in milliseconds (long enough to read two sentences; common practice). */
export const INFO_MILLISECONDS = 9000;

/** Runs a task after a delay. */
export type Later = (task: () => void, delay: number) => void;

export class AppMessages {
  message = $state.raw<AppMessage | null>(null);
  readonly #later: Later;

  constructor(later: Later = (task, delay) => void setTimeout(task, delay)) {
    this.#later = later;
  }

  show(next: AppMessage): void {
    this.message = next;
    if (next.tone === 'info') {
      this.#later(() => {
        if (this.message === next) this.message = null;
      }, INFO_MILLISECONDS);
    }
  }

  /** Say that something went wrong, with the error's own words and what still holds. */
  fail(start: string, error: unknown, end: string): void {
    this.show({ tone: 'error', text: `${start}${error instanceof Error ? error.message : String(error)}${end}` });
  }

  dismiss(): void {
    this.message = null;
  }
}
