import type { BrowserWindowConstructorOptions } from 'electron';
import { MINIMUM_WINDOW_SIZE } from './window-state.ts';
import type { WindowBounds } from './window-state.ts';

/** Settings the main window's options depend on. */
export interface MainWindowSettings {
  /** Absolute path of the built preload script (dist-electron/preload.cjs). */
  readonly preloadPath: string;
  /** Where the window opens (already fitted to a visible display). */
  readonly bounds: WindowBounds;
  /** Developer tools: only in an unpackaged (development) run. */
  readonly devTools: boolean;
}

/**
 * The options of the main window. The renderer gets no Node.js, runs in Chromium's
 * sandbox, in an isolated world apart from the preload, with web security, no insecure
 * content, no experimental or extra Blink features, no <webview>, no spellchecker (it would
 * download dictionaries), and middle-click cannot open windows. Kept as one literal so a
 * scanner reading the source sees every value.
 */
export function createMainWindowOptions(settings: MainWindowSettings): BrowserWindowConstructorOptions {
  const position =
    settings.bounds.x === undefined || settings.bounds.y === undefined ? {} : { x: settings.bounds.x, y: settings.bounds.y };
  return {
    ...position,
    width: settings.bounds.width,
    height: settings.bounds.height,
    minWidth: MINIMUM_WINDOW_SIZE.width,
    minHeight: MINIMUM_WINDOW_SIZE.height,
    title: 'Chancewise',
    show: false,
    backgroundColor: '#ffffff',
    webPreferences: {
      preload: settings.preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      experimentalFeatures: false,
      webviewTag: false,
      spellcheck: false,
      navigateOnDragDrop: false,
      safeDialogs: true,
      disableBlinkFeatures: 'Auxclick',
      devTools: settings.devTools,
    },
  };
}
