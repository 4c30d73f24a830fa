/** A rectangle on the desktop, in screen pixels. */
export interface Rectangle {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** Where the window opens; no position means "let the system place it". */
export interface WindowBounds {
  readonly x?: number;
  readonly y?: number;
  readonly width: number;
  readonly height: number;
}

/** The window's size and place as remembered between runs. */
export interface WindowState extends Rectangle {
  readonly isMaximized: boolean;
}

/** Smallest window in which the editor and a 100-person icon array still fit side by side. */
export const MINIMUM_WINDOW_SIZE = { width: 800, height: 600 } as const;

/** The size of a first window (no remembered state). */
export const DEFAULT_WINDOW_SIZE = { width: 1200, height: 820 } as const;

const LARGEST_COORDINATE = 100_000;

function isWholeNumber(value: unknown, lowest: number, highest: number): value is number {
  return typeof value === 'number' && Number.isInteger(value) && value >= lowest && value <= highest;
}

/**
 * Read a remembered window state from parsed JSON, or null when it is missing, damaged or
 * out of any sane range (whole pixels, sizes from 1 to 100 000, coordinates within ±100 000).
 */
export function parseWindowState(value: unknown): WindowState | null {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return null;
  const record = value as Record<string, unknown>;
  const { x, y, width, height, isMaximized } = record;
  if (!isWholeNumber(x, -LARGEST_COORDINATE, LARGEST_COORDINATE)) return null;
  if (!isWholeNumber(y, -LARGEST_COORDINATE, LARGEST_COORDINATE)) return null;
  if (!isWholeNumber(width, 1, LARGEST_COORDINATE)) return null;
  if (!isWholeNumber(height, 1, LARGEST_COORDINATE)) return null;
  if (typeof isMaximized !== 'boolean') return null;
  return { x, y, width, height, isMaximized };
}

function overlapArea(first: Rectangle, second: Rectangle): number {
  const width = Math.min(first.x + first.width, second.x + second.width) - Math.max(first.x, second.x);
  const height = Math.min(first.y + first.height, second.y + second.height) - Math.max(first.y, second.y);
  return width > 0 && height > 0 ? width * height : 0;
}

function clamp(value: number, lowest: number, highest: number): number {
  return Math.min(Math.max(value, lowest), highest);
}

/**
 * Fit a remembered window onto the displays there are now (their work areas, the primary
 * first): the display it overlaps most is kept, the size is cut to that work area (never
 * below the minimum window size), and the window is moved so all of it is visible. With no
 * remembered state, or one that overlaps no display, the window gets the default size,
 * centred on the primary display.
 */
export function fitWindowToDisplays(state: WindowState | null, workAreas: readonly Rectangle[]): WindowBounds {
  const primary = workAreas[0];
  if (primary === undefined) {
    return state === null ? { ...DEFAULT_WINDOW_SIZE } : { width: state.width, height: state.height };
  }
  let target: Rectangle | null = null;
  let best = 0;
  if (state !== null) {
    for (const area of workAreas) {
      const overlap = overlapArea(state, area);
      if (overlap > best) {
        best = overlap;
        target = area;
      }
    }
  }
  const area = target ?? primary;
  const wanted = target === null || state === null ? DEFAULT_WINDOW_SIZE : state;
  const width = Math.round(clamp(wanted.width, Math.min(MINIMUM_WINDOW_SIZE.width, area.width), area.width));
  const height = Math.round(clamp(wanted.height, Math.min(MINIMUM_WINDOW_SIZE.height, area.height), area.height));
  if (target === null || state === null) {
    return {
      x: Math.round(area.x + (area.width - width) / 2),
      y: Math.round(area.y + (area.height - height) / 2),
      width,
      height,
    };
  }
  return {
    x: Math.round(clamp(state.x, area.x, area.x + area.width - width)),
    y: Math.round(clamp(state.y, area.y, area.y + area.height - height)),
    width,
    height,
  };
}
