import { describe, expect, it } from 'vitest';
import { stagedReveal } from '../../../src/ui/state/staged-reveal.ts';

/** A scheduler the test runs by hand, one queued task at a time. */
function manualScheduler() {
  const tasks: (() => void)[] = [];
  return {
    schedule: (task: () => void) => void tasks.push(task),
    runOne: () => tasks.shift()?.(),
    get pending() {
      return tasks.length;
    },
  };
}

// Staged start-up (common practice for long pages: draw what is on screen first, the rest in later tasks).
describe('stagedReveal', () => {
  it('draws nothing asked for at start-up until the first turn, then one part per task, in the order asked', () => {
    const first = manualScheduler();
    const next = manualScheduler();
    const drawn: string[] = [];
    const staged = stagedReveal({ first: first.schedule, next: next.schedule });
    staged.request(() => drawn.push('outcome 1'));
    staged.request(() => drawn.push('outcome 2'));
    staged.request(() => drawn.push('handout details'));
    expect(drawn).toEqual([]);
    expect(first.pending).toBe(1);
    first.runOne();
    expect(drawn).toEqual(['outcome 1']);
    next.runOne();
    expect(drawn).toEqual(['outcome 1', 'outcome 2']);
    expect(staged.settled).toBe(false);
    next.runOne();
    expect(drawn).toEqual(['outcome 1', 'outcome 2', 'handout details']);
    expect(staged.settled).toBe(true);
    expect(next.pending).toBe(0);
  });

  it('draws parts asked for after start-up at once', () => {
    const first = manualScheduler();
    const staged = stagedReveal({ first: first.schedule, next: first.schedule });
    staged.request(() => {});
    first.runOne();
    const drawn: string[] = [];
    staged.request(() => drawn.push('an added outcome'));
    expect(drawn).toEqual(['an added outcome']);
  });

  it('skips a part removed before its turn, and still settles', () => {
    const first = manualScheduler();
    const next = manualScheduler();
    const drawn: string[] = [];
    let settledCalls = 0;
    const staged = stagedReveal({ first: first.schedule, next: next.schedule, onSettled: () => (settledCalls += 1) });
    staged.request(() => drawn.push('kept'));
    const cancel = staged.request(() => drawn.push('removed'));
    cancel();
    first.runOne();
    expect(drawn).toEqual(['kept']);
    expect(staged.settled).toBe(true);
    expect(settledCalls).toBe(1);
  });

  it('settles on its first turn when every part was removed', () => {
    const first = manualScheduler();
    let settledCalls = 0;
    const staged = stagedReveal({ first: first.schedule, onSettled: () => (settledCalls += 1) });
    staged.request(() => {})();
    first.runOne();
    expect(staged.settled).toBe(true);
    expect(settledCalls).toBe(1);
  });
});
