import type { BrowserWindow } from 'electron';
import { readJsonFile, writeJsonFile } from '../files/json-file.ts';
import type { PendingWork } from '../pending-work.ts';
import { parseWindowState } from './window-state.ts';
import type { WindowState } from './window-state.ts';

/** The remembered window state in its JSON file, or null when missing or not valid. */
export async function loadWindowState(filePath: string): Promise<WindowState | null> {
  return parseWindowState(await readJsonFile(filePath));
}

/**
 * Remember the window's normal (not maximised) bounds and whether it is maximised: shortly
 * after it is moved or resized, and when it closes. Writes are atomic and tracked, so quitting
 * waits for the last one.
 */
export function rememberWindowState(window: BrowserWindow, filePath: string, pending: PendingWork): void {
  let timer: NodeJS.Timeout | null = null;
  const write = (): void => {
    if (window.isDestroyed()) return;
    void pending.track(writeJsonFile(filePath, { ...window.getNormalBounds(), isMaximized: window.isMaximized() }));
  };
  const soon = (): void => {
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(write, 750);
  };
  window.on('resize', soon);
  window.on('move', soon);
  window.on('close', () => {
    if (timer !== null) clearTimeout(timer);
    write();
  });
}
