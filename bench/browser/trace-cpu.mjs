/**
 * Main-thread CPU time of marked spans, from a Chromium trace: each `performance.mark`
 * in the trace carries the thread's CPU clock (`tts`, microseconds), so the CPU time
 * between a `<kind>:start` and the next `<kind>:end` mark of the same thread is their
 * difference. Unlike `performance.now()`, it leaves out time the thread spent waiting
 * for a core, which on a busy machine is most of the spread.
 */

/** Trace categories that carry the page's marks, and nothing else. */
export const MARK_CATEGORIES = ['blink.user_timing'];

/**
 * CPU milliseconds of every `<kind>:start` … `<kind>:end` span in the trace, in order.
 * @param {Buffer | string} trace
 * @param {string} kind
 * @returns {number[]}
 */
export function markedCpuSpans(trace, kind) {
  const parsed = JSON.parse(trace.toString());
  /** @type {{ name: string, ts: number, tts?: number, pid: number, tid: number }[]} */
  const events = (Array.isArray(parsed) ? parsed : parsed.traceEvents).filter(
    (/** @type {{ name?: string, cat?: string }} */ event) =>
      event.cat === 'blink.user_timing' && (event.name === `${kind}:start` || event.name === `${kind}:end`),
  );
  events.sort((first, second) => first.ts - second.ts);
  /** @type {Map<string, number>} */
  const open = new Map();
  const spans = [];
  for (const event of events) {
    const thread = `${event.pid}/${event.tid}`;
    if (typeof event.tts !== 'number') continue;
    if (event.name.endsWith(':start')) open.set(thread, event.tts);
    else {
      const start = open.get(thread);
      if (start !== undefined) spans.push((event.tts - start) / 1000);
      open.delete(thread);
    }
  }
  return spans;
}
