// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { createMainWindowOptions } from '../../../../electron/main/window/window-options.ts';

describe('createMainWindowOptions()', () => {
  it('gives exactly the hardened options, with the remembered place and size', () => {
    const options = createMainWindowOptions({
      preloadPath: '/app/dist-electron/preload.cjs',
      bounds: { x: 40, y: 30, width: 1200, height: 820 },
      devTools: false,
    });
    // Electron security checklist (electron/electron docs/tutorial/security.md, "Checklist: Security
    // recommendations"): 2 no Node.js integration, 3 context isolation, 4 process sandboxing, 6 webSecurity
    // kept, 8 no allowRunningInsecureContent, 9 no experimental features, 10 no enableBlinkFeatures,
    // 12 no <webview> (webviewTag false). spellcheck off: docs/tutorial/spellchecker.md (dictionaries are
    // downloaded from a CDN). disableBlinkFeatures 'Auxclick': electronegativity AUXCLICK_JS_CHECK.
    expect(options).toEqual({
      x: 40,
      y: 30,
      width: 1200,
      height: 820,
      minWidth: 800,
      minHeight: 600,
      title: 'Chancewise',
      show: false,
      backgroundColor: '#ffffff',
      webPreferences: {
        preload: '/app/dist-electron/preload.cjs',
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
        devTools: false,
      },
    });
  });

  it('leaves the position to the system when none is known, and passes the developer-tools switch on', () => {
    const options = createMainWindowOptions({ preloadPath: 'p.cjs', bounds: { width: 900, height: 700 }, devTools: true });
    expect('x' in options).toBe(false);
    expect('y' in options).toBe(false);
    expect(options.webPreferences?.devTools).toBe(true);
    expect(options.webPreferences?.sandbox).toBe(true);
    expect(options.webPreferences?.enableBlinkFeatures).toBeUndefined();
    expect(options.webPreferences?.additionalArguments).toBeUndefined();
  });
});
