/**
 * Start-up in stages: the parts of the first screen a clinician sees at once (the topic's
 * first fields and the headline chart) are drawn first; parts further down the page ask
 * for a turn and are drawn one per task after the first frame, so the page is usable
 * sooner and a click or key press is never stuck behind one long task. Once the queue
 * has emptied, later parts (an added outcome, a newly opened file) are drawn at once.
 */

/** Runs `task` later: after the next frame, then in a fresh task. */
export type Scheduler = (task: () => void) => void;

export interface StagedReveal {
  /** True once every part asked for at start-up has been drawn. */
  readonly settled: boolean;
  /**
   * Ask for a turn: `reveal` runs when it comes (at once when already settled).
   * Returns a cancel function for a part removed before its turn.
   */
  request(reveal: () => void): () => void;
}

/**
 * After the next frame has been painted: a frame callback runs just before painting, so
 * the task queued from it runs after the paint; one more hop lets anything else waiting
 * for that paint (a click, a page's own frame callbacks) go first.
 */
export function afterNextFrame(task: () => void): void {
  requestAnimationFrame(() => setTimeout(() => setTimeout(task, 0), 0));
}

/** A new task, without waiting for a frame. */
export function nextTask(task: () => void): void {
  setTimeout(task, 0);
}

export interface StagedRevealSettings {
  /** When the first turn comes (default: after the next frame). */
  readonly first?: Scheduler;
  /** When each later turn comes (default: the next task). */
  readonly next?: Scheduler;
  /** Called once, when the last start-up part has been drawn. */
  readonly onSettled?: () => void;
}

export function stagedReveal(settings: StagedRevealSettings = {}): StagedReveal {
  const first = settings.first ?? afterNextFrame;
  const next = settings.next ?? nextTask;
  const waiting: (() => void)[] = [];
  let settled = false;
  let pumping = false;

  const settle = (): void => {
    settled = true;
    settings.onSettled?.();
  };

  const turn = (): void => {
    const reveal = waiting.shift();
    if (reveal === undefined) {
      settle();
      return;
    }
    reveal();
    if (waiting.length === 0) settle();
    else next(turn);
  };

  return {
    get settled() {
      return settled;
    },
    request(reveal) {
      if (settled) {
        reveal();
        return () => {};
      }
      waiting.push(reveal);
      if (!pumping) {
        pumping = true;
        first(turn);
      }
      return () => {
        const at = waiting.indexOf(reveal);
        if (at !== -1) waiting.splice(at, 1);
      };
    },
  };
}
