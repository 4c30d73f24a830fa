// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { DEFAULT_WINDOW_SIZE, fitWindowToDisplays, parseWindowState } from '../../../../electron/main/window/window-state.ts';

const laptop = { x: 0, y: 0, width: 1920, height: 1040 };
const rightMonitor = { x: 1920, y: 0, width: 2560, height: 1400 };

describe('parseWindowState()', () => {
  it('reads a well-formed remembered state', () => {
    expect(parseWindowState({ x: 10, y: 20, width: 1000, height: 700, isMaximized: false })).toEqual({
      x: 10,
      y: 20,
      width: 1000,
      height: 700,
      isMaximized: false,
    });
  });

  it('rejects damaged or hostile values', () => {
    for (const value of [
      null,
      'x',
      [],
      { x: 10, y: 20, width: 1000, height: 700 },
      { x: 10.5, y: 20, width: 1000, height: 700, isMaximized: false },
      { x: 10, y: 20, width: 0, height: 700, isMaximized: false },
      { x: 10, y: 20, width: 1000, height: -5, isMaximized: false },
      { x: Number.NaN, y: 20, width: 1000, height: 700, isMaximized: false },
      { x: 1e12, y: 20, width: 1000, height: 700, isMaximized: false },
      { x: '10', y: 20, width: 1000, height: 700, isMaximized: false },
      { x: 10, y: 20, width: 1000, height: 700, isMaximized: 'yes' },
    ]) {
      expect(parseWindowState(value), JSON.stringify(value)).toBeNull();
    }
  });
});

describe('fitWindowToDisplays()', () => {
  // Keeping a restored window fully on a display that still exists is common practice (no published
  // standard); the expected rectangles are worked out by hand from the work areas below.

  it('opens a first window at the default size, centred on the primary display', () => {
    expect(fitWindowToDisplays(null, [laptop])).toEqual({
      x: 360,
      y: 110,
      width: DEFAULT_WINDOW_SIZE.width,
      height: DEFAULT_WINDOW_SIZE.height,
    });
  });

  it('keeps a remembered window that is fully visible where it was', () => {
    expect(
      fitWindowToDisplays({ x: 2000, y: 100, width: 1400, height: 900, isMaximized: false }, [laptop, rightMonitor]),
    ).toEqual({
      x: 2000,
      y: 100,
      width: 1400,
      height: 900,
    });
  });

  it('pulls a window hanging off the edge back onto its display', () => {
    expect(fitWindowToDisplays({ x: 1500, y: 900, width: 1000, height: 700, isMaximized: false }, [laptop])).toEqual({
      x: 920,
      y: 340,
      width: 1000,
      height: 700,
    });
  });

  it('shrinks a window larger than its display to the work area', () => {
    expect(fitWindowToDisplays({ x: 0, y: 0, width: 3000, height: 2000, isMaximized: false }, [laptop])).toEqual({
      x: 0,
      y: 0,
      width: 1920,
      height: 1040,
    });
  });

  it('moves a window from an unplugged monitor to the primary display', () => {
    expect(fitWindowToDisplays({ x: 2200, y: 200, width: 1000, height: 700, isMaximized: false }, [laptop])).toEqual({
      x: 360,
      y: 110,
      width: 1200,
      height: 820,
    });
  });

  it('chooses the display the window overlaps most', () => {
    const fitted = fitWindowToDisplays({ x: 1800, y: 50, width: 1200, height: 800, isMaximized: false }, [laptop, rightMonitor]);
    expect(fitted).toEqual({ x: 1920, y: 50, width: 1200, height: 800 });
  });

  it('never goes below the minimum size unless the display itself is smaller', () => {
    expect(fitWindowToDisplays({ x: 0, y: 0, width: 200, height: 100, isMaximized: false }, [laptop])).toEqual({
      x: 0,
      y: 0,
      width: 800,
      height: 600,
    });
    const tiny = { x: 0, y: 0, width: 640, height: 480 };
    expect(fitWindowToDisplays({ x: 0, y: 0, width: 1000, height: 700, isMaximized: false }, [tiny])).toEqual({
      x: 0,
      y: 0,
      width: 640,
      height: 480,
    });
  });
});
