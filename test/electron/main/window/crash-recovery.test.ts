// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { respondToRendererGone } from '../../../../electron/main/window/crash-recovery.ts';

describe('respondToRendererGone()', () => {
  // Reloading after a renderer crash is what Electron's web-contents docs suggest for
  // 'render-process-gone'; stopping after three crashes in a minute is the app's own rule (common
  // practice against crash loops).

  it('does nothing after a clean exit', () => {
    expect(respondToRendererGone('clean-exit', [], 1000)).toBe('ignore');
  });

  it('reloads after a crash, a kill or running out of memory', () => {
    // Reasons from Electron's RenderProcessGoneDetails: clean-exit, abnormal-exit, killed, crashed, oom,
    // launch-failed, integrity-failure, memory-eviction.
    for (const reason of ['crashed', 'killed', 'oom', 'abnormal-exit', 'launch-failed', 'integrity-failure', 'memory-eviction']) {
      expect(respondToRendererGone(reason, [], 1000), reason).toBe('reload');
    }
  });

  it('gives up at the third crash within a minute, but not when earlier crashes are older', () => {
    expect(respondToRendererGone('crashed', [10_000], 20_000)).toBe('reload');
    expect(respondToRendererGone('crashed', [10_000, 15_000], 20_000)).toBe('give-up');
    expect(respondToRendererGone('crashed', [10_000, 15_000], 80_000)).toBe('reload');
  });
});
