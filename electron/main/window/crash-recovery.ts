/** What the shell does when the renderer process has gone. */
export type CrashResponse = 'ignore' | 'reload' | 'give-up';

/** Crashes within this window count as "in a row". */
export const CRASH_WINDOW_MS = 60_000;

/** At this many crashes in a row the shell stops reloading (a page that crashes at once would loop). */
export const MAX_CRASHES_IN_WINDOW = 3;

/**
 * Decide how to answer a `render-process-gone` event: a clean exit needs nothing; any other
 * reason (crashed, killed, out of memory, failed to launch...) reloads the page and restores
 * the topic, unless this is the third crash within a minute, when the shell gives up and
 * keeps the snapshot for the next start.
 */
export function respondToRendererGone(reason: string, earlierCrashTimes: readonly number[], now: number): CrashResponse {
  if (reason === 'clean-exit') return 'ignore';
  const recent = earlierCrashTimes.filter((time) => now - time < CRASH_WINDOW_MS && time <= now).length + 1;
  return recent >= MAX_CRASHES_IN_WINDOW ? 'give-up' : 'reload';
}
