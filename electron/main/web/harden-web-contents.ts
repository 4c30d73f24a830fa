import { isAllowedNavigation } from './url-policy.ts';

/** A navigation event's decision handle. */
interface Preventable {
  preventDefault(): void;
}

/** The part of Electron's `webContents` the hardening uses. */
export interface HardenableContents {
  on(event: 'will-navigate', listener: (event: Preventable & { url: string }) => void): unknown;
  on(event: 'will-frame-navigate', listener: (event: Preventable & { url: string }) => void): unknown;
  on(event: 'will-redirect', listener: (event: Preventable & { url: string }) => void): unknown;
  on(event: 'will-attach-webview', listener: (event: Preventable) => void): unknown;
  setWindowOpenHandler(handler: (details: { url: string }) => { action: 'deny' }): void;
}

/**
 * Lock down one web contents: navigation (top frame, sub-frames, redirects) only within the
 * app's own origin; every new window denied (an allowed outside link is handed to
 * `openLink` instead, which decides through the allow-list); no <webview> may attach.
 */
export function hardenWebContents(contents: HardenableContents, openLink: (url: string) => void): void {
  const guardNavigation = (event: Preventable & { url: string }): void => {
    if (!isAllowedNavigation(event.url)) event.preventDefault();
  };
  contents.on('will-navigate', guardNavigation);
  contents.on('will-frame-navigate', guardNavigation);
  contents.on('will-redirect', guardNavigation);
  contents.on('will-attach-webview', (event) => {
    event.preventDefault();
  });
  contents.setWindowOpenHandler((details) => {
    openLink(details.url);
    return { action: 'deny' };
  });
}
