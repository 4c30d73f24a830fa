/** Writes still running, so quitting can wait for them (a window-state or snapshot write). */
export interface PendingWork {
  /** Track a task; resolves as the task does, never rejects. */
  track(task: Promise<unknown>): Promise<void>;
  /** How many tasks are still running. */
  readonly size: number;
  /** Resolves once every tracked task has settled. */
  settled(): Promise<void>;
}

/** A fresh set of pending work. */
export function createPendingWork(report: (error: unknown) => void): PendingWork {
  const running = new Set<Promise<void>>();
  return {
    track(task) {
      const settled = task.then(
        () => undefined,
        (error: unknown) => {
          report(error);
        },
      );
      running.add(settled);
      void settled.finally(() => running.delete(settled));
      return settled;
    },
    get size() {
      return running.size;
    },
    async settled() {
      while (running.size > 0) await Promise.all(running);
    },
  };
}
